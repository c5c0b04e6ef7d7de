#!/usr/bin/env bash
# Restores the TrussWeb PostgreSQL database from a pg_dump -Fc archive: stops the app, replaces every
# TrussWeb object in the database with the archive's (pg_restore --clean), starts the app again.
set -euo pipefail

usage() {
  cat <<USAGE
usage: $(basename "$0") [-u SERVICE] [-n] DUMP_FILE [DBNAME_OR_URI]

  -u SERVICE      systemd unit to stop and start (default trussweb); with several app instances
                  stop them all first and pass -n
  -n              do not stop/start a systemd unit
  DBNAME_OR_URI   database to restore into (default trussweb); it must exist
  The password comes from ~/.pgpass or PGPASSWORD. Everything written after the dump was taken is lost:
  take a fresh backup first (backup-postgres.sh) if the current data may be needed.
USAGE
}

service=trussweb manage=1
while getopts "u:nh" opt; do
  case "$opt" in
    u) service="$OPTARG" ;; n) manage=0 ;;
    h) usage; exit 0 ;; *) usage >&2; exit 2 ;;
  esac
done
shift $((OPTIND - 1))
[ $# -ge 1 ] && [ $# -le 2 ] || { usage >&2; exit 2; }
dump="$1" database="${2:-trussweb}"
[ -f "$dump" ] || { echo "no such dump file: $dump" >&2; exit 1; }
command -v pg_restore >/dev/null || { echo "pg_restore is not installed (postgresql-client-15)" >&2; exit 1; }
pg_restore --list "$dump" >/dev/null || { echo "$dump is not a pg_dump custom-format archive" >&2; exit 1; }

if [ "$manage" -eq 1 ]; then
  echo "stopping $service"
  systemctl stop "$service"
  trap 'echo "starting $service"; systemctl start "$service"' EXIT
fi
pg_restore --clean --if-exists --no-owner --no-privileges --single-transaction --exit-on-error --dbname="$database" "$dump"
echo "restored $database from $dump"
