#!/usr/bin/env bash
# Renders the first pages of a generated calculation book and member summary to PNG for a visual check.
# Usage: scripts/render-pdf-pages.sh [out-dir] [resolution-dpi] [pages]
# The sample PDFs come from the report tests (TRUSSWEB_REPORT_SAMPLES makes them write their files).
set -euo pipefail
cd "$(dirname "$0")/.."
out="${1:-artifacts/report-pages}"
dpi="${2:-70}"
pages="${3:-4}"
mkdir -p "$out"
out="$(cd "$out" && pwd)"
if ! command -v pdftoppm >/dev/null 2>&1; then
  apt-get update && apt-get install -y poppler-utils
fi
TRUSSWEB_REPORT_SAMPLES="$out" dotnet test tests/TrussWeb.Reports.Tests --filter "FullyQualifiedName~SampleOutputTests" --nologo -v q
pdftoppm -png -r "$dpi" -f 1 -l "$pages" "$out/book.pdf" "$out/book"
pdftoppm -png -r "$dpi" -f 1 -l 2 "$out/summary.pdf" "$out/summary"
# The first member sheet: the page the contents gives for the first member (the test writes it).
if [[ -f "$out/first-member-page.txt" ]]; then
  p="$(cat "$out/first-member-page.txt")"
  pdftoppm -png -r "$dpi" -f "$p" -l "$((p + 1))" "$out/book.pdf" "$out/book-member"
fi
ls -1 "$out"/*.png
