#!/usr/bin/env bash
# npm run soak: the tap proven durable (not part of npm test). On a fresh database setline_soak in the project's
# cluster (left there afterwards for inspection), against a production build: 20 simulated tablets send 10,000
# taps while the app server is SIGKILLed 5 times and PostgreSQL is stopped with `pg_ctl stop -m immediate` twice
# (scripts/soak/soak.mjs). Ends with the line
#   soak: 10000 taps, 10000 acknowledged, 10000 stored, 0 lost, 0 duplicated, 5 kills, 2 database stops
# and exits non-zero on any loss or duplicate.
# Environment: PORT (3400; with SOAK_TARGET=cluster the haproxy port, app servers on PORT+10 and PORT+20),
#   SOAK_TARGET (plain | cluster: `scripts/cluster.sh` and the kills hit one app server at a time),
#   SOAK_ACK_FILE (each acknowledged clientEventId, one per line), PGPORT, SOAK_DB_NAME (setline_soak);
#   smaller runs for trying it out: SOAK_TABLETS, SOAK_TAPS, SOAK_KILLS, SOAK_DB_STOPS.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/common.sh"
export PORT="${PORT:-3400}"
export DB_NAME="${SOAK_DB_NAME:-setline_soak}"
TARGET="${SOAK_TARGET:-plain}"
case "$TARGET" in plain | cluster) ;; *) say "SOAK_TARGET is plain or cluster"; exit 2 ;; esac

ensure_dependencies
fresh_database "$DB_NAME"
build_if_stale
# The server's environment: its own secrets for this run, no report worker (the soak is about taps).
NEXTAUTH_SECRET="$(node -e "process.stdout.write(require('crypto').randomBytes(32).toString('base64url'))")"
REPORT_LINK_SECRET="$(node -e "process.stdout.write(require('crypto').randomBytes(32).toString('base64url'))")"
export NEXTAUTH_SECRET REPORT_LINK_SECRET REPORT_WORKER=off

cleanup() {
  if [ "$TARGET" = cluster ]; then bash scripts/cluster.sh stop || true; fi
  # soak.mjs stops its own server; this is for an interrupted run.
  [ -f .data/soak/app.pid ] && kill -KILL -- "-$(cat .data/soak/app.pid)" 2>/dev/null || true
  rm -f .data/soak/app.pid
}
trap cleanup EXIT

if [ "$TARGET" = cluster ]; then
  CLUSTER_SEED=off bash scripts/cluster.sh start
else
  export NEXTAUTH_URL="http://127.0.0.1:$PORT"
fi
say "soak: ${SOAK_TAPS:-10000} taps from ${SOAK_TABLETS:-20} tablets against the $TARGET target (database $DB_NAME)"
node scripts/soak/soak.mjs
