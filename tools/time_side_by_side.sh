#!/usr/bin/env bash
# Whole-process timing of several commands run in turn (so that a machine
# getting busier or quieter affects them alike): the median wall and CPU
# (user + system) time of each, in ms, after three runs not counted. Wall
# time is read to the microsecond (bash's EPOCHREALTIME), CPU time to the
# millisecond (bash's `time`), so that starts of a few ms can be told apart.
#   tools/time_side_by_side.sh RUNS 'COMMAND 1' 'COMMAND 2' ...
# e.g. tools/time_side_by_side.sh 40 '/tmp/old/clevis-cli --help' 'build/app/clevis-cli --help'
set -euo pipefail
export LC_ALL=C  # a decimal point in EPOCHREALTIME
runs=$1
shift
tmp=$(mktemp -d)
trap 'rm -rf "$tmp"' EXIT
TIMEFORMAT='%3U %3S'
for ((i = 0; i < runs + 3; ++i)); do
  for ((c = 1; c <= $#; ++c)); do
    # bash's `time` keyword reports to the group's stderr, the command's own
    # output goes to /dev/null; no subshell stands between them.
    { time {
      start=$EPOCHREALTIME
      eval "${!c}" >/dev/null 2>&1 || true
      end=$EPOCHREALTIME
    }; } 2>"$tmp/cpu"
    ((i < 3)) || echo "$start $end $(<"$tmp/cpu")" >>"$tmp/$c"
  done
done
median() { sort -g | awk '{v[NR] = $1} END {print (NR % 2 ? v[(NR + 1) / 2] : (v[NR / 2] + v[NR / 2 + 1]) / 2)}'; }
for ((c = 1; c <= $#; ++c)); do
  wall=$(awk '{print ($2 - $1) * 1000}' "$tmp/$c" | median)
  cpu=$(awk '{print ($3 + $4) * 1000}' "$tmp/$c" | median)
  printf '%10.2f ms wall %8.1f ms CPU  %s\n' "$wall" "$cpu" "${!c}"
done
