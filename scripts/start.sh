#!/usr/bin/env bash
# Starts TrussWeb on its embedded default in DEMO MODE: a SQLite file under data/ in the repository, an
# invented demo project and one demo sign-in per role (printed at start). Usage: scripts/start.sh [extra app arguments]
# TRUSSWEB_URLS overrides the address (default http://127.0.0.1:5080).
set -euo pipefail
cd "$(dirname "$0")/.."
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1 DOTNET_SKIP_FIRST_TIME_EXPERIENCE=1
urls="${TRUSSWEB_URLS:-http://127.0.0.1:5080}"
database=()
if [ -z "${TrussWeb__Database__ConnectionString:-}" ] && [ -z "${TrussWeb__Database__Provider:-}" ]; then
  mkdir -p data
  database=("--TrussWeb:Database:ConnectionString=Data Source=$PWD/data/trussweb.db")
fi
dotnet build src/TrussWeb.Web -c Release -nologo -v quiet
# Runs the built app in the Production environment (friendly error pages, no developer exception page);
# set ASPNETCORE_ENVIRONMENT=Development to change that.
export ASPNETCORE_ENVIRONMENT="${ASPNETCORE_ENVIRONMENT:-Production}"
exec dotnet src/TrussWeb.Web/bin/Release/net10.0/TrussWeb.Web.dll --urls "$urls" --demo "${database[@]}" "$@"
