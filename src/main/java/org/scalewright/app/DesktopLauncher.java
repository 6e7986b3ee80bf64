package org.scalewright.app;

import java.lang.System.Logger;
import java.lang.System.Logger.Level;
import javafx.application.Application;

/**
 * Starts the desktop window from the launcher, which must not itself be a JavaFX application
 * class (the program is one jar with JavaFX on the class path).
 */
public final class DesktopLauncher {
    private static final Logger LOG = System.getLogger("org.scalewright.app");
    /** JavaFX's own logger; kept here so that its level stays set. */
    private static final java.util.logging.Logger JAVAFX_LOG = java.util.logging.Logger.getLogger("javafx");

    private DesktopLauncher() {
    }

    /**
     * Opens the window and returns when it is closed.
     *
     * @param args none (the demo grand), {@code open FILE} or a bare {@code FILE} (see
     *             {@link LaunchRequest#wantsWindow})
     * @return 0 when the window ran, 1 when it could not be opened (e.g. no display)
     */
    public static int run(String[] args) {
        // JavaFX warns that it runs from the class path, which is how this one jar is built
        JAVAFX_LOG.setLevel(java.util.logging.Level.SEVERE);
        try {
            Warmup.start(LaunchRequest.parse(args));
            OpenFileEvents.listenOnMacOs();
            Application.launch(ScalewrightApp.class, args);
            return 0;
        } catch (RuntimeException e) {
            LOG.log(Level.ERROR, "the window could not be opened (" + e.getMessage() + "). Without a display, use "
                    + "the command line: java -jar scalewright.jar --help");
            return 1;
        }
    }
}
