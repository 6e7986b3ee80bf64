package org.scalewright;

import org.scalewright.cli.ScalewrightCommand;

/**
 * Entry point of {@code scalewright.jar}: with a command, the headless command line; without
 * one (or with {@code open FILE}), the desktop window.
 */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        System.exit(ScalewrightCommand.runOnConsole(args));
    }
}
