package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.cli.CheckWireCommandTest.Run;

/**
 * The archive on the command line, end to end, on a real SQLite file: the sequence the README shows
 * (create, add the demo grand, import it as measured, save a planned version derived from it, log
 * three breaks with pitches, list them, diagnose with the archive), and bad input refused with exit
 * status 2 and nothing written.
 */
class ArchiveCommandTest {
    private static final Path GRAND = Path.of("demo-instruments/grand-190/grand-190.csv");

    @TempDir
    Path dir;

    private Run run(String... args) {
        return CheckWireCommandTest.run(args);
    }

    private Path db() {
        return dir.resolve("workshop.db");
    }

    private void ok(String... args) {
        Run r = run(args);
        assertEquals(0, r.rc(), String.join(" ", args) + "\n" + r.err());
    }

    /** Builds the demo archive of the README; the break pitches are invented for the demo. */
    private void demoArchive() {
        String db = db().toString();
        ok("archive", "create", "--db", db);
        ok("archive", "add-instrument", "grand-190", "--maker", "Marrowby & Fenn", "--db", db);
        ok("archive", "import-sheet", "grand-190", GRAND.toString(), "--label", "as-measured", "--date", "2026-11-02",
                "--db", db);
        Path v1 = dir.resolve("v1.csv");
        ok("archive", "export-sheet", "grand-190", "1", "--out", v1.toString(), "--db", db);
        Path planned = dir.resolve("planned.csv");
        ok("plan-plain", v1.toString(), "--keys", "53-88", "--out", planned.toString());
        ok("archive", "import-sheet", "grand-190", planned.toString(), "--label", "planned", "--from", "1", "--date",
                "2026-11-03", "--db", db);
        ok("archive", "log-break", "grand-190", "--key", "66", "--string", "2", "--pitch", "1178", "--during",
                "pitch-raise", "--place", "front-bearing", "--date", "2026-11-10", "--db", db);
        ok("archive", "log-break", "grand-190", "--key", "C6", "--pitch", "1052", "--during", "pitch-raise",
                "--place", "front-bearing", "--date", "2026-11-10", "--db", db);
        ok("archive", "log-break", "grand-190", "--key", "69", "--pitch", "1399", "--during", "tuning", "--place",
                "front-bearing", "--date", "2026-11-24", "--db", db);
    }

    @Test
    void theDemoSequenceListsTheBreaksWithTheirStressAndDiagnoseNamesThem() throws IOException {
        demoArchive();
        Path out = dir.resolve("breaks.csv");
        Run list = run("archive", "breaks", "grand-190", "--db", db().toString(), "--out", out.toString());
        assertEquals(0, list.rc(), list.err());
        List<String> lines = Files.readAllLines(out).stream().filter(l -> !l.startsWith("#")).toList();
        assertEquals("key,date,break_hz,stress_at_break_mpa,table_strength_mpa,strength_ratio", lines.get(0));
        List<Map<String, String>> rows = CheckWireCommandTest.csv(out);
        assertEquals(3, rows.size());
        Map<String, String> c6 = rows.stream().filter(m -> m.get("key").equals("64")).findFirst().orElseThrow();
        // plain wire: 4 L² f² ρ less K/A = π² E d² / (16 L²) (DESIGN §3; hand-worked), L of key 64 in the sheet
        // as measured, ρ = 7850 kg/m³, E = 200 GPa, size 15 = 0.035 in (Music Wire Gauge, from memory). On this
        // short treble string the stiffness term is 2.7 MPa, 0.2 % of the stress.
        double l = lengthOf(64);
        double d = 0.035 * 0.0254;
        double stiffness = Math.PI * Math.PI * 200e9 * d * d / (16 * l * l) / 1e6;
        assertEquals(2.7, stiffness, 0.05);
        double expected = 4 * l * l * 1052 * 1052 * 7850 / 1e6 - stiffness;
        assertEquals(expected, Double.parseDouble(c6.get("stress_at_break_mpa")), 0.05);
        assertEquals(Double.parseDouble(c6.get("stress_at_break_mpa")) / Double.parseDouble(
                c6.get("table_strength_mpa")), Double.parseDouble(c6.get("strength_ratio")), 0.001);
        assertEquals("2026-11-10", c6.get("date"));
        assertEquals("1052", c6.get("break_hz"));

        Run diag = run("diagnose", GRAND.toString(), "--keys", "60-72", "--archive", db().toString(), "--instrument",
                "grand-190");
        assertEquals(0, diag.rc(), diag.err());
        assertTrue(diag.out().contains("Recorded breaks: 3 strings broke on keys 60-72 (64 C6, 66 D6, 69 F6)"), diag.out());
        assertTrue(diag.out().contains("3 broke at a known pitch: 64 C6 at 1052 Hz"), diag.out());
        assertTrue(diag.out().contains("broke at the front bearing"), diag.out());
        assertTrue(diag.out().contains("during a pitch raise"), "the caution where breaks came in a pitch raise");
        Run narrow = run("diagnose", GRAND.toString(), "--keys", "67-72", "--archive", db().toString(),
                "--instrument", "grand-190");
        assertTrue(narrow.out().contains("1 string broke on keys 67-72 (69 F6); 2 more outside keys 67-72"),
                narrow.out());
    }

    private static double lengthOf(int key) throws IOException {
        for (String line : Files.readAllLines(GRAND)) {
            if (line.startsWith(key + ",")) {
                List<String> header = List.of(Files.readAllLines(GRAND).stream().filter(x -> x.startsWith("key"))
                        .findFirst().orElseThrow().split(","));
                return Double.parseDouble(line.split(",")[header.indexOf("length_mm")]) / 1e3;
            }
        }
        throw new AssertionError("no key " + key);
    }

    @Test
    void versionsAndHistoryTellWhatWasRecorded() {
        demoArchive();
        Run v = run("archive", "versions", "grand-190", "--db", db().toString());
        assertTrue(v.out().contains("as measured") && v.out().contains("planned"), v.out());
        ok("archive", "log-job", "grand-190", "--kind", "pitch raise", "--a4", "440", "--to-version", "1", "--date",
                "2026-11-10", "--db", db().toString());
        Run h = run("archive", "history", "grand-190", "--db", db().toString());
        assertEquals(0, h.rc(), h.err());
        String out = h.out();
        assertTrue(out.indexOf("version 1 (as measured)") < out.indexOf("version 2 (planned), from version 1"), out);
        assertTrue(out.indexOf("job: pitch raise") < out.indexOf("break: key 64 C6"), out);
    }

    @Test
    void badInputIsRefusedWithExitTwoAndNothingWritten() throws IOException {
        demoArchive();
        byte[] before = Files.readAllBytes(db());
        String db = db().toString();
        List<String[]> bad = List.of(
                new String[] {"archive", "log-break", "no-such-piano", "--key", "64", "--db", db},
                new String[] {"archive", "log-break", "grand-190", "--key", "95", "--db", db},
                new String[] {"archive", "log-break", "grand-190", "--key", "200", "--db", db},
                new String[] {"archive", "log-break", "grand-190", "--key", "64", "--date", "2026-13-01", "--db", db},
                new String[] {"archive", "log-break", "grand-190", "--key", "64", "--date", "10.11.2026", "--db", db},
                new String[] {"archive", "log-break", "grand-190", "--key", "64", "--pitch", "0", "--db", db},
                new String[] {"archive", "log-break", "grand-190", "--key", "64", "--pitch", "-3", "--db", db},
                new String[] {"archive", "log-break", "grand-190", "--key", "64", "--during", "sleeping", "--db", db},
                new String[] {"archive", "log-break", "grand-190", "--key", "64", "--string", "4", "--db", db},
                new String[] {"archive", "log-break", "grand-190", "--key", "64", "--on-version", "9", "--db", db},
                new String[] {"archive", "import-sheet", "grand-190", GRAND.toString(), "--label", "planned",
                        "--from", "7", "--db", db},
                new String[] {"archive", "add-instrument", "grand-190", "--db", db},
                new String[] {"archive", "breaks", "nobody", "--db", db},
                new String[] {"diagnose", GRAND.toString(), "--keys", "60-72", "--archive", db, "--instrument", "x"},
                new String[] {"diagnose", GRAND.toString(), "--keys", "60-72", "--archive", db});
        for (String[] args : bad) {
            Run r = run(args);
            assertEquals(2, r.rc(), String.join(" ", args) + "\n" + r.err());
            assertFalse(r.err().isBlank());
            assertFalse(r.err().contains("Exception"), r.err());
            assertArrayEquals(before, Files.readAllBytes(db()), "nothing written by " + String.join(" ", args));
        }
        Run unknown = run(bad.get(0));
        assertTrue(unknown.err().contains("no instrument named 'no-such-piano' in the archive; it has 'grand-190'"), unknown.err());
        Run outside = run(bad.get(1));
        assertTrue(outside.err().contains("key 95 is outside the scale of 'grand-190' version 1 (it has keys 1-88)"),
                outside.err());
        assertTrue(run(bad.get(3)).err().contains("date must be written YYYY-MM-DD"));
        assertTrue(run(bad.get(5)).err().contains("pitch at break must be more than 0"));
    }

    @Test
    void aFileThatIsNotAnArchiveIsRefusedAndLeftAsItIs() throws IOException {
        Path notDb = dir.resolve("notes.db");
        Files.writeString(notDb, "key,strings\n1,3\n");
        byte[] before = Files.readAllBytes(notDb);
        Run r = run("archive", "instruments", "--db", notDb.toString());
        assertEquals(2, r.rc());
        assertTrue(r.err().contains("is not a Scalewright archive (not an SQLite database)"), r.err());
        assertArrayEquals(before, Files.readAllBytes(notDb));
        Run again = run("archive", "create", "--db", notDb.toString());
        assertEquals(2, again.rc());
        assertTrue(again.err().contains("already exists"), again.err());
        assertArrayEquals(before, Files.readAllBytes(notDb));
        Run missing = run("archive", "instruments", "--db", dir.resolve("none.db").toString());
        assertEquals(2, missing.rc());
        assertTrue(missing.err().contains("create one with 'archive create'"), missing.err());
        assertFalse(Files.exists(dir.resolve("none.db")));
    }

    @Test
    void dumpAndLoadOnTheCommandLine() throws IOException {
        demoArchive();
        Path dump = dir.resolve("dump");
        ok("archive", "dump", "--out", dump.toString(), "--db", db().toString());
        Path other = dir.resolve("restored.db");
        ok("archive", "create", "--db", other.toString());
        Run load = run("archive", "load", dump.toString(), "--db", other.toString());
        assertEquals(0, load.rc(), load.err());
        assertTrue(load.out().contains("string_break.csv: 3 rows"), load.out());
        Run twice = run("archive", "load", dump.toString(), "--db", other.toString());
        assertEquals(2, twice.rc());
        assertTrue(twice.err().contains("already holds instruments"), twice.err());
        assertEquals(run("archive", "breaks", "grand-190", "--db", db().toString()).out(),
                run("archive", "breaks", "grand-190", "--db", other.toString()).out());
    }

    @Test
    void everySubcommandExplainsItself() {
        for (String sub : List.of("create", "add-instrument", "instruments", "import-sheet", "versions",
                "export-sheet", "log-job", "log-break", "breaks", "history", "dump", "load")) {
            Run r = run("archive", sub, "--help");
            assertEquals(0, r.rc(), sub);
            assertTrue(r.out().contains("Usage: scalewright archive " + sub), r.out());
            assertTrue(r.out().contains("--db"), sub + " names --db");
        }
        Run top = run("archive", "--help");
        assertTrue(top.out().contains("~/.local/share/scalewright") && top.out().contains("archive dump"), top.out());
    }
}
