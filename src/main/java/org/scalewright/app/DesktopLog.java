package org.scalewright.app;

import java.nio.file.Path;
import java.util.Optional;
import java.util.logging.Level;
import java.util.logging.Logger;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.io.LogFiles;

/**
 * The window's rolling log in the user's folder ({@link LogFiles#userLogFolder()}): the start,
 * every message of the status line (files opened and saved, refused entries as warnings) and
 * faults of the program, so that a problem can be reported with what led to it.
 */
final class DesktopLog {
    static final Logger LOG = Logger.getLogger("org.scalewright");
    private static Optional<Path> file = Optional.empty();
    private static boolean started;

    private DesktopLog() {
    }

    /** Starts the log once; @return the newest log file, or empty when it cannot be written */
    static synchronized Optional<Path> start() {
        if (!started) {
            started = true;
            file = LogFiles.startRollingLog(LOG, LogFiles.userLogFolder());
            LOG.info("Scalewright " + AboutText.version() + " started (Java " + System.getProperty("java.version")
                    + ", " + System.getProperty("os.name") + ")");
            Thread.UncaughtExceptionHandler previous = Thread.getDefaultUncaughtExceptionHandler();
            Thread.setDefaultUncaughtExceptionHandler((t, e) -> {
                LOG.log(Level.SEVERE, "error in the program (thread " + t.getName() + ")", e);
                if (previous != null) {
                    previous.uncaughtException(t, e);
                } else {
                    e.printStackTrace();
                }
            });
        }
        return file;
    }

    /** @return the newest log file, when the log was started and can be written */
    static synchronized Optional<Path> file() {
        return file;
    }

    /** Logs the session's status messages, problems as warnings. */
    static void follow(ScaleSession session) {
        session.messageProperty().addListener((o, a, b) -> {
            if (b != null && !b.isBlank()) {
                LOG.log(session.messageIsProblemProperty().get() ? Level.WARNING : Level.INFO, b);
            }
        });
    }
}
