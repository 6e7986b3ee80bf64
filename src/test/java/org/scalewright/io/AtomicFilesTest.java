package org.scalewright.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
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

    private static byte[] bytes(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    private List<String> names() throws IOException {
        try (var files = Files.list(dir)) {
            return files.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void aSymbolicLinkIsRefusedAndNeitherItNorItsFileIsChanged() throws IOException {
        Path real = Files.writeString(dir.resolve("real.csv"), "old");
        Path link = Files.createSymbolicLink(dir.resolve("link.csv"), real.getFileName());
        OutputRefused e = assertThrows(OutputRefused.class, () -> AtomicFiles.write(link, bytes("new"), true));
        assertTrue(e.getMessage().contains("symbolic link (to real.csv)"), e.getMessage());
        assertTrue(Files.isSymbolicLink(link));
        assertEquals("old", Files.readString(real));
        assertEquals(List.of("link.csv", "real.csv"), names());
    }

    @Test
    void aNamedPipeIsRefusedWithoutOpeningIt() throws Exception {
        Path fifo = Fifos.make(dir.resolve("pipe.csv"));
        OutputRefused e = assertThrows(OutputRefused.class, () -> AtomicFiles.write(fifo, bytes("new"), true));
        assertTrue(e.getMessage().contains("named pipe (FIFO)"), e.getMessage());
        assertFalse(Files.isRegularFile(fifo), "still a pipe, not replaced by a file");
        assertEquals(List.of("pipe.csv"), names());
    }

    @Test
    void aReadOnlyFileIsRespectedEvenWhereTheFolderWouldAllowReplacingIt() throws IOException {
        Path f = Files.writeString(dir.resolve("ro.csv"), "old");
        Files.setPosixFilePermissions(f, PosixFilePermissions.fromString("r--r--r--"));
        OutputRefused e = assertThrows(OutputRefused.class, () -> AtomicFiles.write(f, bytes("new"), true));
        assertTrue(e.getMessage().contains("read-only"), e.getMessage());
        assertEquals("old", Files.readString(f));
        assertEquals(List.of("ro.csv"), names());
    }

    @Test
    void aFolderAndAMissingFolderAreNamed() {
        assertTrue(AtomicFiles.problemWithFile(dir).contains("it is a folder"));
        assertTrue(AtomicFiles.problemWithFile(dir.resolve("none").resolve("a.csv")).contains("does not exist"));
        assertEquals(null, AtomicFiles.problemWithFile(dir.resolve("new.csv")));
    }

    @Test
    void theBackupIsReplacedWholeAndKeepsOnlyThePreviousVersion() throws IOException {
        Path f = dir.resolve("s.csv");
        AtomicFiles.write(f, bytes("one"), true);
        assertEquals(List.of("s.csv"), names(), "nothing to keep the first time");
        AtomicFiles.write(f, bytes("two"), true);
        AtomicFiles.write(f, bytes("three"), true);
        assertEquals("three", Files.readString(f));
        assertEquals("two", Files.readString(dir.resolve("s.csv.bak")));
        assertEquals(List.of("s.csv", "s.csv.bak"), names());
    }

    @Test
    void staleTemporaryFilesOfAProcessThatIsGoneAreRemovedOnTheNextWrite() throws IOException {
        long gone = deadPid();
        long self = ProcessHandle.current().pid();
        Files.writeString(dir.resolve(".scalewright-tmp-" + gone + "-abc-s.csv"), "partial");
        Files.createDirectories(dir.resolve(".scalewright-new-" + gone + "-abc-r").resolve("x"));
        Path running = Files.writeString(dir.resolve(".scalewright-tmp-" + self + "-abc-s.csv"), "in progress");
        Path foreign = Files.writeString(dir.resolve(".scalewright-notes"), "not ours");
        AtomicFiles.write(dir.resolve("other.csv"), bytes("x"), false);
        assertEquals(List.of(".scalewright-notes", running.getFileName().toString(), "other.csv"), names());
        assertEquals("not ours", Files.readString(foreign));
    }

    /** @return a process id that no running process has */
    static long deadPid() throws IOException {
        try {
            Process p = new ProcessBuilder("true").start();
            p.waitFor();
            return p.pid();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException(e);
        }
    }
}
