package org.scalewright.app;

import java.nio.file.Path;
import java.util.Optional;

/**
 * What the window should open at start.
 *
 * @param sheet   a sheet named on the command line ({@code open FILE}), or empty for the demo grand
 * @param problem a problem with the command line to show in the window, or ""
 */
record LaunchRequest(Optional<Path> sheet, String problem) {

    /**
     * @param args the program's arguments: none, or {@code open FILE}
     */
    static LaunchRequest parse(String[] args) {
        if (args.length == 0) {
            return new LaunchRequest(Optional.empty(), "");
        }
        if (args.length == 2) {
            return new LaunchRequest(Optional.of(Path.of(args[1])), "");
        }
        if (args.length < 2) {
            return new LaunchRequest(Optional.empty(), "open needs a sheet file: open FILE.csv; showing the demo");
        }
        return new LaunchRequest(Optional.of(Path.of(args[1])), "open takes one sheet file; only "
                + args[1] + " was opened");
    }
}
