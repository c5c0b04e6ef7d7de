#!/usr/bin/env bash
# Starts TrussWeb on its embedded default. Usage: scripts/start.sh [extra app arguments]
# TRUSSWEB_URLS overrides the address (default http://127.0.0.1:5080).
set -euo pipefail
cd "$(dirname "$0")/.."
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1 DOTNET_SKIP_FIRST_TIME_EXPERIENCE=1
urls="${TRUSSWEB_URLS:-http://127.0.0.1:5080}"
dotnet build src/TrussWeb.Web -c Release -nologo -v quiet
exec dotnet run --no-build --project src/TrussWeb.Web -c Release -- --urls "$urls" "$@"
