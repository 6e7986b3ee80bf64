package org.scalewright;

import org.scalewright.app.DesktopLauncher;
import org.scalewright.cli.ScalewrightCommand;

/**
 * Entry point of {@code scalewright.jar}: without arguments, the desktop window on the demo
 * grand; with {@code open FILE}, the window on that sheet; with any other command, the
 * headless command line.
 */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        if (args.length == 0 || args[0].equals("open")) {
            System.exit(DesktopLauncher.run(args));
        }
        System.exit(ScalewrightCommand.runOnConsole(args));
    }
}
