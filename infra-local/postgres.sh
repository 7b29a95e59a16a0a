#!/usr/bin/env bash
# PostgreSQL from Debian's packages: our own cluster on 127.0.0.1:$PG_PORT, data in
# $VATSIDE_DATA_DIR/pg (outside the checkout: the postgres user must be able to enter it).
# Usage: infra-local/postgres.sh start|stop|status|reset-db   (VATSIDE_PROFILE=demo|test)
source "$(dirname "${BASH_SOURCE[0]}")/env.sh"

pg_bin_dir() { ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1; }

ensure_installed() {
  local bin
  bin="$(pg_bin_dir)"
  if [ -z "$bin" ] || [ ! -x "$bin/postgres" ] || ! id postgres >/dev/null 2>&1; then
    apt_install postgresql
    bin="$(pg_bin_dir)"
    [ -x "$bin/postgres" ] || die "PostgreSQL server binaries are still missing after installing 'postgresql'"
  fi
  PG_BIN="$bin"
}

# PostgreSQL refuses to run as root. Its commands start from /, a folder the postgres user
# may enter (root's checkout is closed to it, and each command would say so).
as_pg() {
  if [ "$(id -u)" -eq 0 ]; then (cd / && runuser -u postgres -- "$@"); else "$@"; fi
}

PGDATA="$VATSIDE_DATA_DIR/pg"
PG_LOG="$VATSIDE_DATA_DIR/postgres.log"

init_cluster() {
  [ -f "$PGDATA/PG_VERSION" ] && return 0
  say "Creating a PostgreSQL cluster in $PGDATA"
  mkdir -p "$VATSIDE_DATA_DIR"
  chmod 755 "$(dirname "$VATSIDE_DATA_DIR")" "$VATSIDE_DATA_DIR"
  [ "$(id -u)" -eq 0 ] && chown postgres:postgres "$VATSIDE_DATA_DIR"
  local pwfile="$VATSIDE_DATA_DIR/.pw"
  as_pg sh -c "printf vatside > '$pwfile'"
  as_pg "$PG_BIN/initdb" -D "$PGDATA" -U vatside --pwfile="$pwfile" -E UTF8 --no-locale \
    --auth-local=trust --auth-host=scram-sha-256 >"$VATSIDE_LOG_DIR/initdb.log" 2>&1 ||
    die "initdb failed; see $VATSIDE_LOG_DIR/initdb.log"
  as_pg rm -f "$pwfile"
}

running() { as_pg "$PG_BIN/pg_ctl" -D "$PGDATA" status >/dev/null 2>&1; }

psql_admin() { as_pg "$PG_BIN/psql" -h "$PGDATA" -p "$PG_PORT" -U vatside -d postgres -v ON_ERROR_STOP=1 -qtA "$@"; }

start() {
  ensure_installed
  init_cluster
  if running; then
    say "PostgreSQL already running on 127.0.0.1:$PG_PORT"
  else
    require_free_port "$PG_PORT" PostgreSQL PG_PORT
    local opts="-p $PG_PORT -k $PGDATA -c listen_addresses=127.0.0.1"
    # Test data is thrown away after each run, so durability is not worth the time.
    [ "$VATSIDE_PROFILE" = test ] && opts="$opts -c fsync=off -c synchronous_commit=off -c full_page_writes=off"
    as_pg "$PG_BIN/pg_ctl" -D "$PGDATA" -l "$PG_LOG" -o "$opts" -w -t 60 start >/dev/null ||
      die "PostgreSQL did not start; see $PG_LOG"
    say "PostgreSQL running on 127.0.0.1:$PG_PORT (data in $PGDATA)"
  fi
  if [ -z "$(psql_admin -c "select 1 from pg_database where datname = '$PG_DATABASE'")" ]; then
    psql_admin -c "create database $PG_DATABASE"
  fi
}

stop() {
  ensure_installed
  if running; then
    as_pg "$PG_BIN/pg_ctl" -D "$PGDATA" -m fast -w stop >/dev/null && say "PostgreSQL stopped"
  fi
}

reset_db() {
  start
  psql_admin -c "drop database if exists $PG_DATABASE with (force)" -c "create database $PG_DATABASE"
  say "Database $PG_DATABASE is empty"
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  status) ensure_installed; running && say "running on 127.0.0.1:$PG_PORT" || say "stopped" ;;
  reset-db) reset_db ;;
  *) echo "usage: $0 start|stop|status|reset-db" >&2; exit 2 ;;
esac
