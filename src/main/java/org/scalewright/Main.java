package org.scalewright;

import org.scalewright.app.DesktopLauncher;
import org.scalewright.app.LaunchRequest;
import org.scalewright.cli.ScalewrightCommand;

/**
 * Entry point of {@code scalewright.jar} and of the installed program's launcher: without
 * arguments, the desktop window on the demo grand; with {@code open FILE} or a sheet file alone
 * (as a file manager passes it), the window on that sheet; with any other command, and with
 * {@code open --help}, the headless command line.
 */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        if (LaunchRequest.wantsWindow(args, ScalewrightCommand::isCommand)) {
            System.exit(DesktopLauncher.run(args));
        }
        System.exit(ScalewrightCommand.runOnConsole(args));
    }
}
