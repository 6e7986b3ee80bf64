package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.scalewright.cli.CommandRun.run;

import com.opencsv.CSVReader;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.CsvCells;
import org.scalewright.model.Materials;
import org.scalewright.model.UnitConversions;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;
import org.scalewright.physics.Pitch;
import org.scalewright.physics.StrengthTable;
import org.scalewright.physics.StringPhysics;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.PitchStandard;
import picocli.CommandLine;

/** The {@code analyze} command in-process (DESIGN §5): output, exit statuses, no stack traces. */
class AnalyzeCommandTest {
    /** A small sheet made up for the test; key 60 is pitched far too high so it is flagged. */
    private static final String SHEET = """
            # title: Test sheet
            key,strings,length_mm,wire,wire_mm,wrap1_mm,wrap2_mm,wrap_metal,pitch_hz,section,remark
            1,1,1500,,1.5,0.6,1.3,copper,,bass,
            12,2,1250,,1.2,0.9,,copper,,bass,
            20,2,1100,,1.0,0.35,,iron,,=HYPERLINK("x"),
            33,3,950,16,,,,,,tenor,
            49,3,400,,0.95,,,,,tenor,
            60,3,260,,0.9,,,,1500,@treble,
            72,3,110,,0.85,,,,,+treble,
            88,3,52,13,,,,,,-treble,
            """;

    /** DESIGN §5: the columns analyze --out must write at least. */
    private static final List<String> REQUIRED = List.of("key", "note", "frequency_hz", "strings", "wound", "core_mm",
            "mass_per_length_g_m", "tension_n", "tension_lbf", "note_tension_n", "stress_mpa", "breaking_strength_mpa",
            "break_pct", "inharmonicity_b", "headroom_cents");

    @TempDir
    Path dir;

    private Path sheet(String text) throws Exception {
        return Files.writeString(dir.resolve("scale.csv"), text);
    }

    private static void noStackTrace(CommandRun r) {
        for (String s : List.of(r.out(), r.err())) {
            assertFalse(s.contains("Exception"), s);
            assertFalse(s.contains("\tat "), s);
            assertFalse(s.contains("at org."), s);
        }
    }

    @Test
    @DisplayName("prints the table with the flagged notes, section totals and the whole-instrument total")
    void printsTable() throws Exception {
        CommandRun r = run("analyze", sheet(SHEET).toString());
        assertEquals(0, r.status(), r.err());
        assertEquals("", r.err());
        assertTrue(r.out().startsWith("Test sheet: 8 notes, A4 = 440 Hz"), r.out());
        assertTrue(r.out().contains("% break"), r.out());
        assertTrue(r.out().contains("stress MPa"), r.out());
        assertTrue(r.out().contains("Flagged notes ("), r.out());
        String flagged = r.out().lines().filter(l -> l.startsWith("  60 G#5:")).findFirst().orElse("");
        assertTrue(flagged.contains("wire would break"), r.out());
        assertTrue(r.out().contains("Total tension by section:"), r.out());
        assertTrue(r.out().contains("Whole instrument: "), r.out());
        assertTrue(r.out().contains("kN") && r.out().contains("lbf"), r.out());
        assertTrue(r.out().contains("Caution: "), "a note over strength brings the caution: " + r.out());
        // the table row of key 60 carries the danger marker
        String row = r.out().lines().filter(l -> l.matches("\\s*60\\s+G#5.*")).findFirst().orElseThrow();
        assertTrue(row.endsWith("!") || row.contains("!"), row);
        noStackTrace(r);
    }

    @Test
    @DisplayName("--out writes every DESIGN §5 column with figures that agree with the DESIGN §3 physics")
    void csvOutput() throws Exception {
        Path out = dir.resolve("results.csv");
        CommandRun r = run("analyze", sheet(SHEET).toString(), "--out", out.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("wrote " + out), r.out());
        List<Map<String, String>> rows = readCsv(Files.readString(out));
        assertEquals(8, rows.size());
        assertTrue(rows.get(0).keySet().containsAll(REQUIRED), rows.get(0).keySet().toString());

        Materials m = BuiltInData.materials();
        StrengthTable astm = BuiltInData.astmMinimum();
        Object[][] notes = { // key, strings, L m, d m, wrap, explicit Hz or 0
            {1, 1, 1.5, 1.5e-3, new Wrap(0.6e-3, 1.3e-3, WrapMetal.COPPER), 0.0},
            {12, 2, 1.25, 1.2e-3, Wrap.single(0.9e-3, WrapMetal.COPPER), 0.0},
            {20, 2, 1.1, 1.0e-3, Wrap.single(0.35e-3, WrapMetal.IRON), 0.0},
            {33, 3, 0.95, 0.037 * 0.0254, null, 0.0}, // size 16 = 0.037 in
            {49, 3, 0.40, 0.95e-3, null, 0.0},
            {60, 3, 0.26, 0.9e-3, null, 1500.0},
            {72, 3, 0.11, 0.85e-3, null, 0.0},
            {88, 3, 0.052, 0.031 * 0.0254, null, 0.0}}; // size 13 = 0.031 in
        for (int i = 0; i < notes.length; i++) {
            Object[] n = notes[i];
            int key = (Integer) n[0];
            int strings = (Integer) n[1];
            double l = (Double) n[2];
            double d = (Double) n[3];
            Wrap w = (Wrap) n[4];
            double hz = (Double) n[5];
            double f = hz > 0 ? hz : Pitch.equalTempered(key, 440);
            double mu = StringPhysics.massPerLength(d, w, m);
            double k = StringPhysics.stiffness(d, l, m.youngsModulus());
            double t = StringPhysics.tension(l, mu, f, k);
            double sigma = StringPhysics.stress(t, d);
            double sb = astm.strengthAt(d);
            double fb = StringPhysics.breakingFrequency(sb, d, k, l, mu);
            Map<String, String> row = rows.get(i);
            String what = "key " + key + ": " + row;
            assertEquals(Integer.toString(key), row.get("key"), what);
            assertEquals(org.scalewright.model.KeyNames.name(key), row.get("note"), what);
            assertEquals(strings, Integer.parseInt(row.get("strings")), what);
            assertEquals(Boolean.toString(w != null), row.get("wound"), what);
            assertEquals(f, num(row, "frequency_hz"), 1e-4, what);
            assertEquals(d * 1e3, num(row, "core_mm"), 1e-4, what);
            assertEquals(mu * 1e3, num(row, "mass_per_length_g_m"), 1e-5, what);
            assertEquals(t, num(row, "tension_n"), 0.005, what);
            assertEquals(UnitConversions.newtonsToLbf(t), num(row, "tension_lbf"), 0.005, what);
            assertEquals(strings * t, num(row, "note_tension_n"), 0.005, what);
            assertEquals(sigma / 1e6, num(row, "stress_mpa"), 0.005, what);
            assertEquals(sb / 1e6, num(row, "breaking_strength_mpa"), 0.005, what);
            assertEquals(100 * sigma / sb, num(row, "break_pct"), 0.0005, what);
            assertEquals(k / t, num(row, "inharmonicity_b"), k / t * 1e-4, what);
            assertEquals(Pitch.cents(f, fb), num(row, "headroom_cents"), 0.05, what);
        }
        // spreadsheet-safe text: section labels beginning with = + - @ are written as text
        assertEquals("'=HYPERLINK(\"x\")", rows.get(2).get("section"));
        assertEquals("'@treble", rows.get(5).get("section"));
        assertEquals("'+treble", rows.get(6).get("section"));
        assertEquals("'-treble", rows.get(7).get("section"));
        // numbers that begin with '-' stay numbers (key 60 has negative headroom)
        assertTrue(rows.get(5).get("headroom_cents").startsWith("-"), rows.get(5).toString());
    }

    private static double num(Map<String, String> row, String column) {
        return Double.parseDouble(row.get(column));
    }

    private static List<Map<String, String>> readCsv(String text) throws Exception {
        String body = text.lines().filter(l -> !l.startsWith("#")).collect(Collectors.joining("\n"));
        try (CSVReader reader = new CSVReader(new StringReader(body))) {
            List<String[]> all = reader.readAll();
            String[] header = all.get(0);
            List<Map<String, String>> rows = new ArrayList<>();
            for (String[] cells : all.subList(1, all.size())) {
                assertEquals(header.length, cells.length);
                Map<String, String> row = new HashMap<>();
                for (int i = 0; i < header.length; i++) {
                    row.put(header[i], cells[i]);
                }
                rows.add(row);
            }
            return rows;
        }
    }

    @Test
    @DisplayName("a malformed sheet: exit 2, a message with the line number, no stack trace, no output file")
    void malformedSheet() throws Exception {
        Path out = dir.resolve("results.csv");
        Path bad = sheet("key,strings,length_mm,wire_mm\n1,1,1500,1.5\n2,1,abc,1.5\n3,7,1400,1.5\n");
        CommandRun r = run("analyze", bad.toString(), "--out", out.toString());
        assertEquals(2, r.status());
        assertTrue(r.err().contains("error: scale.csv, line 3, column length_mm: expected a number, was 'abc'"),
                r.err());
        assertTrue(r.err().contains("error: scale.csv, line 4, column strings:"), r.err());
        assertEquals(2, r.err().lines().count(), "one line per problem: " + r.err());
        assertFalse(Files.exists(out));
        assertEquals(List.of("scale.csv"), List.of(dir.toFile().list()));
        noStackTrace(r);
    }

    @Test
    @DisplayName("bad arguments and inputs exit 2 with one-line messages and leave an existing output file alone")
    void badArguments() throws Exception {
        Path good = sheet(SHEET);
        Path out = Files.writeString(dir.resolve("old.csv"), "keep me");
        List<String[]> cases = List.of(
                new String[] {"analyze", good.toString(), "--frobnicate"},
                new String[] {"analyze"},
                new String[] {"analyze", dir.resolve("missing.csv").toString(), "--out", out.toString()},
                new String[] {"analyze", good.toString(), "--a4", "abc", "--out", out.toString()},
                new String[] {"analyze", good.toString(), "--a4", "0", "--out", out.toString()},
                new String[] {"analyze", good.toString(), "--a4", "1200", "--out", out.toString()},
                new String[] {"analyze", good.toString(), "--strength", good.toString(), "--out", out.toString()},
                new String[] {"no-such-command"});
        for (String[] args : cases) {
            CommandRun r = run(args);
            String what = String.join(" ", args) + " → " + r.err();
            assertEquals(2, r.status(), what);
            assertTrue(r.err().startsWith("error: "), what);
            noStackTrace(r);
            assertEquals("keep me", Files.readString(out), what);
        }
        assertTrue(run("analyze", good.toString(), "--frobnicate").err().contains("--frobnicate"));
        assertTrue(run("analyze", dir.resolve("missing.csv").toString()).err().contains("missing.csv: no such file"));
        assertTrue(run("analyze", good.toString(), "--strength", good.toString()).err().contains("unknown column"));
    }

    @Test
    @DisplayName("an output file that cannot be written: exit 2, a one-line reason, nothing left behind")
    void failingOutputPath() throws Exception {
        Path good = sheet(SHEET);
        for (Path out : List.of(dir.resolve("no-such-dir").resolve("r.csv"), Files.createDirectory(dir.resolve("adir")))) {
            CommandRun r = run("analyze", good.toString(), "--out", out.toString());
            assertEquals(2, r.status(), r.err());
            assertTrue(r.err().startsWith("error: cannot write " + out), r.err());
            assertEquals(1, r.err().lines().count(), r.err());
            noStackTrace(r);
        }
        try (var listing = Files.list(dir)) {
            assertEquals(2, listing.count(), "only the sheet and the directory");
        }
    }

    @Test
    @DisplayName("--help on the program and every subcommand exits 0 and prints usage")
    void helpEverywhere() {
        CommandRun root = run("--help");
        assertEquals(0, root.status());
        assertTrue(root.out().contains("Usage: scalewright"), root.out());
        var subcommands = new CommandLine(new ScalewrightCommand()).getSubcommands().keySet();
        assertTrue(subcommands.contains("analyze"));
        for (String sub : subcommands) {
            CommandRun r = run(sub, "--help");
            assertEquals(0, r.status(), sub + ": " + r.err());
            assertTrue(r.out().contains("Usage: scalewright " + sub), r.out());
            assertEquals("", r.err());
        }
        assertEquals(0, run("--version").status());
    }

    @Test
    @DisplayName("--a4 overrides the sheet's pitch standard")
    void a4Option() throws Exception {
        Path out = dir.resolve("r.csv");
        CommandRun r = run("analyze", sheet("# a4_hz: 435\n" + SHEET).toString(), "--a4", "442", "--out", out.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("A4 = 442 Hz"), r.out());
        assertEquals(442.0, num(readCsv(Files.readString(out)).get(4), "frequency_hz"), 1e-9);
    }

    @Test
    @DisplayName("CsvCells.safeText neutralises = + - @ text, leaves numbers and plain text alone")
    void safeText() {
        assertEquals("'=1+1", CsvCells.safeText("=1+1"));
        assertEquals("'+x", CsvCells.safeText("+x"));
        assertEquals("'-x", CsvCells.safeText("-x"));
        assertEquals("'@SUM(A1)", CsvCells.safeText("@SUM(A1)"));
        assertEquals("-12.5", CsvCells.safeText("-12.5"));
        assertEquals("+3", CsvCells.safeText("+3"));
        assertEquals("-1e-3", CsvCells.safeText("-1e-3"));
        assertEquals("'-1d", CsvCells.safeText("-1d"));
        assertEquals("bass", CsvCells.safeText("bass"));
        assertEquals("", CsvCells.safeText(""));
        assertEquals("", CsvCells.safeText(null));
    }

    @Test
    @DisplayName("--a4 outside 300-600 Hz is refused with the pitch standard's own message, the window's too")
    void a4OutsideTheAcceptedRange() throws Exception {
        Path good = sheet(SHEET);
        CommandRun r = run("analyze", good.toString(), "--a4", "1200");
        assertEquals(2, r.status(), r.err());
        assertEquals("error: pitch standard A4 must be 300 to 600 Hz, was 1200", r.err().strip());
        // the same message from the one home of the rule
        assertEquals("pitch standard A4 must be 300 to 600 Hz, was 1200",
                assertThrows(InvalidInput.class, () -> PitchStandard.of(1200)).getMessage());
        CommandRun low = run("analyze", good.toString(), "--a4", "299.5");
        assertEquals(2, low.status(), low.err());
        assertTrue(low.err().contains("pitch standard A4 must be 300 to 600 Hz, was 299.5"), low.err());
        assertEquals(0, run("analyze", good.toString(), "--a4", "300").status());
        assertEquals(0, run("analyze", good.toString(), "--a4", "600").status());
        noStackTrace(r);
    }

    @Test
    @DisplayName("an implausible value is marked as danger and brings the caution, as the flag kind says")
    void implausibleValueIsShownAsDanger() throws Exception {
        // a 5 mm plain wire at a sensible length and pitch: implausible, but far under its strength
        Path thick = sheet("key,strings,length_mm,wire_mm\n40,3,620,5\n");
        CommandRun r = run("analyze", thick.toString());
        assertEquals(0, r.status(), r.err());
        String row = r.out().lines().filter(l -> l.matches("\\s*40\\s+C4.*")).findFirst().orElseThrow();
        assertTrue(row.contains("!"), row);
        assertTrue(r.out().contains("Caution: "), r.out());
        assertTrue(r.out().contains("! danger band, over strength or implausible value"), r.out());
    }

    @Test
    @DisplayName("a plain size growing toward the treble and a single odd size are marked and explained")
    void wireOrderFlags() throws Exception {
        Path p = sheet("""
                key,strings,length_mm,wire,section
                40,3,620,17,treble
                41,3,590,17,treble
                42,3,560,18,treble
                43,3,530,17,treble
                44,3,500,17,treble
                45,3,475,17.5,treble
                46,3,450,17.5,treble
                """);
        CommandRun r = run("analyze", p.toString());
        assertEquals(0, r.status(), r.err());
        List<String> lines = r.out().lines().toList();
        assertTrue(lines.stream().anyMatch(l -> l.matches("\\s*42 .*\\s\\S*w")), r.out());
        assertTrue(lines.stream().anyMatch(l -> l.matches("\\s*45 .*\\s\\S*w")), r.out());
        assertTrue(r.out().contains("; plain wire #18 between #17 on both sides (keys 41 C#4 and 43 D#4)"), r.out());
        assertTrue(r.out().contains("45 F4: plain wire #17.5 is thicker than #17 on key 44 (E4)"), r.out());
        assertTrue(r.out().contains("w plain size out of order"), r.out());
    }
}
