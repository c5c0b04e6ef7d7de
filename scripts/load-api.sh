#!/usr/bin/env bash
# Bounded load run of the HTTP API on loopback: starts the built app on a throwaway SQLite database (demo
# mode, API rate limit raised), creates a token with the create-token admin verb, runs a fixed number of
# stateless member checks from 50 concurrent clients with a hard time limit, prints checks/s and
# p50/p95/p99, and stops the app. Record the figures in docs/PERFORMANCE.md.
# Usage: scripts/load-api.sh [requests (default 20000)] [clients (default 50)] [time limit s (default 240)]
set -euo pipefail
cd "$(dirname "$0")/.."
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1 DOTNET_SKIP_FIRST_TIME_EXPERIENCE=1
requests="${1:-20000}"
clients="${2:-50}"
limit="${3:-240}"
dotnet build src/TrussWeb.Web -c Release -nologo -v quiet
dotnet build tests/TrussWeb.LoadTests -c Release -nologo -v quiet
work=$(mktemp -d)
port=$(shuf -i 20000-59999 -n 1)
app=""
cleanup() {
  if [ -n "$app" ]; then kill "$app" 2>/dev/null || true; wait "$app" 2>/dev/null || true; fi
  rm -rf "$work"
}
trap cleanup EXIT
export ASPNETCORE_ENVIRONMENT=Production
export TrussWeb__Database__ConnectionString="Data Source=$work/load.db"
export TrussWeb__Api__RequestsPerWindow=100000000
export TrussWeb__Api__WindowSeconds=60
dll=src/TrussWeb.Web/bin/Release/net10.0/TrussWeb.Web.dll
dotnet "$dll" --urls "http://127.0.0.1:$port" --demo >"$work/app.log" 2>&1 &
app=$!
for _ in $(seq 1 60); do
  if curl -fsS "http://127.0.0.1:$port/health/ready" -o /dev/null 2>/dev/null; then break; fi
  sleep 1
done
curl -fsS "http://127.0.0.1:$port/health/ready" -o /dev/null || { echo "the app did not start"; cat "$work/app.log"; exit 1; }
token=$(dotnet "$dll" create-token designer@demo.trussweb.local load-run --scope read --days 1 | tail -n 1)
echo "machine: $(nproc) cores, $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | xargs)"
timeout $((limit + 30)) dotnet tests/TrussWeb.LoadTests/bin/Release/net10.0/TrussWeb.LoadTests.dll \
  --url "http://127.0.0.1:$port" --token "$token" --requests "$requests" --clients "$clients" --limit-seconds "$limit"
