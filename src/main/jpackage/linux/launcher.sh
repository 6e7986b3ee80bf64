#!/bin/sh
# Scalewright's launchers on Linux (bin/scalewright, bin/scalewright-cli), put in place of the ones
# jpackage makes, which ask rpm and dpkg at every start which package holds them (two `dpkg -S`
# searches of the whole package database: 0.2-0.7 s before Java starts). Runs the image's own
# Java with the options, class path and main class of lib/app/NAME.cfg, as jpackage wrote them.
self=$(readlink -f "$0")
here=$(dirname "$self")
app=$(readlink -f "$here/../lib/app")
cfg="$app/$(basename "$self").cfg"
[ -r "$cfg" ] || { echo "$0: $cfg is missing; reinstall Scalewright" >&2; exit 1; }
value() { sed -n "s/^$1=//p" "$cfg" | sed 's|\$APPDIR|'"$app"'|g'; }
# each option is one word (no blanks: the installer profile's options, DEVELOPERS.md), so the
# splitting of $options below is meant
options=$(value java-options)
exec "$here/../lib/runtime/bin/java" $options -cp "$(value app.classpath)" "$(value app.mainclass)" "$@"
