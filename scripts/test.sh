#!/usr/bin/env bash
# Runs every test of TrussWeb on a fresh machine: installs what is missing, builds, runs the suites,
# and checks that the app starts and answers on loopback. Exit code 0 only when all pass.
set -euo pipefail
cd "$(dirname "$0")/.."
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1 DOTNET_SKIP_FIRST_TIME_EXPERIENCE=1
start=$(date +%s)

echo "== prerequisites"
# The data tests start a throwaway PostgreSQL 15 cluster (scripts/pg-test-cluster.sh) unless
# TRUSSWEB_TEST_PG names a server; a fresh machine gets the server binaries from Debian.
if [ -z "${TRUSSWEB_TEST_PG:-}" ] && [ ! -x /usr/lib/postgresql/15/bin/initdb ] && ! command -v initdb >/dev/null 2>&1; then
  apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql-15 >/dev/null
fi

# The browser journeys (tests/TrussWeb.E2E) drive the system Chromium; a fresh machine gets it from Debian.
if [ -z "${TRUSSWEB_CHROMIUM:-}" ] && ! command -v chromium >/dev/null 2>&1; then
  apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null
fi

echo "== build (Release)"
dotnet build TrussWeb.sln -c Release -nologo -v quiet

echo "== unit tests"
for project in tests/TrussWeb.*.Tests tests/TrussWeb.E2E; do
  dotnet test "$project" -c Release --no-build -nologo --logger "console;verbosity=minimal"
done

echo "== smoke: the app starts and answers on loopback"
port=$(shuf -i 20000-59999 -n 1)
log=$(mktemp)
smokedir=$(mktemp -d)
TrussWeb__Database__ConnectionString="Data Source=$smokedir/smoke.db" \
  dotnet src/TrussWeb.Web/bin/Release/net10.0/TrussWeb.Web.dll --urls "http://127.0.0.1:$port" >"$log" 2>&1 &
app=$!
trap 'kill $app 2>/dev/null || true' EXIT
ok=""
for _ in $(seq 1 60); do
  if curl -fsS "http://127.0.0.1:$port/" -o /dev/null 2>/dev/null; then ok=1; break; fi
  sleep 1
done
if [ -z "$ok" ]; then echo "the app did not answer on port $port"; cat "$log"; exit 1; fi
home=$(curl -fsSL "http://127.0.0.1:$port/")
grep -q "competent engineer" <<<"$home" || { echo "home page lacks the caution text"; cat "$log"; exit 1; }
curl -fsS "http://127.0.0.1:$port/health/ready" -o /dev/null || { echo "/health/ready did not answer 200"; cat "$log"; exit 1; }
curl -fsS "http://127.0.0.1:$port/_content/MudBlazor/MudBlazor.min.css" -o /dev/null || { echo "the component library's styles are not served"; cat "$log"; exit 1; }
kill $app; wait $app 2>/dev/null || true
echo "smoke passed"

echo "== all tests passed in $(( $(date +%s) - start )) s"
