#!/bin/sh
# The app image's start-up caches (DEVELOPERS.md, "Installers"), run by the installer profile:
#   startup-cache.sh prepare APPDIR JAVA SHEET   before packaging
#   startup-cache.sh dump APPDIR JAVA            after packaging
# APPDIR is the image's folder of the jar and the launchers' cfg files (lib/app on Linux), JAVA
# the image's own java.
# The image's own runtime decides how:
# - Java 25 or later: an ahead-of-time cache per launcher (JEP 483 and 514), made by a training
#   run of each: the window on SHEET until its curves are drawn (under xvfb-run where there is no
#   display), and `analyze` of SHEET. The caches stay in lib/app and go into the package as they
#   are: such a cache still serves when the image is moved, as long as the jar keeps its
#   modification time, which it records in lib/app/scalewright.jar.time for the .deb's postinst
#   to put back (a package tool copies the file with a new one).
# - Java 17 to 24: one class-data-sharing archive from the class list lib/app/scalewright.classlist.
#   Java 17 ties it to the jar's path, so `dump` makes it for the image in target/ after the
#   package was made without it, and the .deb's postinst makes it where the program is installed.
# `prepare` appends the matching options to each launcher's lib/app/NAME.cfg (read by jpackage's
# launchers and by linux/launcher.sh). A cache that cannot be made only means a slower start.
set -eu
step=$1
app=$(cd "$2" && pwd)
java=$(cd "$(dirname "$3")" && pwd)/$(basename "$3")
feature=$(sed -n 's/^JAVA_VERSION="\([0-9]*\).*/\1/p' "$(dirname "$(dirname "$java")")/release")

# add_options LAUNCHER OPTION...: appends java-options lines to the launcher's cfg (its last
# section is [JavaOptions])
add_options() {
    cfg="$app/$1.cfg"
    shift
    for o in "$@"; do
        printf 'java-options=%s\n' "$o" >> "$cfg"
    done
}

# the options a launcher's cfg gives the JVM, with $APPDIR resolved: a training run uses the
# same ones as the runs that use its cache; each is one word (DEVELOPERS.md, "Installers")
options_of() {
    sed -n 's/^java-options=//p' "$app/$1.cfg" | sed "s|\\\$APPDIR|$app|g"
}


case "$step" in
    prepare)
        sheet=$4
        if [ "$feature" -ge 25 ]; then
            # JavaFX and SQLite load native code and JavaFX uses sun.misc.Unsafe: allowed, so that
            # no warning reaches the terminal
            for l in scalewright scalewright-cli; do
                add_options "$l" --enable-native-access=ALL-UNNAMED --sun-misc-unsafe-memory-access=allow \
                    -Xlog:aot=off -Xlog:cds=off
            done
            # shellcheck disable=SC2046
            "$java" $(options_of scalewright-cli) -XX:AOTCacheOutput="$app/scalewright-cli.aot" \
                -cp "$app/scalewright.jar" org.scalewright.Main analyze "$sheet" >/dev/null 2>&1 \
                || echo "startup-cache: the command line's training run failed; no cache for it" >&2
            if [ -n "${DISPLAY:-}" ] || [ "$(uname)" = Darwin ]; then
                sh "$0" window-run "$app" "$java" "$sheet"
            elif command -v xvfb-run >/dev/null; then
                xvfb-run -a -s "-screen 0 1366x768x24" sh "$0" window-run "$app" "$java" "$sheet"
            else
                echo "startup-cache: no display and no xvfb-run: the window starts without its cache" >&2
            fi
            rm -f "$app"/*.aot.config # left by a training run that did not end well
            stat -c %Y "$app/scalewright.jar" > "$app/scalewright.jar.time" 2>/dev/null \
                || stat -f %m "$app/scalewright.jar" > "$app/scalewright.jar.time"
            for l in scalewright scalewright-cli; do
                if [ -f "$app/$l.aot" ]; then
                    add_options "$l" "-XX:AOTCache=\$APPDIR/$l.aot"
                fi
            done
        else
            for l in scalewright scalewright-cli; do
                add_options "$l" "-XX:SharedArchiveFile=\$APPDIR/scalewright.jsa" -Xshare:auto -Xlog:cds=off \
                    -Xlog:cds+dynamic=off -XX:+UnlockDiagnosticVMOptions -XX:ArchiveRelocationMode=0
            done
        fi
        ;;
    window-run)
        # the window's training run, on a display: ended once its timing report says the curves
        # are drawn (a JVM ended by SIGTERM still writes its cache). Its settings, recent files
        # and log go to a folder of its own, not the building user's.
        sheet=$(cd "$(dirname "$4")" && pwd)/$(basename "$4")
        work=$(mktemp -d)
        unset XDG_STATE_HOME XDG_DATA_HOME XDG_CONFIG_HOME
        # shellcheck disable=SC2046
        "$java" $(options_of scalewright) -XX:AOTCacheOutput="$app/scalewright.aot" -Duser.home="$work" \
            -Dscalewright.firstStartCautions=false -Dscalewright.timingReport="$work/timing.txt" \
            -cp "$app/scalewright.jar" org.scalewright.Main "$sheet" >/dev/null 2>&1 &
        pid=$!
        for _ in $(seq 480); do
            sleep 0.25
            grep -q "cold start" "$work/timing.txt" 2>/dev/null && break
        done
        sleep 1
        grep -q "cold start" "$work/timing.txt" 2>/dev/null \
            || echo "startup-cache: the window's training run drew no curves in 2 minutes" >&2
        kill "$pid"
        wait "$pid" || true
        rm -rf "$work"
        ;;
    dump)
        if [ "$feature" -lt 25 ]; then
            "$java" -Xshare:dump -XX:SharedClassListFile="$app/scalewright.classlist" \
                -XX:SharedArchiveFile="$app/scalewright.jsa" -Xlog:cds=off -cp "$app/scalewright.jar" >/dev/null
        fi
        ;;
    *)
        echo "usage: startup-cache.sh prepare APPDIR JAVA SHEET | dump APPDIR JAVA" >&2
        exit 2
        ;;
esac
