#!/usr/bin/env bash
# README command 2: every test on a fresh machine.
# Installs what is missing, starts PostgreSQL and the fakes, runs vitest (unit + database tests
# against a fresh database), builds once, and runs Playwright in Debian's chromium against
# `next start` on a fresh, seeded database.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/setup.sh --with-browser
source scripts/env.sh
# the browser tests run their own server on their own port
export HM_APP_PORT=${HM_E2E_PORT:-3100}
export APP_URL=http://localhost:$HM_APP_PORT
bash scripts/fakes.sh start
cleanup() { bash scripts/fakes.sh stop; }
trap cleanup EXIT

echo "== unit and database tests (vitest)"
node_modules/.bin/vitest run

echo "== build"
node_modules/.bin/next build > .data/build.log 2>&1 || { tail -60 .data/build.log; exit 1; }
tail -3 .data/build.log

echo "== end-to-end tests (Playwright, Debian chromium)"
export HM_DB_NAME=hitchmark_e2e
bash scripts/db.sh createdb "$HM_DB_NAME"
node_modules/.bin/tsx db/migrate.ts
node_modules/.bin/tsx --conditions=react-server db/seed/index.ts
node_modules/.bin/playwright test "$@"
