#!/bin/sh
# A short run of the mechanism-loader fuzzer, for CI: builds only the core and
# the fuzz target with clang and its sanitizers in a scratch directory, then
# fuzzes from the seeds and the samples for SECONDS (default 60).
#   tests/fuzz/run_short_fuzz.sh SOURCE_DIR [SECONDS]
# CC and CXX choose the compilers (default clang, clang++). On a finding the
# scratch directory is kept and the input that failed is named.
set -eu
src=$(cd "$1" && pwd)
seconds=${2:-60}
work=$(mktemp -d "${TMPDIR:-/tmp}/clevis-fuzz-XXXXXX")

CC=${CC:-clang} CXX=${CXX:-clang++} cmake -S "$src" -B "$work/build" -DCLEVIS_BUILD_FUZZERS=ON \
  -DCLEVIS_BUILD_GUI=OFF -DCMAKE_BUILD_TYPE=RelWithDebInfo >"$work/configure.log" 2>&1 ||
  { cat "$work/configure.log"; echo "configuring the fuzz build failed (kept $work)"; exit 1; }
cmake --build "$work/build" --target fuzz_mechanism_loader -j2 >"$work/build.log" 2>&1 ||
  { tail -n 40 "$work/build.log"; echo "building the fuzz target failed (kept $work)"; exit 1; }

mkdir "$work/corpus" "$work/findings"
if "$work/build/tests/fuzz/fuzz_mechanism_loader" -max_total_time="$seconds" -timeout=10 -rss_limit_mb=2048 \
     -dict="$src/tests/fuzz/mechanism.dict" -artifact_prefix="$work/findings/" -print_final_stats=1 \
     "$work/corpus" "$src/tests/fuzz/seeds" "$src/samples" >"$work/fuzz.log" 2>&1; then
  grep -E 'stat::number_of_executed_units|stat::new_units_added' "$work/fuzz.log" || true
  rm -rf "$work"
  exit 0
fi
tail -n 60 "$work/fuzz.log"
echo "the fuzzer found a problem; the failing input is in $work/findings/:"
ls "$work/findings"
exit 1
