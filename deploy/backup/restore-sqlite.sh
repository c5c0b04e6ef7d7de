#!/usr/bin/env bash
# Restores the TrussWeb SQLite database from a backup: stops the service, runs the app's 'restore' verb
# (which checks the file and keeps the replaced database as <file>.before-restore-<time>), starts it again.
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
# shellcheck source=common.sh
. "$here/common.sh"

usage() {
  cat <<USAGE
usage: $(basename "$0") [-a APP_DIR] [-e ENV_FILE] [-u SERVICE] [-n] BACKUP_FILE

  -a APP_DIR   folder holding TrussWeb.Web.dll   (default /opt/trussweb/app)
  -e ENV_FILE  the service's settings file       (default /etc/trussweb/trussweb.env)
  -u SERVICE   systemd unit to stop and start    (default trussweb)
  -n           do not stop/start a systemd unit (stop the app yourself first)

  Run as root (it stops the service and runs the restore as the service user 'trussweb').
USAGE
}

app=/opt/trussweb/app env_file=/etc/trussweb/trussweb.env service=trussweb manage=1
while getopts "a:e:u:nh" opt; do
  case "$opt" in
    a) app="$OPTARG" ;; e) env_file="$OPTARG" ;; u) service="$OPTARG" ;; n) manage=0 ;;
    h) usage; exit 0 ;; *) usage >&2; exit 2 ;;
  esac
done
shift $((OPTIND - 1))
[ $# -eq 1 ] || { usage >&2; exit 2; }
backup="$(realpath "$1")"
[ -f "$backup" ] || { echo "no such backup file: $backup" >&2; exit 1; }

load_env "$env_file"
run_as_service_user() {
  if [ "$(id -u)" -eq 0 ] && id -u trussweb >/dev/null 2>&1; then
    runuser -u trussweb --preserve-environment -- "$@"
  else
    "$@"
  fi
}

if [ "$manage" -eq 1 ]; then
  echo "stopping $service"
  systemctl stop "$service"
  trap 'echo "starting $service"; systemctl start "$service"' EXIT
fi
(cd "$app" && run_as_service_user dotnet TrussWeb.Web.dll restore "$backup")
