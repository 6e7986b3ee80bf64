package org.scalewright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The swap of a folder of files (a report): a failure injected after any step, and a kill after any
 * step (a snapshot of the folder at that moment, then the tidying of the next write), leave the old
 * files or the new ones, never a mixture, and no temporary files.
 */
class FolderSwapTest {
    @TempDir
    Path tmp;

    private static final Map<String, byte[]> NEW = files("new", "a.csv", "b.pdf", "c.png");
    private static final Map<String, String> OLD = Map.of("a.csv", "old", "b.pdf", "old");

    private static Map<String, byte[]> files(String content, String... names) {
        Map<String, byte[]> m = new LinkedHashMap<>();
        for (String n : names) {
            m.put(n, content.getBytes(StandardCharsets.UTF_8));
        }
        return m;
    }

    /** A step that fails on purpose. */
    private static final class Injected extends IOException {
        Injected(String step) {
            super("injected after: " + step);
        }
    }

    private Path oldReport(Path parent) throws IOException {
        Path dir = Files.createDirectories(parent.resolve("report"));
        for (Map.Entry<String, String> e : OLD.entrySet()) {
            Files.writeString(dir.resolve(e.getKey()), e.getValue());
        }
        return dir;
    }

    private static List<String> steps(Path parent, boolean withOld) throws IOException {
        List<String> steps = new ArrayList<>();
        AtomicFiles.writeFolder(parent.resolve("report"), NEW, steps::add);
        return steps;
    }

    @Test
    void theStepsAreTheOnesTheSwapPromises() throws IOException {
        Path parent = Files.createDirectories(tmp.resolve("p"));
        oldReport(parent);
        assertEquals(List.of("created the new folder", "wrote a.csv", "wrote b.pdf", "wrote c.png",
                "renamed the old folder away", "renamed the new folder in", "deleted the old folder"),
                steps(parent, true));
        assertEquals("new", state(parent.resolve("report")));
        assertNoTemporaryFiles(parent);
    }

    @Test
    void aFailureAfterAnyStepLeavesTheOldFolderOrTheNewOneAndNoTemporaryFiles() throws IOException {
        int n = steps(Files.createDirectories(tmp.resolve("count")), false).size() + 1;
        for (boolean withOld : new boolean[] {true, false}) {
            for (int k = 0; k < n; k++) {
                Path parent = Files.createDirectories(tmp.resolve("fail-" + withOld + "-" + k));
                if (withOld) {
                    oldReport(parent);
                }
                final int failAt = k;
                List<String> done = new ArrayList<>();
                try {
                    AtomicFiles.writeFolder(parent.resolve("report"), NEW, step -> {
                        done.add(step);
                        if (done.size() - 1 == failAt) {
                            throw new Injected(step);
                        }
                    });
                } catch (Injected expected) {
                    // the write reports its failure
                }
                String state = state(parent.resolve("report"));
                boolean swapped = done.contains("renamed the new folder in");
                assertEquals(swapped ? "new" : withOld ? "old" : "absent", state,
                        "failure after step " + done + " (old folder: " + withOld + ")");
                assertNoTemporaryFiles(parent);
            }
        }
    }

    @Test
    void aKillAfterAnyStepLeavesTheOldFolderOrTheNewOneOnceTheNextWriteHasTidiedUp() throws IOException {
        int n = steps(Files.createDirectories(tmp.resolve("count")), true).size();
        for (int k = 0; k < n; k++) {
            Path parent = Files.createDirectories(tmp.resolve("kill-" + k));
            oldReport(parent);
            Path snapshot = tmp.resolve("snapshot-" + k);
            final int killAt = k;
            List<String> done = new ArrayList<>();
            assertThrows(Injected.class, () -> AtomicFiles.writeFolder(parent.resolve("report"), NEW, step -> {
                done.add(step);
                if (done.size() - 1 == killAt) {
                    copyTree(parent, snapshot); // what a kill at this moment leaves on disk
                    throw new Injected(step);
                }
            }));
            String atKill = state(snapshot.resolve("report"));
            boolean gap = done.get(done.size() - 1).equals("renamed the old folder away");
            assertEquals(gap ? "absent" : done.contains("renamed the new folder in") ? "new" : "old", atKill,
                    "state right after a kill after " + done);
            AtomicFiles.cleanStale(snapshot, pid -> false);
            String tidied = state(snapshot.resolve("report"));
            assertEquals(done.contains("renamed the new folder in") ? "new" : "old", tidied,
                    "after the next write's tidying, kill after " + done);
            assertNoTemporaryFiles(snapshot);
        }
    }

    @Test
    void aFolderHoldingOtherFilesIsRefusedAndKept() throws IOException {
        Path parent = Files.createDirectories(tmp.resolve("p"));
        Path dir = oldReport(parent);
        Files.writeString(dir.resolve("my-notes.txt"), "mine");
        OutputRefused e = assertThrows(OutputRefused.class, () -> AtomicFiles.writeFolder(dir, NEW));
        assertTrue(e.getMessage().contains("my-notes.txt"), e.getMessage());
        assertEquals("mine", Files.readString(dir.resolve("my-notes.txt")));
        assertNoTemporaryFiles(parent);
    }

    @Test
    void aLinkToAFolderIsRefused() throws IOException {
        Path parent = Files.createDirectories(tmp.resolve("p"));
        Path dir = oldReport(parent);
        Path link = Files.createSymbolicLink(parent.resolve("link"), dir.getFileName());
        assertThrows(OutputRefused.class, () -> AtomicFiles.writeFolder(link, NEW));
        assertTrue(Files.isSymbolicLink(link));
        assertEquals("old", state(dir));
    }

    /** @return "old", "new", "absent", or a description of a mixture */
    private static String state(Path dir) throws IOException {
        if (!Files.exists(dir)) {
            return "absent";
        }
        Map<String, String> found = new TreeMap<>();
        try (Stream<Path> s = Files.list(dir)) {
            for (Path p : s.toList()) {
                found.put(p.getFileName().toString(), Files.readString(p));
            }
        }
        if (found.equals(new TreeMap<>(OLD))) {
            return "old";
        }
        Map<String, String> fresh = new TreeMap<>();
        NEW.forEach((k, v) -> fresh.put(k, new String(v, StandardCharsets.UTF_8)));
        return found.equals(fresh) ? "new" : "mixed: " + found;
    }

    private static void assertNoTemporaryFiles(Path parent) throws IOException {
        try (Stream<Path> s = Files.list(parent)) {
            List<String> left = s.map(p -> p.getFileName().toString()).filter(n -> !n.equals("report")).toList();
            if (!left.isEmpty()) {
                fail("left beside the report: " + left);
            }
        }
        if (Files.isDirectory(parent.resolve("report"))) {
            try (Stream<Path> s = Files.list(parent.resolve("report"))) {
                assertFalse(s.anyMatch(p -> p.getFileName().toString().startsWith(AtomicFiles.TEMP_PREFIX)));
            }
        }
    }

    private static void copyTree(Path from, Path to) throws IOException {
        Files.walkFileTree(from, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult preVisitDirectory(Path d, BasicFileAttributes a) throws IOException {
                Files.createDirectories(to.resolve(from.relativize(d).toString()));
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult visitFile(Path f, BasicFileAttributes a) throws IOException {
                Files.copy(f, to.resolve(from.relativize(f).toString()));
                return FileVisitResult.CONTINUE;
            }
        });
    }
}
