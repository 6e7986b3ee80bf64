package org.scalewright.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.logging.FileHandler;
import java.util.logging.Level;
import java.util.logging.Logger;
import java.util.logging.Formatter;
import java.util.logging.LogRecord;

/**
 * The program's own logs: text appended to a file the program owns (error details, timings),
 * never a user's document, so no temporary file and move are needed; and the window's rolling
 * log in the user's folder ({@link #userLogFolder}).
 */
public final class LogFiles {
    /** Size at which the window's log rolls over to the next file, bytes (1 MiB). */
    public static final int ROLL_BYTES = 1 << 20;
    /** Number of rolled log files kept: {@code scalewright-0.log} (newest) … {@code scalewright-2.log}. */
    public static final int ROLL_COUNT = 3;
    /** The name pattern of the rolling log ({@code %g} is the generation, 0 the newest). */
    public static final String ROLL_PATTERN = "scalewright-%g.log";

    private LogFiles() {
    }

    /**
     * @param log  the log file, created when missing
     * @param text the text to add, with its own line ends
     * @return false when the log cannot be written (the caller goes on without it)
     */
    public static boolean append(Path log, String text) {
        try {
            Files.writeString(log, text, StandardCharsets.UTF_8, StandardOpenOption.CREATE, StandardOpenOption.APPEND);
            return true;
        } catch (IOException | SecurityException e) {
            return false;
        }
    }

    /**
     * The folder of the user's log files, by the usual place of each system: on Windows
     * {@code %LOCALAPPDATA%\Scalewright\logs}, on macOS {@code ~/Library/Logs/Scalewright},
     * elsewhere {@code $XDG_STATE_HOME/scalewright} when that is set, else
     * {@code ~/.local/share/scalewright}.
     *
     * @param osName  the {@code os.name} system property
     * @param home    the user's home folder
     * @param env     the environment variables
     */
    public static Path userLogFolder(String osName, Path home, Map<String, String> env) {
        String os = osName == null ? "" : osName.toLowerCase(Locale.ROOT);
        if (os.startsWith("windows")) {
            String local = env.get("LOCALAPPDATA");
            Path base = local == null || local.isBlank() ? home.resolve("AppData").resolve("Local") : Path.of(local);
            return base.resolve("Scalewright").resolve("logs");
        }
        if (os.startsWith("mac")) {
            return home.resolve("Library").resolve("Logs").resolve("Scalewright");
        }
        String state = env.get("XDG_STATE_HOME");
        if (state != null && !state.isBlank() && Path.of(state).isAbsolute()) {
            return Path.of(state).resolve("scalewright");
        }
        return home.resolve(".local").resolve("share").resolve("scalewright");
    }

    /** @return the log folder of this user on this system */
    public static Path userLogFolder() {
        return userLogFolder(System.getProperty("os.name"), Path.of(System.getProperty("user.home")), System.getenv());
    }

    /** @return the newest file of the rolling log in {@code folder} */
    public static Path newestRollingLog(Path folder) {
        return folder.resolve(ROLL_PATTERN.replace("%g", "0"));
    }

    /**
     * Sends {@code logger}'s records (INFO and above) to a rolling log in {@code folder}:
     * {@value #ROLL_COUNT} files of at most {@value #ROLL_BYTES} bytes, the newest
     * {@code scalewright-0.log}, appended to across starts. The folder is made when missing.
     *
     * @return the newest log file, or empty when the folder or file cannot be written (the
     *         program goes on without a log)
     */
    public static Optional<Path> startRollingLog(Logger logger, Path folder) {
        try {
            Files.createDirectories(folder);
            FileHandler h = new FileHandler(folder.resolve(ROLL_PATTERN).toString().replace("\\", "/"),
                    ROLL_BYTES, ROLL_COUNT, true);
            h.setEncoding(StandardCharsets.UTF_8.name());
            h.setFormatter(new OneLine());
            h.setLevel(Level.INFO);
            logger.addHandler(h);
            logger.setUseParentHandlers(false); // the log file has it; the terminal stays quiet
            if (logger.getLevel() == null || logger.getLevel().intValue() > Level.INFO.intValue()) {
                logger.setLevel(Level.INFO);
            }
            return Optional.of(newestRollingLog(folder));
        } catch (IOException | SecurityException | IllegalArgumentException e) {
            return Optional.empty();
        }
    }

    /** One line a record: {@code 2026-12-02T17:30:00.123Z INFO opened …}, a stack trace below it. */
    private static final class OneLine extends Formatter {
        @Override
        public String format(LogRecord r) {
            StringBuilder b = new StringBuilder().append(r.getInstant()).append(' ').append(r.getLevel().getName())
                    .append(' ').append(formatMessage(r)).append(System.lineSeparator());
            if (r.getThrown() != null) {
                java.io.StringWriter w = new java.io.StringWriter();
                r.getThrown().printStackTrace(new java.io.PrintWriter(w));
                b.append(w);
            }
            return b.toString();
        }
    }
}
