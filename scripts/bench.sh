#!/usr/bin/env bash
# npm run bench: speed figures, kept out of the test suite.
#  1. pure computations (vitest bench): planCure, flagsFor, designLiner
#  2. HTTP throughput of the production server (autocannon, 20 connections, 10 s each) on a seeded database
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/common.sh"
PORT="${BENCH_PORT:-3500}"

ensure_dependencies
vitest bench --run --project unit tests/bench 2>&1 | grep -v '^$' || true

fresh_database "${BENCH_DB_NAME:-setline_bench}"
sequelize-cli db:seed:all >/dev/null
[ -d .next ] || next build >/dev/null
export NEXTAUTH_URL="http://127.0.0.1:$PORT" NEXTAUTH_SECRET="setline-bench-session-secret-0123456789abcdef" REPORT_LINK_SECRET="setline-bench-report-link-secret-0123456789" REPORT_WORKER=off
setsid next start -p "$PORT" -H 127.0.0.1 >/dev/null 2>&1 &
server=$!
trap 'kill -- -$server 2>/dev/null || true' EXIT
for _ in $(seq 1 60); do curl -fs "http://127.0.0.1:$PORT/api/health" >/dev/null && break; sleep 0.5; done
node scripts/bench-http.mjs "http://127.0.0.1:$PORT"
