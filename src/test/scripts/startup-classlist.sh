#!/usr/bin/env bash
# Makes src/main/jpackage/scalewright.classlist: the classes a start loads, from which the installer
# profile (and the .deb's postinst) make the class-data-sharing archive of the app image.
# Two training runs of the jar: the window on the demo grand until its curves are drawn (under
# Xvfb, as ../shared/tools/screenshot installs it) and `analyze` of the demo grand. Run from the
# project root after `mvn -q -DskipTests package`; commit the list when the code a start loads has
# changed much (a class missing from the list is only loaded the slow way).
set -euo pipefail
cd "$(dirname "$0")/../../.."
jar=target/scalewright.jar
sheet=demo-instruments/grand-190/grand-190.csv
out=src/main/jpackage/scalewright.classlist
[ -f "$jar" ] || { echo "build the jar first: mvn -q -DskipTests package" >&2; exit 1; }
command -v xvfb-run >/dev/null || { echo "needs xvfb-run (apt-get install xvfb libgtk-3-0)" >&2; exit 1; }
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
# the window: ended once the timing report says the curves are drawn
xvfb-run -a -s "-screen 0 1366x768x24" bash -c '
  java -XX:DumpLoadedClassList="$1/window.lst" -Dscalewright.firstStartCautions=false \
       -Dscalewright.timingReport="$1/timing.txt" -jar "$2" "$3" >/dev/null 2>&1 &
  pid=$!
  for _ in $(seq 240); do sleep 0.5; grep -q "cold start" "$1/timing.txt" 2>/dev/null && break; done
  sleep 1; kill "$pid"; wait "$pid" || true' _ "$work" "$jar" "$sheet"
grep -q "cold start" "$work/timing.txt" || { echo "the window did not draw its curves within 2 minutes" >&2; exit 1; }
java -XX:DumpLoadedClassList="$work/cli.lst" -jar "$jar" analyze "$sheet" >/dev/null
# the window's classes in their order, then the command line's not already listed
awk 'NR == FNR { seen[$0] = 1; print; next } !seen[$0]++' "$work/window.lst" "$work/cli.lst" > "$out"
echo "$(wc -l < "$out") classes in $out"
