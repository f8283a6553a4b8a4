#!/usr/bin/env bash
# npm run cluster: two production app servers (`next start`) on one PostgreSQL, behind Debian's haproxy
# on 127.0.0.1:$PORT (round-robin, health checks on /api/health). Proves the app servers are stateless:
# sessions are signed cookies, attempt limits and the report queue live in PostgreSQL.
#   scripts/cluster.sh [run]        start everything, wait for Ctrl-C, stop it all again
#   scripts/cluster.sh start        start in the background and return (state in .data/cluster-$PORT/)
#   scripts/cluster.sh stop         stop the app servers and haproxy started by `start`
#   scripts/cluster.sh kill-app N   SIGKILL app server N (1 or 2), as a crash would (the soak does this)
#   scripts/cluster.sh start-app N  start app server N again with the environment `start` saved
#   scripts/cluster.sh status       each process: up or down
# Environment: PORT (3600) haproxy; APP_PORTS ("PORT+10 PORT+20"); DB_NAME (setline); PGPORT;
#   CLUSTER_SEED (on: the demo scenario into an empty database; off: migrations only);
#   NEXTAUTH_SECRET / REPORT_LINK_SECRET (kept under .data/ when unset: both servers must share them);
#   REPORT_WORKER (on: both servers run the report worker; the claim in report_sends keeps a send single).
#   Variables of the service fakes (S3_*, SMTP_*, MAIL_*, STRIPE_*) already in the environment are passed on.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/common.sh"

PORT="${PORT:-3600}"
read -r -a APP_PORTS <<< "${APP_PORTS:-$((PORT + 10)) $((PORT + 20))}"
STATE="$ROOT/.data/cluster-$PORT"
# Variables the app servers get (the ones set); both servers read the same file.
PASS_ON='^(S3_|SMTP_|MAIL_|STRIPE_|PAYMENT_|REPORT_)'

app_pid_file() { echo "$STATE/app-$1.pid"; }
alive() { [ -f "$1" ] && kill -0 "$(cat "$1")" 2>/dev/null; }

cmd_start() {
  ensure_dependencies
  ensure_haproxy
  mkdir -p "$STATE"
  if alive "$STATE/haproxy.pid"; then say "cluster on port $PORT is already running (scripts/cluster.sh stop)"; return 1; fi
  start_database "${DB_NAME:-setline}"
  sequelize-cli db:migrate >/dev/null
  [ "${CLUSTER_SEED:-on}" = off ] || bash scripts/seed.sh
  build_if_stale
  write_env
  write_haproxy_config
  local n
  for n in $(seq 1 "${#APP_PORTS[@]}"); do cmd_start_app "$n"; done
  setsid haproxy -f "$STATE/haproxy.cfg" -db >> "$STATE/haproxy.log" 2>&1 < /dev/null &
  echo $! > "$STATE/haproxy.pid"
  for n in $(seq 1 "${#APP_PORTS[@]}"); do wait_healthy "http://127.0.0.1:${APP_PORTS[$((n - 1))]}" "app server $n"; done
  wait_healthy "http://127.0.0.1:$PORT" haproxy
  say "cluster up: http://127.0.0.1:$PORT → app servers on ${APP_PORTS[*]} (logs in $STATE)"
}

cmd_start_app() {
  local n="$1" port
  port="${APP_PORTS[$((n - 1))]:-}"
  [ -n "$port" ] || { say "no app server $n (there are ${#APP_PORTS[@]})"; return 2; }
  alive "$(app_pid_file "$n")" && { say "app server $n is already running"; return 0; }
  # shellcheck disable=SC1091
  ( set -a; source "$STATE/env"; set +a
    exec setsid "$ROOT/node_modules/.bin/next" start -p "$port" -H 127.0.0.1 >> "$STATE/app-$n.log" 2>&1 < /dev/null ) &
  echo $! > "$(app_pid_file "$n")"
}

cmd_kill_app() {
  local file; file="$(app_pid_file "$1")"
  alive "$file" || { say "app server $1 is not running"; return 0; }
  # The whole process group: `next start` runs next-server as a child.
  kill -KILL -- "-$(cat "$file")" 2>/dev/null || true
  rm -f "$file"
}

cmd_stop() {
  local file pid
  for file in "$STATE"/app-*.pid "$STATE/haproxy.pid"; do
    [ -f "$file" ] || continue
    pid="$(cat "$file")"
    kill -TERM -- "-$pid" 2>/dev/null || true
    for _ in $(seq 1 50); do kill -0 "$pid" 2>/dev/null || break; sleep 0.2; done
    kill -KILL -- "-$pid" 2>/dev/null || true
    rm -f "$file"
  done
  say "cluster on port $PORT stopped"
}

cmd_status() {
  local n
  for n in $(seq 1 "${#APP_PORTS[@]}"); do
    if alive "$(app_pid_file "$n")"; then echo "app $n (${APP_PORTS[$((n - 1))]}): up"; else echo "app $n: down"; fi
  done
  if alive "$STATE/haproxy.pid"; then echo "haproxy ($PORT): up"; else echo "haproxy: down"; fi
}

# The one environment both servers share: database, secrets, the public address (haproxy's).
write_env() {
  local public="http://127.0.0.1:$PORT" name
  NEXTAUTH_SECRET="${NEXTAUTH_SECRET:-$(session_secret)}"
  REPORT_LINK_SECRET="${REPORT_LINK_SECRET:-$(kept_secret report-link-secret)}"
  umask 077
  {
    for name in DATABASE_URL NEXTAUTH_SECRET REPORT_LINK_SECRET; do printf 'export %s=%q\n' "$name" "${!name}"; done
    printf 'export NEXTAUTH_URL=%q APP_URL=%q\n' "${NEXTAUTH_URL:-$public}" "${APP_URL:-$public}"
    # haproxy appends the client's address to X-Forwarded-For: one trusted proxy.
    printf 'export TRUSTED_PROXY=%q REPORT_WORKER=%q\n' "${TRUSTED_PROXY:-1}" "${REPORT_WORKER:-on}"
    for name in $(compgen -e | grep -E "$PASS_ON" | grep -vE '^REPORT_(WORKER|LINK_SECRET)$' || true); do printf 'export %s=%q\n' "$name" "${!name}"; done
  } > "$STATE/env"
  umask 022
}

write_haproxy_config() {
  local n
  {
    cat <<CFG
# Written by scripts/cluster.sh: loopback only, round-robin over the app servers.
global
  maxconn 1024

defaults
  mode http
  timeout connect 2s
  timeout client 60s
  timeout server 60s
  # A server that refuses the connection (killed) is retried on the other one; nothing else is retried.
  retries 2
  option redispatch

frontend setline
  bind 127.0.0.1:$PORT
  option forwardfor
  default_backend apps

backend apps
  balance roundrobin
  option httpchk
  http-check send meth GET uri /api/health
  http-check expect status 200
  default-server inter 1s fall 2 rise 1
CFG
    for n in $(seq 1 "${#APP_PORTS[@]}"); do echo "  server app$n 127.0.0.1:${APP_PORTS[$((n - 1))]} check"; done
  } > "$STATE/haproxy.cfg"
  haproxy -c -q -f "$STATE/haproxy.cfg"
}

wait_healthy() {
  for _ in $(seq 1 120); do curl -fs "$1/api/health" >/dev/null 2>&1 && return 0; sleep 0.5; done
  say "$2 did not answer on $1/api/health within 60 s (logs in $STATE)"
  return 1
}

case "${1:-run}" in
  run)
    trap cmd_stop EXIT
    trap 'exit 130' INT TERM
    cmd_start
    say "Ctrl-C stops the cluster (the database keeps running: npm run db:stop)"
    while alive "$STATE/haproxy.pid"; do sleep 2; done
    ;;
  start) cmd_start ;;
  stop) cmd_stop ;;
  kill-app) cmd_kill_app "${2:?which app server: 1 or 2}" ;;
  start-app) cmd_start_app "${2:?which app server: 1 or 2}" ;;
  status) cmd_status ;;
  *) echo "usage: $0 run|start|stop|kill-app N|start-app N|status" >&2; exit 2 ;;
esac
