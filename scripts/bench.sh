#!/usr/bin/env bash
# npm run bench: the speed figures (a)–(i) of the tap, the lists, the pages and their reference floors, in one run.
# A fresh database of its own (BENCH_DB_NAME, default setline_bench) with the demo seed and BENCH_INSTALLS (10 000)
# installs, a production build and server on BENCH_PORT (3500), then scripts/bench/run.mjs prints one table and
# writes it as JSON to BENCH_JSON when set. Exits non-zero when a goal is missed (BENCH_SMOKE=1: only when a figure
# could not be measured). Loopback only; the server, the floor server and every load stop with the script.
#   BENCH_SMOKE=1   short run for the test suite: 1 s loads, fewer installs, Lighthouse skipped
#   BENCH_BUILD=auto  reuse an existing .next build (default for the smoke); BENCH_BUILD=always (default) rebuilds
#   BENCH_ONLY=c,f,i  measure only these figures (plus (a), the reference of the ratios); default all
#   BENCH_PURE=1    also run the vitest micro-benchmarks of the pure computations (tests/bench)
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/common.sh"
PORT="${BENCH_PORT:-3500}"
if [ "${BENCH_SMOKE:-0}" = 1 ]; then
  export BENCH_INSTALLS="${BENCH_INSTALLS:-400}" BENCH_LATENCY_INSTALLS="${BENCH_LATENCY_INSTALLS:-5}"
  BUILD="${BENCH_BUILD:-auto}"
  DB="${BENCH_DB_NAME:-setline_bench_smoke}"
else
  BUILD="${BENCH_BUILD:-always}"
  DB="${BENCH_DB_NAME:-setline_bench}"
fi

ensure_dependencies
if [ "${BENCH_PURE:-0}" = 1 ]; then vitest bench --run --project unit tests/bench 2>&1 | grep -v '^$' || true; fi

say "fresh database $DB with the demo seed"
fresh_database "$DB"
sequelize-cli db:seed:all >/dev/null
node scripts/derive-installs.mjs
if [ "$BUILD" = always ] || [ ! -f .next/BUILD_ID ]; then
  say "production build (next build)"
  next build >/dev/null
fi

export NEXTAUTH_URL="http://127.0.0.1:$PORT" NEXTAUTH_SECRET="setline-bench-session-secret-0123456789abcdef"
export REPORT_LINK_SECRET="setline-bench-report-link-secret-0123456789" REPORT_WORKER=off NODE_ENV=production
work="$(mktemp -d)"
setsid next start -p "$PORT" -H 127.0.0.1 >"$work/server.log" 2>&1 &
server=$!
trap 'kill -- -$server 2>/dev/null || true; rm -rf "$work"' EXIT
for _ in $(seq 1 120); do curl -fs "http://127.0.0.1:$PORT/api/health" >/dev/null && break; sleep 0.5; done
curl -fs "http://127.0.0.1:$PORT/api/health" >/dev/null || { cat "$work/server.log" >&2; exit 1; }

say "seeding ${BENCH_INSTALLS:-10000} installs"
node scripts/bench/seed.mjs "http://127.0.0.1:$PORT" "$work/seeded.json"
say "measuring"
node scripts/bench/run.mjs "http://127.0.0.1:$PORT" "$work/seeded.json"
