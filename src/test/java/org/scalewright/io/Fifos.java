package org.scalewright.io;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;

/** Makes a named pipe with the system's {@code mkfifo}; a test using it is skipped where there is none. */
public final class Fifos {
    private Fifos() {
    }

    public static Path make(Path fifo) throws Exception {
        int rc;
        try {
            rc = new ProcessBuilder("mkfifo", fifo.toString()).redirectErrorStream(true).start().waitFor();
        } catch (java.io.IOException e) {
            rc = -1;
        }
        assumeTrue(rc == 0 && Files.exists(fifo), "mkfifo is not available here");
        return fifo;
    }
}
