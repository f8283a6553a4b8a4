#!/usr/bin/env bash
# Seeds the demo scenario into DATABASE_URL's database when it has no company yet.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/common.sh"
count="$(node -e "
const { Client } = require('pg');
const c = new Client({ connectionString: process.env.DATABASE_URL });
c.connect().then(() => c.query('SELECT count(*)::int AS n FROM companies')).then((r) => { console.log(r.rows[0].n); return c.end(); })
  .catch((e) => { console.error(e.message); process.exit(1); });
")"
if [ "$count" != 0 ]; then
  say "the database already has data: keeping it (npm run db:reset, then npm run demo, starts over)"
  exit 0
fi
sequelize-cli db:seed:all >/dev/null
# The seed writes install rows and their logs; their derived state comes from the app's own derivation.
node scripts/derive-installs.mjs
say "demo scenario seeded"
