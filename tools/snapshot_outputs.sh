#!/bin/sh
# Writes everything the programs produce for every sample into OUT_DIR, so that
# two builds can be compared file by file: a change that should not alter
# behaviour (a move, a refactoring) must leave `diff -r OLD NEW` empty.
#   tools/snapshot_outputs.sh BUILD_DIR OUT_DIR
# Takes: the analysis summary, JSON and CSV results, the free-body diagram of
# every body at 37° (SVG), the review report (as text and as page images) and
# the desktop window (`clevis --screenshot`, offscreen) of each sample.
set -eu
build=$(cd "$1" && pwd)
out=$2
src=$(cd "$(dirname "$0")/.." && pwd)
mkdir -p "$out"
cli="$build/app/clevis-cli"
for sample in "$src"/samples/*.json; do
  name=$(basename "$sample" .json)
  d="$out/$name"
  mkdir -p "$d"
  "$cli" analyze "$sample" --json "$d/results.json" --csv "$d/results.csv" >"$d/summary.txt" 2>&1 || echo "exit $?" >>"$d/summary.txt"
  if [ -x "$build/app/clevis" ]; then
    python3 -c 'import json,sys; [print(b["name"]) for b in json.load(open(sys.argv[1]))["bodies"]]' "$sample" |
      while read -r body; do
        "$cli" fbd "$sample" --body "$body" --at-deg 37 --out "$d/fbd_$body.svg" >/dev/null 2>&1 || echo "fbd $body: exit $?" >>"$d/fbd_errors.txt"
      done
    "$cli" report "$sample" --out "$d/report.pdf" >/dev/null 2>&1 || echo "report: exit $?" >>"$d/summary.txt"
    if [ -f "$d/report.pdf" ]; then
      pdftotext -layout "$d/report.pdf" "$d/report.txt"
      pdftoppm -r 40 -png "$d/report.pdf" "$d/report_page"
      rm "$d/report.pdf"   # the PDF carries its creation time; its text and pages are compared instead
    fi
    QT_QPA_PLATFORM=offscreen "$build/app/clevis" --screenshot "$d/window.png" "$sample" >/dev/null 2>&1 || echo "screenshot: exit $?" >>"$d/summary.txt"
  fi
done
echo "wrote $out"
