#!/usr/bin/env bash
# Backup of the TrussWeb PostgreSQL database with pg_dump in custom format (-Fc; the app may keep
# running), keeping N days of backups.
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
# shellcheck source=common.sh
. "$here/common.sh"

usage() {
  cat <<USAGE
usage: $(basename "$0") [-d BACKUP_DIR] [-k DAYS] [DBNAME_OR_URI]

  Writes BACKUP_DIR/trussweb-<UTC time>.dump (pg_dump -Fc) and deletes dumps older than DAYS days.

  -d BACKUP_DIR   where dumps go                  (default /var/backups/trussweb)
  -k DAYS         keep this many days of dumps    (default 14)
  DBNAME_OR_URI   database to dump                (default trussweb), e.g.
                  postgresql://trussweb@db.example.org:5432/trussweb
  The password comes from ~/.pgpass or PGPASSWORD (never on the command line); PGHOST, PGPORT and
  PGUSER are honoured as by every PostgreSQL tool. Use pg_dump of the server's major version (15).
USAGE
}

dir=/var/backups/trussweb days=14
while getopts "d:k:h" opt; do
  case "$opt" in
    d) dir="$OPTARG" ;; k) days="$OPTARG" ;;
    h) usage; exit 0 ;; *) usage >&2; exit 2 ;;
  esac
done
shift $((OPTIND - 1))
[ $# -le 1 ] || { usage >&2; exit 2; }
database="${1:-trussweb}"
[[ "$days" =~ ^[1-9][0-9]*$ ]] || { echo "DAYS must be a positive whole number" >&2; exit 2; }
command -v pg_dump >/dev/null || { echo "pg_dump is not installed (postgresql-client-15)" >&2; exit 1; }

mkdir -p "$dir"
target="$dir/trussweb-$(date -u +%Y%m%dT%H%M%SZ).dump"
pg_dump -Fc --no-owner --no-privileges --file="$target.partial" --dbname="$database"
pg_restore --list "$target.partial" >/dev/null   # readable archive, else fail
mv "$target.partial" "$target"
echo "backup written: $target"
prune "$dir" 'trussweb-*.dump' "$days"
