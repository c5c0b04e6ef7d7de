#!/usr/bin/env bash
# Server memory per open page (Blazor circuit): starts the built app in demo mode on loopback over a
# throw-away SQLite file, opens one member page to warm it up, reads the server's RSS (/proc/<pid>/status) and
# private dirty memory (/proc/<pid>/smaps_rollup), opens N more member pages in tabs of headless Chromium
# (playwright-core, as scripts/screenshots.sh), reads them again and prints MB per open page. Bounded: N pages,
# loopback only, the app is stopped at the end. Not a test; record the figures in docs/PERFORMANCE.md.
# Usage: scripts/measure-circuits.sh [pages=20] [port=5098]   (env: SHOTS_NODE_DIR, CHROMIUM)
set -euo pipefail
cd "$(dirname "$0")/.."
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1 DOTNET_SKIP_FIRST_TIME_EXPERIENCE=1
pages="${1:-20}"
port="${2:-5098}"
base="http://127.0.0.1:$port"
node_dir="${SHOTS_NODE_DIR:-/tmp/shots-node}"

[ -x "${CHROMIUM:-/usr/bin/chromium}" ] || { echo "Chromium not found at ${CHROMIUM:-/usr/bin/chromium}" >&2; exit 1; }
if [ ! -d "$node_dir/node_modules/playwright-core" ]; then
  mkdir -p "$node_dir"
  (cd "$node_dir" && { [ -f package.json ] || npm init -y >/dev/null; } && npm install --no-audit --no-fund playwright-core@1.64.1)
fi

[ -f src/TrussWeb.Web/bin/Release/net10.0/TrussWeb.Web.dll ] || dotnet build src/TrussWeb.Web -c Release -nologo -v quiet

tmp="$(mktemp -d)"
log="$tmp/app.log"
# Workstation GC, as on a small office server; the figures are for this setting.
DOTNET_gcServer=0 TrussWeb__Database__ConnectionString="Data Source=$tmp/circuits.db" \
  dotnet src/TrussWeb.Web/bin/Release/net10.0/TrussWeb.Web.dll --urls "$base" --demo >"$log" 2>&1 &
app=$!
cleanup() { kill "$app" 2>/dev/null || true; wait "$app" 2>/dev/null || true; rm -rf "$tmp"; }
trap cleanup EXIT

for _ in $(seq 1 120); do
  if curl -fsS "$base/health/ready" >/dev/null 2>&1; then break; fi
  if ! kill -0 "$app" 2>/dev/null; then cat "$log" >&2; echo "the app stopped before it was ready" >&2; exit 1; fi
  sleep 1
done
curl -fsS "$base/health/ready" >/dev/null || { cat "$log" >&2; echo "the app was not ready in time" >&2; exit 1; }

SHOTS_NODE_DIR="$node_dir" node scripts/measure-circuits.mjs "$base" "$log" "$app" "$pages"
