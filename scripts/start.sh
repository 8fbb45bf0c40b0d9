#!/usr/bin/env bash
# README command 1: set up a fresh machine and run Hitchmark with demo data.
# Installs packages, starts PostgreSQL and the local fakes, migrates, seeds, builds and starts,
# saying at each step what it does and how far along it is; ends with the addresses to open.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/env.sh
STEPS=7
source scripts/steps.sh
source scripts/setup.sh

echo "Hitchmark: setting up and starting (a fresh machine takes 5 to 10 minutes; later runs 1 to 3)."
install_packages
start_postgres

step "starting the local fakes: S3 storage on :$HM_S3_PORT, SMTP inbox on :$HM_SMTP_PORT"
quietly .data/fakes-start.log bash scripts/fakes.sh start
trap 'bash scripts/fakes.sh stop' EXIT

step "applying database migrations"
quietly .data/migrate.log node_modules/.bin/tsx db/migrate.ts

step "loading the invented demo data (about 30 s; safe to re-run)"
quietly .data/seed.log env HM_DB_ROLE=owner node_modules/.bin/tsx --conditions=react-server db/seed/index.ts

step "building the app (next build; 1 to 3 min)"
quietly .data/build.log node_modules/.bin/next build --webpack

step "starting Hitchmark on $APP_URL"
node_modules/.bin/next start -p "$HM_APP_PORT" >.data/app.log 2>&1 &
APP=$!
trap 'kill $APP 2>/dev/null; bash scripts/fakes.sh stop' EXIT INT TERM
for _ in $(seq 1 120); do
  curl -fs "$APP_URL/api/health" >/dev/null 2>&1 && break
  kill -0 "$APP" 2>/dev/null || { tail -n 40 .data/app.log; exit 1; }
  sleep 0.5
done
echo "      done (server output in .data/app.log)"

cat <<INFO

Ready after $(elapsed).

  Hitchmark      $APP_URL
                 sign in as clerk@bramblecrest.example / hitchmark-clerk, or as driver D1001 with
                 PIN 4321 (every demo account is listed in README.md)
  e-mail inbox   http://127.0.0.1:$HM_MAIL_HTTP_PORT/messages   (what the app has sent, as JSON)

  Ctrl-C stops the app and the fakes; \`bash scripts/db.sh stop\` stops PostgreSQL.
INFO
wait $APP
