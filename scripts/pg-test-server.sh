#!/usr/bin/env bash
# Starts a throwaway PostgreSQL server for the database tests (the scale-out path) and prints
# its URL on stdout. Usage:
#   export TEST_DATABASE_URL="$(bash scripts/pg-test-server.sh start)"
#   bash scripts/pg-test-server.sh stop
# The cluster lives in a temp dir, listens on loopback only and trusts local connections:
# it holds nothing but test data and is thrown away after the run.
set -euo pipefail

PORT="${PG_TEST_PORT:-55432}"
DIR="${PG_TEST_DIR:-/tmp/stickerline-pg-test}"
DB="stickerline_test"

bindir() {
  local d
  d="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1 || true)"
  if [ -z "$d" ]; then echo "PostgreSQL server binaries not found (apt-get install postgresql)" >&2; exit 1; fi
  echo "$d"
}

# PostgreSQL refuses to run as root, so the cluster belongs to an unprivileged user.
as_owner() {
  if [ "$(id -u)" -eq 0 ]; then
    id postgres >/dev/null 2>&1 || useradd --system --home-dir /var/lib/postgresql postgres
    su postgres -s /bin/sh -c "$*"
  else
    sh -c "$*"
  fi
}

start() {
  local bin; bin="$(bindir)"
  if [ -f "$DIR/data/postmaster.pid" ] && as_owner "'$bin/pg_ctl' -D '$DIR/data' status" >/dev/null 2>&1; then
    echo "postgres://postgres@127.0.0.1:$PORT/$DB"; return
  fi
  rm -rf "$DIR"
  mkdir -p "$DIR"
  [ "$(id -u)" -eq 0 ] && chown postgres "$DIR"
  as_owner "'$bin/initdb' -D '$DIR/data' -U postgres --auth=trust --encoding=UTF8 --no-sync" >"$DIR/../stickerline-pg-initdb.log" 2>&1
  # fsync off: a test cluster that dies is simply made again, and it makes the tests faster.
  as_owner "'$bin/pg_ctl' -D '$DIR/data' -l '$DIR/server.log' -w -o \"-p $PORT -k '$DIR' -h 127.0.0.1 -c fsync=off -c max_connections=200\" start" >&2
  as_owner "'$bin/createdb' -h 127.0.0.1 -p $PORT -U postgres $DB" >&2
  echo "postgres://postgres@127.0.0.1:$PORT/$DB"
}

stop() {
  local bin; bin="$(bindir)"
  if [ -d "$DIR/data" ]; then as_owner "'$bin/pg_ctl' -D '$DIR/data' -m fast stop" >&2 || true; fi
  rm -rf "$DIR"
}

case "${1:-start}" in
  start) start ;;
  stop) stop ;;
  *) echo "usage: $0 start|stop" >&2; exit 2 ;;
esac
