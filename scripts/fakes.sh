#!/usr/bin/env bash
# Starts the local fakes (S3 + SMTP inbox) in the background and waits until they answer.
#   scripts/fakes.sh start | stop
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/env.sh
PIDFILE=.data/fakes.pid
case "${1:-start}" in
  start)
    if [ -s "$PIDFILE" ] && kill -0 "$(cat "$PIDFILE")" 2>/dev/null; then echo "fakes already running"; exit 0; fi
    node_modules/.bin/tsx scripts/fakes.ts > .data/fakes.log 2>&1 &
    echo $! > "$PIDFILE"
    for _ in $(seq 1 100); do
      curl -fs "http://127.0.0.1:$HM_MAIL_HTTP_PORT/health" >/dev/null 2>&1 && { cat .data/fakes.log; exit 0; }
      sleep 0.2
    done
    echo "fakes did not start:"; cat .data/fakes.log; exit 1
    ;;
  stop)
    if [ -s "$PIDFILE" ]; then kill "$(cat "$PIDFILE")" 2>/dev/null || true; rm -f "$PIDFILE"; fi
    ;;
esac
