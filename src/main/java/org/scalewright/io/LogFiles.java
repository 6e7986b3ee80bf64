package org.scalewright.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;

/**
 * Appends to the program's own logs (error details, timings): text added at the end of a file
 * the program owns, never a user's document, so no temporary file and move are needed.
 */
public final class LogFiles {
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
}
