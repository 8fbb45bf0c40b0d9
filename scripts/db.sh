#!/usr/bin/env bash
# PostgreSQL on loopback in a project-local data folder.
#   scripts/db.sh start        install (if missing), init, start, create the two roles + database
# Roles: `hitchmark` owns the tables and runs migrations and the seed; `hitchmark_app` is what the
# app and the tests connect as (no UPDATE, DELETE or TRUNCATE on the record tables: the grants
# are in a migration). The owner is a member of the app role only so that the test scripts can
# close the app's connections before dropping a test database.
#   scripts/db.sh stop         stop cleanly
#   scripts/db.sh status
#   scripts/db.sh createdb N   (re)create database N, empty
# DATABASE_URL set → a managed database is used and this script does nothing.
set -euo pipefail
cd "$(dirname "$0")/.."
ROOT=$(pwd)
source scripts/env.sh
PORT=${HM_PG_PORT:-54329}
DATA=${HM_PG_DATA:-$ROOT/.data/postgres}
SOCK=${HM_PG_SOCKET_DIR:-/tmp}
DBNAME=${HM_DB_NAME:-hitchmark}

if [ -n "${DATABASE_URL:-}" ]; then echo "DATABASE_URL is set; not managing a local PostgreSQL"; exit 0; fi

pg_bin() {
  local d
  d=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n1 || true)
  if [ -z "$d" ] || [ ! -x "$d/postgres" ]; then
    echo "installing Debian's postgresql package" >&2
    local sudo=""; [ "$(id -u)" -ne 0 ] && sudo="sudo"
    $sudo apt-get update -qq >&2
    DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -qq postgresql >&2
    d=$(ls -d /usr/lib/postgresql/*/bin | sort -V | tail -n1)
  fi
  echo "$d"
}

# initdb and pg_ctl refuse to run as root: run them as the postgres user there.
as_owner() {
  if [ "$(id -u)" -eq 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi
}

psql_admin() { as_owner "$BIN/psql" -h 127.0.0.1 -p "$PORT" -U postgres -d postgres -v ON_ERROR_STOP=1 -qtA "$@"; }

BIN=$(pg_bin)

case "${1:-start}" in
  start)
    if [ ! -s "$DATA/PG_VERSION" ]; then
      mkdir -p "$DATA"
      chmod 700 "$DATA"
      if [ "$(id -u)" -eq 0 ]; then
        chown postgres:postgres "$DATA"
        # every folder above the data folder must be searchable by the postgres user
        p=$(dirname "$DATA"); while [ "$p" != "/" ]; do chmod o+x "$p" 2>/dev/null || true; p=$(dirname "$p"); done
      fi
      as_owner "$BIN/initdb" -D "$DATA" -U postgres --auth=trust -E UTF8 --locale=C.UTF-8 >/dev/null
    fi
    if as_owner "$BIN/pg_ctl" -D "$DATA" status >/dev/null 2>&1; then
      echo "PostgreSQL already running on 127.0.0.1:$PORT"
    else
      as_owner "$BIN/pg_ctl" -D "$DATA" -w -t 60 -l "$DATA/server.log" \
        -o "-p $PORT -k $SOCK -c listen_addresses=127.0.0.1 -c fsync=off -c max_connections=200 -c max_wal_size=8GB -c wal_buffers=64MB -c shared_buffers=512MB" start >/dev/null
      echo "PostgreSQL started on 127.0.0.1:$PORT"
    fi
    for _ in $(seq 1 50); do "$BIN/pg_isready" -q -h 127.0.0.1 -p "$PORT" && break; sleep 0.2; done
    psql_admin -c "DO \$\$BEGIN IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname='hitchmark') THEN CREATE ROLE hitchmark LOGIN PASSWORD 'hitchmark' CREATEDB; END IF; END\$\$;"
    psql_admin -c "DO \$\$BEGIN IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname='hitchmark_app') THEN CREATE ROLE hitchmark_app LOGIN PASSWORD 'hitchmark_app' NOCREATEDB NOCREATEROLE; END IF; END\$\$;"
    psql_admin -c "GRANT hitchmark_app TO hitchmark"
    if [ -z "$(psql_admin -c "SELECT 1 FROM pg_database WHERE datname='$DBNAME'")" ]; then
      psql_admin -c "CREATE DATABASE \"$DBNAME\" OWNER hitchmark"
    fi
    ;;
  createdb)
    name=${2:?database name}
    psql_admin -c "DROP DATABASE IF EXISTS \"$name\" WITH (FORCE)"
    psql_admin -c "CREATE DATABASE \"$name\" OWNER hitchmark"
    ;;
  stop)
    if as_owner "$BIN/pg_ctl" -D "$DATA" status >/dev/null 2>&1; then
      as_owner "$BIN/pg_ctl" -D "$DATA" -w -m fast stop >/dev/null && echo "PostgreSQL stopped"
    else echo "PostgreSQL not running"; fi
    ;;
  status) as_owner "$BIN/pg_ctl" -D "$DATA" status ;;
  *) echo "usage: $0 start|stop|status|createdb NAME" >&2; exit 2 ;;
esac
