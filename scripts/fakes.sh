#!/usr/bin/env bash
# The local stand-ins for hosted services (S3 storage, SMTP, payments), started and stopped like PostgreSQL.
#   bash scripts/fakes.sh start   → starts them in the background, prints the env file to source
#   bash scripts/fakes.sh stop
# FAKES_PORT_BASE picks the ports (default 54390; the tests use another base), FAKES_NAME separates the state files.
set -euo pipefail
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
NAME="${FAKES_NAME:-demo}"
STATE="$ROOT/.data/fakes-$NAME"
mkdir -p "$STATE"
export FAKES_DATA_DIR="${FAKES_DATA_DIR:-$STATE}"
PIDFILE="$STATE/pid"
ENVFILE="$STATE/env"

running() { [ -f "$PIDFILE" ] && kill -0 "$(cat "$PIDFILE")" 2>/dev/null; }

case "${1:-}" in
  start)
    if running; then echo "$ENVFILE"; exit 0; fi
    rm -f "$ENVFILE"
    nohup node "$ROOT/scripts/fakes/run.mjs" "$ENVFILE" >"$STATE/log" 2>&1 &
    echo $! >"$PIDFILE"
    for _ in $(seq 1 100); do
      [ -s "$ENVFILE" ] && { echo "$ENVFILE"; exit 0; }
      running || break
      sleep 0.1
    done
    echo "the service fakes did not start; see $STATE/log:" >&2
    cat "$STATE/log" >&2
    exit 1
    ;;
  stop)
    if running; then kill "$(cat "$PIDFILE")"; for _ in $(seq 1 50); do running || break; sleep 0.1; done; fi
    rm -f "$PIDFILE" "$ENVFILE"
    ;;
  status)
    if running; then echo running; cat "$ENVFILE"; else echo stopped; exit 1; fi
    ;;
  *)
    echo "usage: $0 start|stop|status" >&2; exit 2 ;;
esac
