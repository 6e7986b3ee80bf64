package org.scalewright.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFilesTest {
    @TempDir
    Path dir;

    @Test
    void newFileIsReadableByOthersAndOldPermissionsAreKept() throws IOException {
        Path f = dir.resolve("a.csv");
        AtomicFiles.write(f, "one".getBytes(StandardCharsets.UTF_8), false);
        assertEquals("rw-r--r--", PosixFilePermissions.toString(Files.getPosixFilePermissions(f)));
        Files.setPosixFilePermissions(f, PosixFilePermissions.fromString("rw-rw----"));
        AtomicFiles.write(f, "two".getBytes(StandardCharsets.UTF_8), true);
        assertEquals("rw-rw----", PosixFilePermissions.toString(Files.getPosixFilePermissions(f)));
        assertEquals("two", Files.readString(f));
        assertEquals("one", Files.readString(dir.resolve("a.csv.bak")));
    }

    @Test
    void aFailedWriteLeavesTheOldFileAndNoTemporaryFile() throws IOException {
        Path f = dir.resolve("keep.csv");
        Files.writeString(f, "old");
        Path missingDir = dir.resolve("no-such-dir").resolve("x.csv");
        assertThrows(IOException.class, () -> AtomicFiles.write(missingDir, new byte[] {1}, false));
        assertArrayEquals("old".getBytes(StandardCharsets.UTF_8), Files.readAllBytes(f));
        try (var files = Files.list(dir)) {
            assertTrue(files.allMatch(p -> p.getFileName().toString().equals("keep.csv")));
        }
    }
}
