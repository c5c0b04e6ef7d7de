#!/usr/bin/env bash
# Throwaway PostgreSQL 15 cluster for the data tests (never for real data: fsync is off).
#
#   scripts/pg-test-cluster.sh start        start a cluster; prints two export lines:
#                                            TRUSSWEB_TEST_PG (Npgsql connection string) and
#                                            TRUSSWEB_TEST_PG_DIR (the cluster folder, for stop)
#   scripts/pg-test-cluster.sh stop [DIR]   stop the cluster in DIR (default $TRUSSWEB_TEST_PG_DIR) and delete it
#
#   eval "$(scripts/pg-test-cluster.sh start)"; dotnet test tests/TrussWeb.Data.Tests; scripts/pg-test-cluster.sh stop
#
# The cluster listens on 127.0.0.1 only, on a free port, with trust authentication for the
# superuser 'postgres'. initdb refuses to run as root, so as root the script runs PostgreSQL as the
# system user 'trussweb-test' (created on first use). PG_BIN overrides where initdb/pg_ctl are found.
set -euo pipefail

user=trussweb-test

find_bin() {
  local dir
  for dir in "${PG_BIN:-}" /usr/lib/postgresql/15/bin /usr/local/bin /usr/bin; do
    if [ -n "$dir" ] && [ -x "$dir/initdb" ] && [ -x "$dir/pg_ctl" ]; then echo "$dir"; return 0; fi
  done
  echo "pg-test-cluster: initdb/pg_ctl not found (install PostgreSQL 15 or set PG_BIN)" >&2
  return 1
}

as_owner() {
  if [ "$(id -u)" -eq 0 ]; then runuser -u "$user" -- "$@"; else "$@"; fi
}

port_in_use() {
  (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null
}

start() {
  local bin base port attempt
  bin=$(find_bin)
  if [ "$(id -u)" -eq 0 ] && ! id -u "$user" >/dev/null 2>&1; then
    useradd --system --no-create-home --shell /usr/sbin/nologin "$user"
  fi
  base=$(mktemp -d "${TMPDIR:-/tmp}/trussweb-pg.XXXXXX")
  chmod 755 "$base"
  if [ "$(id -u)" -eq 0 ]; then chown "$user" "$base"; fi

  if ! as_owner "$bin/initdb" -D "$base/data" -U postgres --auth=trust --encoding=UTF8 --locale=C >"$base/initdb.log" 2>&1; then
    cat "$base/initdb.log" >&2; rm -rf "$base"; return 1
  fi

  for attempt in 1 2 3 4 5 6 7 8 9 10; do
    port=$(shuf -i 20000-59999 -n 1)
    if port_in_use "$port"; then continue; fi
    if as_owner "$bin/pg_ctl" -D "$base/data" -l "$base/postgres.log" -w -t 60 \
        -o "-c listen_addresses=127.0.0.1 -p $port -k $base -c fsync=off -c synchronous_commit=off -c full_page_writes=off" \
        start >"$base/pg_ctl.log" 2>&1; then
      echo "export TRUSSWEB_TEST_PG='Host=127.0.0.1;Port=$port;Username=postgres;Database=postgres;Pooling=false'"
      echo "export TRUSSWEB_TEST_PG_DIR='$base'"
      return 0
    fi
  done
  echo "pg-test-cluster: PostgreSQL did not start" >&2
  cat "$base/postgres.log" >&2 2>/dev/null || true
  rm -rf "$base"
  return 1
}

stop() {
  local dir="${1:-${TRUSSWEB_TEST_PG_DIR:-}}" bin
  if [ -z "$dir" ] || [ ! -d "$dir/data" ]; then
    echo "pg-test-cluster: no cluster folder given (argument or TRUSSWEB_TEST_PG_DIR)" >&2; return 1
  fi
  case "$dir" in
    */trussweb-pg.*) ;;
    *) echo "pg-test-cluster: refusing to delete '$dir' (not a folder this script made)" >&2; return 1 ;;
  esac
  bin=$(find_bin)
  as_owner "$bin/pg_ctl" -D "$dir/data" -m fast -w stop >/dev/null 2>&1 || true
  rm -rf "$dir"
}

case "${1:-}" in
  start) start ;;
  stop) shift; stop "$@" ;;
  *) echo "usage: $0 start | stop [DIR]" >&2; exit 2 ;;
esac
