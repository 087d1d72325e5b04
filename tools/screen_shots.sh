#!/bin/sh
# Looks at the desktop window as a user sees it on a real screen size: opens a
# sample on a virtual X screen, takes a picture, clicks a point (e.g. a body in
# the Parts panel), drags from one point to another (e.g. the cycle slider),
# rests the pointer on a third (e.g. the plots, for their readout) and takes a
# second picture.
#   tools/screen_shots.sh BUILD_DIR WIDTHxHEIGHT OUT_PREFIX [SAMPLE [CLICK_X CLICK_Y FROM_X FROM_Y TO_X TO_Y HOVER_X HOVER_Y]]
# Needs Xvfb, xdotool and ImageMagick's `import`. Writes OUT_PREFIX-open.png and OUT_PREFIX-used.png.
set -eu
build=$(cd "$1" && pwd)
size=$2
out=$3
src=$(cd "$(dirname "$0")/.." && pwd)
sample=${4:-$src/samples/dwell_six_bar.json}
display=:${CLEVIS_SHOT_DISPLAY:-7}
Xvfb "$display" -screen 0 "${size}x24" >/dev/null 2>&1 &
xvfb=$!
trap 'kill $app $xvfb 2>/dev/null || true' EXIT
sleep 2
DISPLAY=$display "$build/app/clevis" "$sample" &
app=$!
sleep 6
DISPLAY=$display import -window root "$out-open.png"
if [ $# -ge 12 ]; then
  DISPLAY=$display xdotool mousemove "$5" "$6" click 1
  sleep 1
  DISPLAY=$display xdotool mousemove "$7" "$8" mousedown 1 mousemove "$9" "${10}" mouseup 1
  sleep 2
  DISPLAY=$display xdotool mousemove "${11}" "${12}"
  sleep 1
fi
DISPLAY=$display import -window root "$out-used.png"
