#!/usr/bin/env bash
# Measures the live window's edits (DEVELOPERS.md, "Measured figures"): starts the window on the
# demo grand under Xvfb at 1366x768, waits for its curves, then types EDITS speaking lengths into
# key 1's length cell with xdotool (apt-get install xdotool), and prints the window's own timing
# of each edit until the table and the three curves are redrawn (-Dscalewright.timingReport).
#   src/test/scripts/edit-times.sh [EDITS] [LAUNCHER]   (default 14, target/scalewright/bin/scalewright;
#                                                        "java -jar target/scalewright.jar" works too)
set -euo pipefail
cd "$(dirname "$0")/../../.."
edits=${1:-14}
launcher=${2:-target/scalewright/bin/scalewright}
sheet=demo-instruments/grand-190/grand-190.csv
command -v xdotool >/dev/null || { echo "needs xdotool (apt-get install xdotool)" >&2; exit 1; }
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
echo "load average before: $(cut -d' ' -f1-3 /proc/loadavg)"
xvfb-run -a -s "-screen 0 1366x768x24" bash -c '
  JAVA_TOOL_OPTIONS="-Dscalewright.firstStartCautions=false -Dscalewright.timingReport=$1" $3 "$4" >/dev/null 2>&1 &
  pid=$!
  for _ in $(seq 240); do sleep 0.25; grep -q "cold start" "$1" 2>/dev/null && break; done
  sleep 1
  xdotool key Left   # from the wire cell, where the window puts the focus, to the length cell
  sleep 0.3
  for i in $(seq "$2"); do
    xdotool type --delay 20 "$((1500 + (i % 2) * 20))"
    xdotool key Return
    sleep 0.6
    xdotool key Up   # back to key 1
    sleep 0.3
  done
  sleep 1; kill "$pid"; wait "$pid" || true' _ "$work/timing.txt" "$edits" "$launcher" "$sheet"
echo "edit to table and curves redrawn, ms, in order:"
grep -o "redrawn: [0-9.]*" "$work/timing.txt" | awk '{ printf " %s", $2 } END { print "" }'
echo "load average after: $(cut -d' ' -f1-3 /proc/loadavg)"
