package org.scalewright.archive;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.model.StringBreak;

/**
 * Kills a process writing to an archive at a random moment, again and again, and checks after every
 * kill that the archive opens cleanly, {@code PRAGMA integrity_check} says ok, every change the child
 * reported as committed is there with its content, and no row is half written (each row carries a
 * check of its own content). Two lanes of 100 kills each run side by side, each on its own archive,
 * which grows over its kills: 200 kills by default, about a minute and a half on two shared cores.
 * {@code -Dscalewright.killTries=N} sets the number of kills per lane.
 */
class ArchiveKillTest {
    private static final int TRIES_PER_LANE = Integer.getInteger("scalewright.killTries", 100);
    private static final int LANES = 2;

    @TempDir
    Path tempDir;
    /** A folder in memory where there is one (/dev/shm), so the test does not wait on a shared disk. */
    private Path dir;

    private record Lane(int kills, int committed, int midTransaction, List<String> problems) {
    }

    private final ExecutorService readers = Executors.newCachedThreadPool();

    @Test
    void killsDuringRandomWritesLoseNothingCommitted() throws Exception {
        Path shm = Path.of("/dev/shm");
        dir = Files.isDirectory(shm) && Files.isWritable(shm) ? Files.createTempDirectory(shm, "scalewright-kill")
                : tempDir;
        try {
            killLanes();
        } finally {
            if (!dir.equals(tempDir)) {
                try (var walk = Files.walk(dir)) {
                    walk.sorted(java.util.Comparator.reverseOrder()).forEach(f -> f.toFile().delete());
                }
            }
        }
    }

    private void killLanes() throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(LANES);
        try {
            List<Future<Lane>> lanes = new ArrayList<>();
            for (int lane = 0; lane < LANES; lane++) {
                int l = lane;
                lanes.add(pool.submit(() -> runLane(l)));
            }
            int kills = 0;
            int committed = 0;
            int midTransaction = 0;
            List<String> problems = new ArrayList<>();
            for (Future<Lane> f : lanes) {
                Lane r = f.get(10, TimeUnit.MINUTES);
                kills += r.kills();
                committed += r.committed();
                midTransaction += r.midTransaction();
                problems.addAll(r.problems());
            }
            assertEquals(List.of(), problems);
            assertEquals(LANES * TRIES_PER_LANE, kills);
            assertTrue(committed > kills, "the children committed changes between kills: " + committed);
            // a kill in the middle of a transaction leaves its rollback journal behind
            assertTrue(TRIES_PER_LANE < 50 || midTransaction > 0, "kills during a transaction: " + midTransaction);
            System.out.printf("archive kill test: %d kills, %d changes reported committed, %d kills left a "
                    + "rollback journal%n", kills, committed, midTransaction);
        } finally {
            pool.shutdownNow();
            readers.shutdownNow();
        }
    }

    private Lane runLane(int lane) throws Exception {
        Path db = dir.resolve("lane-" + lane + ".db");
        Path natives = Files.createDirectories(dir.resolve("natives-" + lane));
        Files.deleteIfExists(db);
        try (Archive a = Archive.create(db)) {
            a.addInstrument(Instrument.named(ArchiveKillWriter.INSTRUMENT));
        }
        Random random = new Random(20261202L + lane);
        Map<Long, String> breaks = new HashMap<>();
        Set<String> instruments = new HashSet<>();
        int versions = 0;
        int committed = 0;
        int midTransaction = 0;
        List<String> problems = new ArrayList<>();
        for (int k = 0; k < TRIES_PER_LANE; k++) {
            List<String> command = new ArrayList<>(List.of(javaBinary(), "-XX:TieredStopAtLevel=1", "-Xshare:auto",
                    "-XX:+UseSerialGC", "-XX:-UsePerfData", "-Dorg.sqlite.tmpdir=" + natives));
            // the native library the first child unpacked is loaded from there by the others
            nativeLibrary(natives).ifPresent(lib -> command.addAll(List.of("-Dorg.sqlite.lib.path=" + natives,
                    "-Dorg.sqlite.lib.name=" + lib)));
            command.addAll(List.of("-cp", System.getProperty("java.class.path"), ArchiveKillWriter.class.getName(),
                    db.toString(), Long.toString(random.nextLong())));
            Process p = new ProcessBuilder(command).redirectError(ProcessBuilder.Redirect.DISCARD).start();
            BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
            CountDownLatch ready = new CountDownLatch(1);
            CompletableFuture<List<String>> lines = CompletableFuture.supplyAsync(() -> readAll(out, ready), readers);
            // the random moment starts with the first committed change: a kill before it would test only start-up
            ready.await(30, TimeUnit.SECONDS);
            Thread.sleep(random.nextInt(100));
            p.destroyForcibly();
            p.waitFor(30, TimeUnit.SECONDS);
            Path journal = db.resolveSibling(db.getFileName() + "-journal");
            if (Files.exists(journal) && Files.size(journal) > 0) {
                midTransaction++;
            }
            for (String line : lines.get(30, TimeUnit.SECONDS)) {
                if (!line.endsWith(" .")) {
                    continue; // cut off by the kill: not reported as committed
                }
                String[] w = line.split(" ");
                switch (w[0]) {
                    case "B" -> breaks.put(Long.parseLong(w[1]), ArchiveKillWriter.remark(Integer.parseInt(w[2]),
                            Double.parseDouble(w[3])));
                    case "I" -> instruments.add(w[1]);
                    case "V" -> versions = Math.max(versions, Integer.parseInt(w[1]));
                    default -> {
                        continue;
                    }
                }
                committed++;
            }
            problems.addAll(check(db, k, breaks, instruments, versions));
        }
        return new Lane(TRIES_PER_LANE, committed, midTransaction, problems);
    }

    private static List<String> check(Path db, int kill, Map<Long, String> breaks, Set<String> instruments,
                                      int versions) {
        List<String> problems = new ArrayList<>();
        String where = db.getFileName() + " after kill " + kill + ": ";
        try (Archive a = Archive.open(db)) {
            List<String> integrity = a.integrityCheck();
            if (!integrity.equals(List.of("ok"))) {
                problems.add(where + "integrity_check " + integrity);
            }
            Map<Long, StringBreak> rows = new HashMap<>();
            for (ArchivedBreak b : a.breaks(ArchiveKillWriter.INSTRUMENT)) {
                rows.put(b.id(), b.record());
                String own = ArchiveKillWriter.remark(b.record().key(), b.record().breakHz().orElseThrow());
                if (!own.equals(b.record().remark())) {
                    problems.add(where + "break " + b.id() + " half written: " + b.record());
                }
            }
            breaks.forEach((id, remark) -> {
                StringBreak b = rows.get(id);
                if (b == null || !b.remark().equals(remark)) {
                    problems.add(where + "committed break " + id + " " + (b == null ? "missing" : "changed: " + b));
                }
            });
            Set<String> names = new HashSet<>();
            for (Instrument i : a.instruments()) {
                names.add(i.name());
                if (!i.name().equals(ArchiveKillWriter.INSTRUMENT) && !i.maker().equals(ArchiveKillWriter.maker(
                        i.name()))) {
                    problems.add(where + "instrument half written: " + i);
                }
            }
            for (String n : instruments) {
                if (!names.contains(n)) {
                    problems.add(where + "committed instrument " + n + " missing");
                }
            }
            int have = a.versions(ArchiveKillWriter.INSTRUMENT).size();
            if (have < versions) {
                problems.add(where + "committed version " + versions + " missing (have " + have + ")");
            }
        } catch (RuntimeException e) {
            problems.add(where + "does not open: " + e);
        }
        return problems;
    }

    private static List<String> readAll(BufferedReader r, CountDownLatch ready) {
        List<String> lines = new ArrayList<>();
        try {
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                lines.add(line);
                if (!line.startsWith("ready") && line.endsWith(" .")) {
                    ready.countDown();
                }
            }
        } catch (IOException e) {
            // the pipe breaks when the child is killed: the lines read so far are what it reported
        } finally {
            ready.countDown();
        }
        return lines;
    }

    private static java.util.Optional<String> nativeLibrary(Path natives) throws IOException {
        try (var files = Files.list(natives)) {
            return files.map(f -> f.getFileName().toString()).filter(n -> n.matches(
                    "sqlite-.*sqlitejdbc\\.(so|dylib|dll|jnilib)")).findFirst();
        }
    }

    private static String javaBinary() {
        return Paths.get(System.getProperty("java.home"), "bin", "java").toString();
    }
}
