#!/usr/bin/env bash
# Kills `report` with SIGKILL at random moments and checks that the report folder is always wholly
# the old report or wholly the new one, and that no temporary files are left once a later write has
# run (AtomicFiles: the report is written into a new folder beside the target and swapped in).
#
# Usage, from the project root after `mvn -q -DskipTests package`:
#   src/test/scripts/report-kill-test.sh [TRIES]        (default 100)
# Environment: JAVA_OPTS (default "-XX:TieredStopAtLevel=1 -XX:+UseSerialGC", lighter on a shared machine);
# SCALEWRIGHT_JAR (default target/scalewright.jar; a copy lets a build run meanwhile).
#
# Each try runs `java -jar target/scalewright.jar report OTHER.csv --out DIR` over a folder holding the
# report of the other demo instrument (demo-instruments/grand-190 and upright-131 take turns) and kills
# it: in about half of the tries after a delay drawn uniformly over a whole run, in the others at a
# random moment up to 120 ms after the new folder appears beside DIR (the write and swap phase).
# The folder is then compared with reference reports of both instruments made first: every file
# byte for byte, except report.pdf (which carries its creation time) by its size. Outcomes:
#   old      wholly the report that was there before
#   new      wholly the new report (the run finished, or was killed after the swap)
#   aside    DIR absent and the old report wholly present under .scalewright-old-…: killed between the
#            two renames of the swap; the next write puts it back (counted as old; checked below)
#   MIXED    anything else — a failure
# Temporary entries (.scalewright-*) beside DIR are counted after each kill; a run that finished must
# leave none (it tidies those of killed runs first), and a last full run at the end must leave none.
# Exit status 0 when no try failed.
set -u
cd "$(dirname "$0")/../../.." || exit 2
jar=${SCALEWRIGHT_JAR:-target/scalewright.jar}
[ -f "$jar" ] || { echo "build the jar first: mvn -q -DskipTests package" >&2; exit 2; }
tries=${1:-100}
opts=${JAVA_OPTS:--XX:TieredStopAtLevel=1 -XX:+UseSerialGC}
A=demo-instruments/grand-190/grand-190.csv
B=demo-instruments/upright-131/upright-131.csv
work=$(mktemp -d "${TMPDIR:-/tmp}/report-kill.XXXXXX")
trap 'rm -rf "$work"' EXIT
parent=$work/p
out=$parent/report
mkdir "$parent"

report() { # sheet dir
  # shellcheck disable=SC2086
  java $opts -jar "$jar" report "$1" --out "$2" >/dev/null 2>"$work/err"
}
ms() { echo $(( $(date +%s%N) / 1000000 )); }
pause_ms() { sleep "$(awk -v m="$1" 'BEGIN { printf "%.3f", m / 1000 }')"; }
rand_ms() { echo $(( (RANDOM * 32768 + RANDOM) % ($1 + 1) )); }

t0=$(ms); report "$A" "$work/ref-A" || { cat "$work/err"; exit 1; }; full=$(( $(ms) - t0 ))
report "$B" "$work/ref-B" || { cat "$work/err"; exit 1; }

same_as() { # folder which(A|B) -> status 0 when the folder is wholly that reference
  local d=$1 ref=$work/ref-$2 f n
  [ "$(ls -A "$d" | sort)" = "$(ls -A "$ref" | sort)" ] || return 1
  for f in "$ref"/*; do
    n=${f##*/}
    if [ "$n" = report.pdf ]; then
      [ "$(stat -c %s "$f")" = "$(stat -c %s "$d/$n")" ] || return 1
    else
      cmp -s "$f" "$d/$n" || return 1
    fi
  done
}
state() { # prints A, B, aside-A, aside-B, absent or mixed
  local w a
  if [ -d "$out" ]; then
    for w in A B; do same_as "$out" "$w" && { echo "$w"; return; }; done
    echo mixed; return
  fi
  for a in "$parent"/.scalewright-old-*; do
    [ -d "$a" ] || continue
    for w in A B; do same_as "$a" "$w" && { echo "aside-$w"; return; }; done
  done
  echo absent
}
temps() { ls -A "$parent" | grep -c '^\.scalewright-'; }

cp -r "$work/ref-B" "$out"   # the existing report of the other piano
cur=B
old=0 new=0 aside=0 mixed=0 finished=0 killed_with_temps=0 left_after_finish=0 write_phase=0
for ((i = 1; i <= tries; i++)); do
  if [ "$cur" = A ]; then next=B sheet=$B; else next=A sheet=$A; fi
  # java itself in the background (not a function in a subshell), so that $! is the process killed
  # shellcheck disable=SC2086
  java $opts -jar "$jar" report "$sheet" --out "$out" >/dev/null 2>"$work/err" & pid=$!
  if (( RANDOM % 2 )); then
    pause_ms "$(rand_ms $(( full * 11 / 10 )))"
  else
    write_phase=$((write_phase + 1))
    while kill -0 "$pid" 2>/dev/null && ! compgen -G "$parent/.scalewright-new-*" >/dev/null; do sleep 0.002; done
    pause_ms "$(rand_ms 120)"
  fi
  kill -9 "$pid" 2>/dev/null
  wait "$pid" 2>/dev/null; rc=$?
  if kill -0 "$pid" 2>/dev/null; then echo "try $i: process $pid still runs after kill -9" >&2; exit 1; fi
  s=$(state); t=$(temps)
  [ "$rc" = 0 ] && finished=$((finished + 1))
  if [ "$s" = "$next" ]; then new=$((new + 1)); cur=$next
  elif [ "$s" = "$cur" ]; then old=$((old + 1))
  elif [ "$s" = "aside-$cur" ]; then aside=$((aside + 1))
  else mixed=$((mixed + 1)); echo "try $i: MIXED ($s), killed running $next over $cur" >&2
       cp -r "$parent" "$work/../report-kill-failure-$i" 2>/dev/null
  fi
  if [ "$rc" = 0 ] && [ "$t" != 0 ]; then left_after_finish=$((left_after_finish + 1)); echo "try $i: finished run left $t temporary entries" >&2; fi
  [ "$rc" != 0 ] && [ "$t" != 0 ] && killed_with_temps=$((killed_with_temps + 1))
  (( i % 10 == 0 )) && echo "… $i tries: old $old, new $new, aside $aside, mixed $mixed" >&2
done

# a last full write tidies everything a kill left and must leave exactly the new report
if [ "$cur" = A ]; then next=B sheet=$B; else next=A sheet=$A; fi
report "$sheet" "$out" || { echo "last run failed: $(cat "$work/err")" >&2; mixed=$((mixed + 1)); }
final=$(state); final_temps=$(temps)
[ "$final" = "$next" ] || { echo "after the last run: $final" >&2; mixed=$((mixed + 1)); }

echo "report-kill-test: $tries kills (a whole run took ${full} ms; $write_phase aimed at the write phase)"
echo "  wholly old: $old   wholly new: $new   old renamed aside (put back by the next write): $aside   MIXED: $mixed"
echo "  runs that finished before the kill: $finished; temporary entries left by a finished run: $left_after_finish"
echo "  kills that left temporary entries (tidied by the next write): $killed_with_temps"
echo "  after a last full run: folder $( [ "$final" = "$next" ] && echo 'wholly new' || echo "$final" ), temporary entries left: $final_temps"
[ "$mixed" = 0 ] && [ "$left_after_finish" = 0 ] && [ "$final_temps" = 0 ]
