package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.io.StrengthTableReader;
import org.scalewright.model.Note;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.NoteCalculator;
import org.scalewright.physics.Pitch;

/** {@code check-wire} run in-process through {@link ScalewrightCommand#run}. */
class CheckWireCommandTest {
    static final Path GRAND = Path.of("demo-instruments", "grand-190", "grand-190.csv");
    static final Path UPRIGHT = Path.of("demo-instruments", "upright-131", "upright-131.csv");
    static final Path WEAKER_MAKER = Path.of("scales", "wire-makers", "specimen-wire-mill-mm-load-n.csv");

    @TempDir
    Path dir;

    record Run(int rc, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int rc = ScalewrightCommand.run(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(rc, out.toString(), err.toString());
    }

    /** A small made-up sheet: plain keys 40–88 by music-wire size, one section. */
    Path sheet() throws IOException {
        StringBuilder b = new StringBuilder("# title: test sheet\nkey,strings,length_mm,wire,section\n");
        for (int k = 40; k <= 88; k++) {
            double size = Math.round(2 * (19 - 6.5 * (k - 40) / 48.0)) / 2.0;
            b.append(k).append(",3,").append(String.format(java.util.Locale.ROOT, "%.1f", 610 * Math.pow(0.9445, k - 40)))
                    .append(',').append(size).append(",treble\n");
        }
        Path p = dir.resolve("sheet.csv");
        Files.writeString(p, b);
        return p;
    }

    static List<Map<String, String>> csv(Path file) throws IOException {
        List<String> lines = Files.readAllLines(file).stream().filter(l -> !l.startsWith("#")).toList();
        String[] header = lines.get(0).split(",", -1);
        List<Map<String, String>> rows = new ArrayList<>();
        for (String l : lines.subList(1, lines.size())) {
            String[] cells = l.split(",", -1);
            Map<String, String> m = new HashMap<>();
            for (int i = 0; i < header.length; i++) {
                m.put(header[i], i < cells.length ? cells[i] : "");
            }
            rows.add(m);
        }
        return rows;
    }

    @Test
    void writesTheContractColumnsAndPrintsCautionsForAPitchRaise() throws IOException {
        Path out = dir.resolve("c.csv");
        Run r = run("check-wire", sheet().toString(), "--flat-cents", "30", "--overpull", "25", "--out", out.toString());
        assertEquals(0, r.rc(), r.err());
        List<Map<String, String>> rows = csv(out);
        assertEquals(49, rows.size());
        for (String col : List.of("key", "note", "break_pct_before", "break_pct_after", "break_pct_peak",
                "headroom_cents_after", "over_danger")) {
            assertTrue(rows.get(0).containsKey(col), col);
        }
        assertTrue(r.out().contains("Cautions:"), r.out());
        assertTrue(r.out().contains(BuiltInData.cautions().get(0).substring(0, 40)));
        assertTrue(r.out().contains("Total tension on the plate"));
        assertTrue(r.out().contains("lbf"));
    }

    @Test
    void noCautionsWithoutAPitchRaise() throws IOException {
        Run r = run("check-wire", sheet().toString(), "--to-metric", "nearest");
        assertEquals(0, r.rc(), r.err());
        assertFalse(r.out().contains("Cautions:"));
        assertTrue(r.out().contains("plain wire to metric diameters, nearest"), r.out());
    }

    @Test
    void badInputGivesExitTwoOneLinePerProblemAndNoOutputFile() throws IOException {
        Path sheet = sheet();
        Path out = dir.resolve("never.csv");
        Path badTable = dir.resolve("bad-table.csv");
        Files.writeString(badTable, "diameter_mm,tensile_mpa\n0.8,abc\n0.9,2000\n0.9,2100\n");
        Path badFlat = dir.resolve("bad-flat.csv");
        Files.writeString(badFlat, "key,cents_flat\n99,10\n");
        List<String[]> bad = List.of(
                new String[]{"check-wire", dir.resolve("missing.csv").toString(), "--out", out.toString()},
                new String[]{"check-wire", sheet.toString(), "--strength", badTable.toString(), "--out", out.toString()},
                new String[]{"check-wire", sheet.toString(), "--flat", badFlat.toString(), "--out", out.toString()},
                new String[]{"check-wire", sheet.toString(), "--flat", badFlat.toString(), "--flat-cents", "20",
                        "--out", out.toString()},
                new String[]{"check-wire", sheet.toString(), "--to-metric", "up", "--to-inch", "down", "--out",
                        out.toString()},
                new String[]{"check-wire", sheet.toString(), "--to-metric", "sideways", "--out", out.toString()},
                new String[]{"check-wire", sheet.toString(), "--overpull", "-5", "--out", out.toString()},
                new String[]{"check-wire", sheet.toString(), "--flat-cents", "5000", "--out", out.toString()},
                new String[]{"check-wire", sheet.toString(), "--a4", "0", "--out", out.toString()},
                new String[]{"check-wire", sheet.toString(), "--stage-above", "lots", "--out", out.toString()});
        for (String[] args : bad) {
            Run r = run(args);
            String what = String.join(" ", args);
            assertEquals(2, r.rc(), what + "\n" + r.err());
            assertTrue(r.err().startsWith("error: "), what + "\n" + r.err());
            assertFalse(r.err().contains("\tat "), "no stack trace: " + r.err());
            assertFalse(Files.exists(out), what);
        }
        Run table = run("check-wire", sheet.toString(), "--strength", badTable.toString());
        assertTrue(table.err().contains("bad-table.csv, line 2, column tensile_mpa: expected a number"), table.err());
        assertTrue(table.err().contains("bad-table.csv, line 4, column diameter_mm: diameter 0.9 appears twice"),
                table.err());
        assertTrue(run("check-wire", sheet.toString(), "--flat", badFlat.toString()).err()
                .contains("bad-flat.csv, line 2, column key: key 99 is not in the scale"));
    }

    @Test
    void helpNamesThePresentStrengthOptionAndTheDefaultTable() {
        Run r = run("check-wire", "--help");
        assertEquals(0, r.rc());
        assertTrue(r.out().contains("--present-strength"));
        assertTrue(r.out().contains("ASTM A228 minimum"));
        assertTrue(r.out().contains("--stage-above"));
    }

    @Test
    void contractRunOnTheDemoGrand() throws IOException {
        assumeTrue(Files.exists(GRAND), "demo grand not present");
        Path out = dir.resolve("c.csv");
        Run r = run("check-wire", GRAND.toString(), "--flat-cents", "30", "--overpull", "25", "--out", out.toString());
        assertEquals(0, r.rc(), r.err());
        assertEquals(88, csv(out).size());
    }

    @Test
    void demoPitchRaiseWithAMakersTableListsTheNotesAtRiskFirstWithFiguresThatRecompute() throws Exception {
        // the must-show run: a maker's table, 40 cents flat, 25 % overpull, on both demo instruments
        for (Path demo : List.of(GRAND, UPRIGHT)) {
            assumeTrue(Files.exists(demo), "demo not present");
            Path out = dir.resolve("risk.csv");
            Run r = run("check-wire", demo.toString(), "--strength", WEAKER_MAKER.toString(), "--flat-cents", "40",
                    "--overpull", "25", "--out", out.toString());
            assertEquals(0, r.rc(), r.err());
            List<Map<String, String>> rows = csv(out);
            int atRisk = (int) rows.stream().filter(m -> m.get("over_danger").equals("true")).count();
            assertTrue(atRisk > 0, demo + ": the weaker maker's wire should put notes at risk");
            for (int i = 0; i < rows.size(); i++) {
                assertEquals(i < atRisk, rows.get(i).get("over_danger").equals("true"), demo + " row " + i);
            }
            assertTrue(r.out().indexOf("Notes at risk") < r.out().indexOf("Other notes"));
            // every figure of the rows at risk recomputed here through the physics
            Scale scale = ScaleSheetReader.standard().read(demo);
            AnalysisSettings present = BuiltInData.defaultSettings();
            AnalysisSettings maker = present.withStrength(StrengthTableReader.read(WEAKER_MAKER));
            for (Map<String, String> m : rows.subList(0, atRisk)) {
                Note n = scale.note(Integer.parseInt(m.get("key"))).orElseThrow();
                double target = Pitch.working(n, scale.pitch());
                double peak = target * Math.pow(2, 40 * 0.25 / 1200);
                assertEquals(NoteCalculator.computeAt(n, target, present).breakPct(),
                        Double.parseDouble(m.get("break_pct_before")), 0.0005);
                assertEquals(NoteCalculator.computeAt(n, target, maker).breakPct(),
                        Double.parseDouble(m.get("break_pct_after")), 0.0005);
                double peakPct = NoteCalculator.computeAt(n, peak, maker).breakPct();
                assertEquals(peakPct, Double.parseDouble(m.get("break_pct_peak")), 0.0005);
                assertTrue(peakPct >= 70);
            }
            assertTrue(r.out().contains("Raise in stages: advised"), r.out());
        }
    }

    @Test
    void theStageLimitTakesADecimalCommaAndBadValuesGetTheStageLimitsOwnMessage() throws IOException {
        Run ok = run("check-wire", sheet().toString(), "--flat-cents", "100", "--stage-above", "7,5kN");
        assertEquals(0, ok.rc(), ok.err());
        assertTrue(ok.out().contains("7.5 kN"), ok.out());
        Run bad = run("check-wire", sheet().toString(), "--stage-above", "lots");
        assertEquals(2, bad.rc());
        assertTrue(bad.err().contains("stage limit: expected a percent of the present total or a force > 0, such as "
                + "5%, 10kN or 2200lbf, was 'lots'"), bad.err());
        Run a4 = run("check-wire", sheet().toString(), "--a4", "1200", "--overpull", "150");
        assertEquals(2, a4.rc());
        assertTrue(a4.err().contains("error: overpull must be 0 to 100 %, was 150"), a4.err());
        assertTrue(a4.err().contains("error: pitch standard A4 must be 300 to 600 Hz, was 1200"), a4.err());
    }
}
