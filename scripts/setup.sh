#!/usr/bin/env bash
# Installs what a fresh machine lacks: npm packages from the lock, Debian's PostgreSQL (db.sh),
# and Debian's Chromium for the browser tests (only with --with-browser). Then starts PostgreSQL.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/env.sh

if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "installing npm packages (npm ci)"
  npm ci --no-audit --no-fund --loglevel=error
fi

if [ "${1:-}" = "--with-browser" ] && [ ! -x /usr/bin/chromium ]; then
  echo "installing Debian's chromium"
  sudo=""; [ "$(id -u)" -ne 0 ] && sudo="sudo"
  $sudo apt-get update -qq
  DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -qq chromium fonts-dejavu-core >/dev/null
fi

bash scripts/db.sh start
