#!/usr/bin/env bash
# npm test: installs what is missing, runs lint, typecheck and the format checks (failing fast), starts
# PostgreSQL, makes fresh test databases and runs every suite (unit, integration, e2e; the e2e suite installs
# Debian's haproxy as root for tests/e2e/cluster.spec.ts). `npm test -- unit|integration|e2e` runs one suite
# (after the same checks).
# Exits non-zero when any suite fails.
set -uo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/common.sh"
set -e

if [ $# -eq 0 ]; then SUITES=(unit integration e2e bench); else SUITES=("$@"); fi
REPORTS="$ROOT/.data/test-reports"
rm -rf "$REPORTS"; mkdir -p "$REPORTS"

ensure_dependencies

# Static checks first, failing fast: no suite runs on code that does not lint or typecheck.
# The format and line-length checks wait while `.format-pending` exists (the tree is formatted in one
# commit on the merged branch; deleting that file switches them on). SKIP_STATIC_CHECKS=1 skips all of it.
if [ "${SKIP_STATIC_CHECKS:-0}" != 1 ]; then
  say "lint (eslint)"
  npm run --silent lint || { say "lint FAILED: fix the errors above (npm run lint)"; exit 1; }
  say "typecheck (tsc)"
  npm run --silent typecheck || { say "typecheck FAILED (npm run typecheck)"; exit 1; }
  if [ -f "$ROOT/.format-pending" ]; then
    say "format and line-length checks skipped: .format-pending is present (delete it once the tree is formatted)"
  else
    say "format check (prettier) and line length"
    npm run --silent format:check || { say "format check FAILED: run npm run format"; exit 1; }
    npm run --silent lint:lines || { say "line-length check FAILED"; exit 1; }
  fi
fi

# Fresh service fakes for every run, on their own ports so a running demo is left alone.
stop_fakes test
rm -rf "$ROOT/.data/fakes-test"
FAKES_PORT_BASE="${TEST_FAKES_PORT_BASE:-54490}" start_fakes test
trap 'stop_fakes test' EXIT

ensure_chromium() {
  local path="${CHROMIUM_PATH:-/usr/bin/chromium}"
  [ -x "$path" ] && return 0
  if [ "$(id -u)" = 0 ]; then
    say "installing Debian's chromium for the browser tests (apt-get)"
    DEBIAN_FRONTEND=noninteractive apt-get update -qq
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null
  else
    say "Chromium is missing: run  sudo apt-get install -y chromium  (or set CHROMIUM_PATH)"
    return 1
  fi
}

# pdftotext (poppler-utils) reads the text of the repair report PDFs in the integration tests.
ensure_pdftotext() {
  command -v pdftotext >/dev/null && return 0
  if [ "$(id -u)" = 0 ]; then
    say "installing poppler-utils for the PDF checks (apt-get)"
    DEBIAN_FRONTEND=noninteractive apt-get update -qq
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq poppler-utils >/dev/null
  else
    say "pdftotext is missing: run  sudo apt-get install -y poppler-utils"
    return 1
  fi
}

failed=0
run_suite() {
  local suite="$1"
  set +e
  case "$suite" in
    unit)
      vitest run --project unit --reporter=default --reporter=json --outputFile.json="$REPORTS/unit.json"
      ;;
    integration)
      ensure_pdftotext &&
        fresh_database "${TEST_DB_NAME:-setline_test}" &&
        vitest run --project integration --reporter=default --reporter=json --outputFile.json="$REPORTS/integration.json"
      ;;
    e2e)
      ensure_chromium &&
        ensure_haproxy &&
        fresh_database "${E2E_DB_NAME:-setline_e2e}" &&
        sequelize-cli db:seed:all >/dev/null &&
        node scripts/derive-installs.mjs &&
        say "building for the browser tests (next build)" &&
        next build >/dev/null &&
        PLAYWRIGHT_JSON_OUTPUT_NAME="$REPORTS/e2e.json" playwright test --reporter=list,json
      ;;
    bench)
      # A short run of `npm run bench` (its own database and server; reuses the e2e build when there is one):
      # every figure must come out, in the table and in the JSON; the goals are the full bench's business.
      BENCH_SMOKE=1 BENCH_JSON="$ROOT/.data/bench-smoke.json" bash scripts/bench.sh >"$ROOT/.data/bench-smoke.md" &&
        node scripts/bench/check-smoke.mjs "$ROOT/.data/bench-smoke.md" "$ROOT/.data/bench-smoke.json" "$REPORTS/bench.json"
      ;;
    *)
      say "unknown suite: $suite (unit | integration | e2e | bench)"; false ;;
  esac
  local status=$?
  set -e
  if [ $status -ne 0 ]; then failed=1; say "suite $suite FAILED"; else say "suite $suite passed"; fi
}

for suite in "${SUITES[@]}"; do run_suite "$suite"; done

# One closing line with the test counts of every suite that ran.
node scripts/test-summary.cjs "$REPORTS" || true
exit $failed
