package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code diagnose} run in-process through {@link ScalewrightCommand#run}. */
class DiagnoseCommandTest {
    @TempDir
    Path dir;

    private Path sheet(double hotFactor) throws IOException {
        StringBuilder b = new StringBuilder("key,strings,length_mm,wire,section\n");
        for (int k = 40; k <= 88; k++) {
            double l = 610 * Math.pow(0.9445, k - 40) * (k == 70 ? hotFactor : 1.0);
            b.append(k).append(",3,").append(String.format(java.util.Locale.ROOT, "%.1f", l)).append(",15,treble\n");
        }
        Path p = dir.resolve("sheet.csv");
        Files.writeString(p, b);
        return p;
    }

    @Test
    void writesTheContractColumnsAndNamesThePlantedNote() throws IOException {
        Path out = dir.resolve("d.csv");
        CheckWireCommandTest.Run r = CheckWireCommandTest.run("diagnose", sheet(1.15).toString(), "--keys", "F5-C7",
                "--out", out.toString());
        assertEquals(0, r.rc(), r.err());
        List<Map<String, String>> rows = CheckWireCommandTest.csv(out);
        assertEquals(76 - 57 + 1, rows.size());
        for (String col : List.of("key", "note", "stress_mpa", "break_pct", "headroom_cents", "break_hz",
                "trend_deviation_pct", "stands_out")) {
            assertTrue(rows.get(0).containsKey(col), col);
        }
        for (Map<String, String> m : rows) {
            assertEquals(m.get("key").equals("70"), m.get("stands_out").equals("true"), "key " + m.get("key"));
        }
        assertTrue(r.out().contains("Finding (length and pitch)"), r.out());
        assertTrue(r.out().contains("What the figures cannot see"));
        assertTrue(r.out().contains("Cautions:"));
        assertTrue(Files.readString(out).contains("# inspect: "));
    }

    @Test
    void aWoundStringGivenWithItsWindingAndOneBareEndIsDiagnosedAndGivenAShorterLength() throws IOException {
        // the shorter-length remedy shortens the winding with the speaking length, the bare end staying
        StringBuilder b = new StringBuilder("key,strings,length_mm,wire_mm,wrap1_mm,winding_mm,bare_front_mm,section\n");
        for (int k = 1; k <= 20; k++) {
            double l = 1500 * Math.pow(0.97, k - 1) * (k == 10 ? 1.75 : 1.0);
            b.append(k).append(",1,").append(String.format(java.util.Locale.ROOT, "%.1f,1.3,0.9,%.1f,20,bass%n", l,
                    l - 40));
        }
        Path p = Files.writeString(dir.resolve("bass.csv"), b);
        CheckWireCommandTest.Run r = CheckWireCommandTest.run("diagnose", p.toString(), "--keys", "1-20");
        assertEquals(0, r.rc(), r.err() + r.out());
        // the remedy is computed on the shortened string: its winding of 1955.6 mm with 20 mm bare at the
        // front would not fit 1879.5 mm unless it is shortened with the speaking length
        assertTrue(r.out().replaceAll("\\s+", " ").contains("Shorter speaking lengths: key 10 1879.5 mm (now 1995.6, "
                + "116.1 mm shorter)"), r.out());
    }

    @Test
    void badArgumentsGiveExitTwoAndNoFile() throws IOException {
        Path sheet = sheet(1.0);
        Path out = dir.resolve("never.csv");
        Path badTable = dir.resolve("t.csv");
        Files.writeString(badTable, "diameter_mm\n0.8\n");
        for (String[] args : List.of(new String[]{"diagnose", sheet.toString(), "--out", out.toString()},
                new String[]{"diagnose", sheet.toString(), "--keys", "X9-C8", "--out", out.toString()},
                new String[]{"diagnose", sheet.toString(), "--keys", "1-20", "--out", out.toString()},
                new String[]{"diagnose", sheet.toString(), "--keys", "60-80", "--compare", badTable.toString(),
                        "--out", out.toString()},
                new String[]{"diagnose", sheet.toString(), "--keys", "60-80", "--margin", "0", "--out",
                        out.toString()})) {
            CheckWireCommandTest.Run r = CheckWireCommandTest.run(args);
            assertEquals(2, r.rc(), String.join(" ", args) + "\n" + r.err());
            assertTrue(r.err().startsWith("error: "), r.err());
            assertFalse(Files.exists(out));
        }
    }

    @Test
    void contractRunOnTheDemoGrandMarksItsHotTrebleGroup() throws IOException {
        assumeTrue(Files.exists(CheckWireCommandTest.GRAND), "demo grand not present");
        Path out = dir.resolve("d.csv");
        CheckWireCommandTest.Run r = CheckWireCommandTest.run("diagnose", CheckWireCommandTest.GRAND.toString(),
                "--keys", "60-88", "--out", out.toString());
        assertEquals(0, r.rc(), r.err());
        List<Map<String, String>> rows = CheckWireCommandTest.csv(out);
        assertEquals(29, rows.size());
        // the planted group of the demo's README: keys 65–71 (64 as the shoulder)
        for (Map<String, String> m : rows) {
            int key = Integer.parseInt(m.get("key"));
            if (key >= 65 && key <= 71) {
                assertEquals("true", m.get("stands_out"), "key " + key);
            }
            if (key < 64 || key > 71) {
                assertEquals("false", m.get("stands_out"), "key " + key);
            }
        }
        assertTrue(r.out().contains("[brings it under]"), r.out());
    }
}
