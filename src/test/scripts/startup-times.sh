#!/usr/bin/env bash
# Measures the start of the packaged program (DEVELOPERS.md, "Measured figures"): after
# `mvn -Pinstaller -DskipTests package`, from the project root:
#   src/test/scripts/startup-times.sh [RUNS]      (default 10)
#   WINDOW="java -jar target/scalewright.jar" src/test/scripts/startup-times.sh   (the window from the jar instead)
# 1. cold start of the app image's launcher to a window with its three curves drawn, from the
#    window's own timing report (-Dscalewright.timingReport; from the launch instant this script
#    passes in -Dscalewright.launchedAt to the first frame with all curves), under Xvfb at
#    1366x768, RUNS times;
# 2. `analyze` of the demo grand through the launchers, wall time with hyperfine
#    (apt-get install hyperfine), after one warm-up run.
# Also prints the load average: on the shared 2-core machine other builds inflate every figure.
set -euo pipefail
cd "$(dirname "$0")/../../.."
runs=${1:-10}
image=target/scalewright
sheet=demo-instruments/grand-190/grand-190.csv
[ -x "$image/bin/scalewright" ] || { echo "build the app image first: mvn -Pinstaller -DskipTests package" >&2; exit 1; }
echo "load average before: $(cut -d' ' -f1-3 /proc/loadavg)"
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
for i in $(seq "$runs"); do
  xvfb-run -a -s "-screen 0 1366x768x24" bash -c '
    JAVA_TOOL_OPTIONS="-Dscalewright.firstStartCautions=false -Dscalewright.timingReport=$1 -Dscalewright.launchedAt=$(date +%s%3N)" \
      $2 "$3" >/dev/null 2>&1 &
    pid=$!
    for _ in $(seq 240); do sleep 0.25; grep -q "cold start" "$1" 2>/dev/null && break; done
    kill "$pid"; wait "$pid" || true' _ "$work/timing-$i.txt" "${WINDOW:-$image/bin/scalewright}" "$sheet"
  cat "$work/timing-$i.txt" >> "$work/timing.txt" 2>/dev/null || true
done
echo "window with curves (ms from launch), ${WINDOW:-$image/bin/scalewright}:"
grep "cold start" "$work/timing.txt" | sed 's/^/  /'
grep -o "curves: [0-9]*" "$work/timing.txt" | awk '{ print $2 }' | sort -n \
  | awk '{ a[NR] = $1 } END { if (NR) printf "  %d runs: min %d, median %d, max %d ms\n", NR, a[1], a[int((NR + 1) / 2)], a[NR] }'
hyperfine --warmup 1 --runs "$runs" --output null \
  "$image/bin/scalewright analyze $sheet" "$image/bin/scalewright-cli analyze $sheet" \
  "java -jar target/scalewright.jar analyze $sheet"
echo "load average after: $(cut -d' ' -f1-3 /proc/loadavg)"
