package org.scalewright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.logging.Handler;
import java.util.logging.Level;
import java.util.logging.Logger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The window's rolling log: where each system keeps it, and that it is written and rolls. */
class LogFilesTest {
    @TempDir
    Path dir;

    @Test
    void eachSystemKeepsTheLogInItsUsualPlace() {
        Path home = Path.of("/home/tuner");
        // XDG Base Directory Specification 0.8: $XDG_STATE_HOME holds logs; without it, the
        // program's data folder under ~/.local/share (common practice, no source)
        assertEquals(home.resolve(".local/share/scalewright"), LogFiles.userLogFolder("Linux", home, Map.of()));
        assertEquals(Path.of("/var/tmp/state/scalewright"),
                LogFiles.userLogFolder("Linux", home, Map.of("XDG_STATE_HOME", "/var/tmp/state")));
        assertEquals(home.resolve(".local/share/scalewright"),
                LogFiles.userLogFolder("Linux", home, Map.of("XDG_STATE_HOME", "relative/not/allowed")),
                "the XDG specification ignores a relative path");
        // Apple's File System Programming Guide: logs under ~/Library/Logs
        assertEquals(home.resolve("Library/Logs/Scalewright"), LogFiles.userLogFolder("Mac OS X", home, Map.of()));
        // Windows known folder FOLDERID_LocalAppData (%LOCALAPPDATA%) for per-user, per-machine data
        assertEquals(Path.of("C:/Users/tuner/AppData/Local").resolve("Scalewright").resolve("logs"),
                LogFiles.userLogFolder("Windows 11", home, Map.of("LOCALAPPDATA", "C:/Users/tuner/AppData/Local")));
    }

    @Test
    void theRollingLogIsWrittenAndKeepsAtMostItsFiles() throws Exception {
        Logger logger = Logger.getLogger("org.scalewright.test.log" + System.nanoTime());
        Path folder = dir.resolve("logs");
        Path newest = LogFiles.startRollingLog(logger, folder).orElseThrow();
        try {
            logger.info("opened grand-190.csv");
            logger.log(Level.WARNING, "not saved", new IllegalStateException("disk full"));
            flush(logger);
            String text = Files.readString(newest, StandardCharsets.UTF_8);
            assertTrue(text.contains(" INFO opened grand-190.csv"), text);
            assertTrue(text.contains(" WARNING not saved"), text);
            assertTrue(text.contains("IllegalStateException: disk full"), text);
            String big = "x".repeat(64 * 1024);
            for (int i = 0; i < LogFiles.ROLL_BYTES / big.length() * (LogFiles.ROLL_COUNT + 1); i++) {
                logger.info(big);
            }
            flush(logger);
            try (var files = Files.list(folder)) {
                long logs = files.filter(p -> p.getFileName().toString().matches("scalewright-\\d+\\.log")).count();
                assertEquals(LogFiles.ROLL_COUNT, logs, "rolled over, the oldest dropped");
            }
            assertTrue(Files.size(newest) <= LogFiles.ROLL_BYTES + big.length() + 200);
        } finally {
            for (Handler h : logger.getHandlers()) {
                logger.removeHandler(h);
                h.close();
            }
        }
    }

    @Test
    void aFolderThatCannotBeMadeMeansNoLogAndNoFailure() throws Exception {
        Path file = Files.writeString(dir.resolve("taken"), "a file where the folder should be");
        Logger logger = Logger.getLogger("org.scalewright.test.nolog" + System.nanoTime());
        assertTrue(LogFiles.startRollingLog(logger, file.resolve("logs")).isEmpty());
        assertEquals(0, logger.getHandlers().length);
    }

    private static void flush(Logger logger) {
        for (Handler h : logger.getHandlers()) {
            h.flush();
        }
    }
}
