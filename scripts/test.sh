#!/usr/bin/env bash
# README command 2: every test on a fresh machine (what CI runs through .ci/run).
# Installs what is missing, runs the format, lint and type checks first (a violation fails in
# seconds), then vitest (unit tests, and database tests each on a database of its own), builds
# once, and runs Playwright in Debian's chromium against `next start` on a fresh, seeded database.
# Arguments go to Playwright (e.g. `bash scripts/test.sh auth` runs tests/e2e/auth.spec.ts only).
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/env.sh
STEPS=9
source scripts/steps.sh
source scripts/setup.sh
# the browser tests run their own server on their own port
export HM_APP_PORT=${HM_E2E_PORT:-3100}
export APP_URL=http://localhost:$HM_APP_PORT

echo "Hitchmark: every test (about 8 minutes on a 2-core machine; more on a fresh one)."
install_packages
install_chromium
start_postgres

step "checks: format, lint, types (npm run check; about 1 min)"
quietly .data/check.log npm run -s check

step "starting the local fakes: S3 storage on :$HM_S3_PORT, SMTP inbox on :$HM_SMTP_PORT"
quietly .data/fakes-start.log bash scripts/fakes.sh start
trap 'bash scripts/fakes.sh stop' EXIT

step "unit and database tests (vitest; 1 to 2 min)"
node_modules/.bin/vitest run

step "building the app (next build; 1 to 3 min)"
quietly .data/build.log node_modules/.bin/next build --webpack

step "JavaScript budget (first-load gzipped KB per main route; a second)"
node scripts/js-budget.mjs

step "preparing the browser tests' database (hitchmark_e2e: migrate, seed; about 30 s)"
export HM_DB_NAME=hitchmark_e2e
quietly .data/e2e-db.log sh -c "bash scripts/db.sh createdb $HM_DB_NAME && node_modules/.bin/tsx db/migrate.ts && HM_DB_ROLE=owner node_modules/.bin/tsx --conditions=react-server db/seed/index.ts"

step "browser tests (Playwright, Debian chromium, phone and desktop; 4 to 6 min)"
node_modules/.bin/playwright test "$@"

cat <<INFO

All tests passed in $(elapsed).
  logs           .data/check.log, .data/build.log, .data/e2e-db.log
  browser runs   .data/test-results (a trace for any test that failed and was retried)
INFO
