#!/usr/bin/env bash
# Shared by scripts/demo.sh, scripts/test.sh and scripts/seed.sh: install what is missing, start the database.
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$ROOT"
export PATH="$ROOT/node_modules/.bin:$PATH"

say() { printf '\033[1;36m[setline]\033[0m %s\n' "$*" >&2; }

# npm ci when node_modules is missing or older than the lock file.
ensure_dependencies() {
  if [ ! -d node_modules ] || [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    say "installing npm dependencies (npm ci)"
    npm ci --no-audit --no-fund
  fi
}

# Starts our PostgreSQL cluster and sets DATABASE_URL for the named database.
start_database() {
  local name="$1"
  DATABASE_URL="$(DB_NAME="$name" bash scripts/db.sh start)"
  export DATABASE_URL
}

# Drops and re-creates the named database, then applies every migration.
fresh_database() {
  local name="$1"
  start_database "$name"
  DB_NAME="$name" bash scripts/db.sh reset
  sequelize-cli db:migrate >/dev/null
}

# A random secret kept under .data/<name> so sessions and report links survive a demo restart.
# $1: nextauth-secret (sessions) or report-link-secret (customer report links) — two separate keys.
kept_secret() {
  local file=".data/$1"
  mkdir -p .data
  [ -s "$file" ] || node -e "process.stdout.write(require('crypto').randomBytes(32).toString('base64url'))" > "$file"
  cat "$file"
}
session_secret() { kept_secret nextauth-secret; }

# Starts the local service fakes (S3 storage, SMTP, payments) and exports what the app needs to reach them.
# $1 names the state directory (.data/fakes-<name>); FAKES_PORT_BASE picks the ports.
start_fakes() {
  local env_file
  env_file="$(FAKES_NAME="$1" bash scripts/fakes.sh start)"
  set -a
  # shellcheck disable=SC1090
  source "$env_file"
  set +a
}

stop_fakes() {
  FAKES_NAME="$1" bash scripts/fakes.sh stop || true
}

# Debian's haproxy (the load balancer of scripts/cluster.sh), installed like postgresql when missing.
ensure_haproxy() {
  command -v haproxy >/dev/null 2>&1 && return 0
  [ -x /usr/sbin/haproxy ] && { export PATH="$PATH:/usr/sbin"; return 0; }
  if [ "$(id -u)" = 0 ]; then
    say "installing Debian's haproxy (apt-get)"
    DEBIAN_FRONTEND=noninteractive apt-get update -qq
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends haproxy >/dev/null
    export PATH="$PATH:/usr/sbin"
    command -v haproxy >/dev/null 2>&1
  else
    say "haproxy is missing: run  sudo apt-get install -y haproxy"
    return 1
  fi
}

# next build when there is no production build yet or a source file is newer than it.
build_if_stale() {
  if [ -f .next/BUILD_ID ] && [ -z "$(find app components config lib models proxy.ts instrumentation.ts next.config.mjs package-lock.json \
      -newer .next/BUILD_ID -type f -print -quit 2>/dev/null)" ]; then
    return 0
  fi
  say "building (next build)"
  next build >/dev/null
}
