#!/usr/bin/env bash
# Online backup of the TrussWeb SQLite database (the app may keep running), keeping N days of backups.
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
# shellcheck source=common.sh
. "$here/common.sh"

usage() {
  cat <<USAGE
usage: $(basename "$0") [-d BACKUP_DIR] [-k DAYS] [-a APP_DIR] [-e ENV_FILE] [-s SQLITE_FILE]

  Writes BACKUP_DIR/trussweb-<UTC time>.db with the app's own 'backup' verb (SQLite online backup),
  then deletes backups in BACKUP_DIR older than DAYS days.

  -d BACKUP_DIR  where backups go                  (default /var/backups/trussweb)
  -k DAYS        keep this many days of backups    (default 14)
  -a APP_DIR     folder holding TrussWeb.Web.dll   (default /opt/trussweb/app)
  -e ENV_FILE    the service's settings file       (default /etc/trussweb/trussweb.env)
  -s SQLITE_FILE use sqlite3 '.backup' on this file instead of the app (needs the sqlite3 tool)

  Run it as the service user (or root) from cron or a systemd timer, e.g. daily at 02:30:
    30 2 * * *  trussweb  /opt/trussweb/deploy/backup/backup-sqlite.sh -k 30
  Copy the backup folder off the server as well.
USAGE
}

dir=/var/backups/trussweb days=14 app=/opt/trussweb/app env_file=/etc/trussweb/trussweb.env sqlite_file=""
while getopts "d:k:a:e:s:h" opt; do
  case "$opt" in
    d) dir="$OPTARG" ;; k) days="$OPTARG" ;; a) app="$OPTARG" ;; e) env_file="$OPTARG" ;; s) sqlite_file="$OPTARG" ;;
    h) usage; exit 0 ;; *) usage >&2; exit 2 ;;
  esac
done
[[ "$days" =~ ^[1-9][0-9]*$ ]] || { echo "DAYS must be a positive whole number" >&2; exit 2; }

mkdir -p "$dir"
target="$dir/trussweb-$(date -u +%Y%m%dT%H%M%SZ).db"
if [ -n "$sqlite_file" ]; then
  command -v sqlite3 >/dev/null || { echo "sqlite3 is not installed" >&2; exit 1; }
  sqlite3 "$sqlite_file" ".backup '$target'"
  [ "$(sqlite3 "$target" 'PRAGMA integrity_check;')" = "ok" ] || { echo "backup $target fails the integrity check" >&2; exit 1; }
else
  load_env "$env_file"
  (cd "$app" && dotnet TrussWeb.Web.dll backup "$target")
fi
echo "backup written: $target"
prune "$dir" 'trussweb-*.db' "$days"
