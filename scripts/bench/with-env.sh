#!/usr/bin/env bash
# Runs a benchmark script with the checkout's settings (scripts/env.sh): `npm run bench` and
# `npm run bench:data` pass their arguments through.
set -euo pipefail
cd "$(dirname "$0")/../.."
source scripts/env.sh
export HM_E2E_PORT
script=$1
shift
exec node_modules/.bin/tsx --conditions=react-server "$script" "$@"
