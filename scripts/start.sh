#!/usr/bin/env bash
# README command 1: set up a fresh machine and run Hitchmark with demo data at http://localhost:3000
# Installs packages, starts PostgreSQL and the local fakes, migrates, seeds, builds and starts.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/setup.sh
source scripts/env.sh
bash scripts/fakes.sh start
trap 'bash scripts/fakes.sh stop' EXIT
node_modules/.bin/tsx db/migrate.ts
node_modules/.bin/tsx --conditions=react-server db/seed/index.ts
node_modules/.bin/next build
echo "Hitchmark on $APP_URL  (local inbox: http://127.0.0.1:$HM_MAIL_HTTP_PORT)"
node_modules/.bin/next start -p "$HM_APP_PORT" &
APP=$!
trap 'kill $APP 2>/dev/null; bash scripts/fakes.sh stop' EXIT INT TERM
wait $APP
