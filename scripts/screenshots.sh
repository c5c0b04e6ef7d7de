#!/usr/bin/env bash
# Refreshes docs/screenshots/*.png and times "member edit saved -> updated result on the page" in headless
# Chromium (/usr/bin/chromium, never downloaded). Builds the app, starts it in demo mode on loopback with a
# throw-away SQLite file, waits for /health/ready, runs scripts/screenshots.mjs, then stops the app.
# Needs Node.js 20; playwright-core is installed into a temp folder outside the repository when missing.
# Usage: scripts/screenshots.sh [port]   (env: SHOTS_NODE_DIR, default /tmp/shots-node; CHROMIUM)
set -euo pipefail
cd "$(dirname "$0")/.."
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1 DOTNET_SKIP_FIRST_TIME_EXPERIENCE=1
port="${1:-5099}"
base="http://127.0.0.1:$port"
node_dir="${SHOTS_NODE_DIR:-/tmp/shots-node}"

[ -x "${CHROMIUM:-/usr/bin/chromium}" ] || { echo "Chromium not found at ${CHROMIUM:-/usr/bin/chromium}" >&2; exit 1; }
if [ ! -d "$node_dir/node_modules/playwright-core" ]; then
  mkdir -p "$node_dir"
  (cd "$node_dir" && { [ -f package.json ] || npm init -y >/dev/null; } && npm install --no-audit --no-fund playwright-core@1.64.1)
fi

dotnet build src/TrussWeb.Web -c Release -nologo -v quiet

tmp="$(mktemp -d)"
log="$tmp/app.log"
# Development: a build (not publish) output serves its static web assets (MudBlazor, blazor.web.js, the
# app's wwwroot) through the build manifest only in that environment.
ASPNETCORE_ENVIRONMENT=Development TrussWeb__Database__ConnectionString="Data Source=$tmp/shots.db" \
  dotnet src/TrussWeb.Web/bin/Release/net10.0/TrussWeb.Web.dll --urls "$base" --demo >"$log" 2>&1 &
app=$!
cleanup() { kill "$app" 2>/dev/null || true; wait "$app" 2>/dev/null || true; cp "$log" "${TMPDIR:-/tmp}/trussweb-screenshots-app.log" 2>/dev/null || true; rm -rf "$tmp"; }
trap cleanup EXIT

for _ in $(seq 1 120); do
  if curl -fsS "$base/health/ready" >/dev/null 2>&1; then break; fi
  if ! kill -0 "$app" 2>/dev/null; then cat "$log" >&2; echo "the app stopped before it was ready" >&2; exit 1; fi
  sleep 1
done
curl -fsS "$base/health/ready" >/dev/null || { cat "$log" >&2; echo "the app was not ready in time" >&2; exit 1; }

SHOTS_NODE_DIR="$node_dir" node scripts/screenshots.mjs "$base" "$log" "$PWD/docs/screenshots"
