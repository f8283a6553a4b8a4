#!/usr/bin/env bash
# npm run demo: everything from a fresh machine to a served app with the demo scenario.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/common.sh"
PORT="${PORT:-3000}"

ensure_dependencies
start_database "${DB_NAME:-setline}"
say "migrating"
sequelize-cli db:migrate >/dev/null
bash scripts/seed.sh
say "starting the local service fakes (storage, mail, payments)"
FAKES_PORT_BASE="${FAKES_PORT_BASE:-54390}" start_fakes demo
say "building (next build)"
next build >/dev/null

export NEXTAUTH_URL="${NEXTAUTH_URL:-http://localhost:$PORT}"
NEXTAUTH_SECRET="${NEXTAUTH_SECRET:-$(session_secret)}"
REPORT_LINK_SECRET="${REPORT_LINK_SECRET:-$(kept_secret report-link-secret)}"
export NEXTAUTH_SECRET REPORT_LINK_SECRET PORT

cat <<BANNER

  ┌──────────────────────────────────────────────────────────────┐
    Setline is running at  http://localhost:$PORT
    Sign in with any of these (password: setline-demo)
      admin@demo.test     company settings, users, materials
      office@demo.test    jobs, schedule, review, reports
      foreman@demo.test   today's jobs and the install clock
      tech@demo.test      install clock on the crew's jobs
      office@second.test / foreman@second.test   a second company
    E-mail sent by the demo lands in the local mailbox:
      ${MAIL_WEB_URL:-}
    Ctrl-C stops the server (the database and the service fakes
    keep running: npm run db:stop / bash scripts/fakes.sh stop).
  └──────────────────────────────────────────────────────────────┘

BANNER
exec next start -p "$PORT"
