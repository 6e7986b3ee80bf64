package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class StretchCommandTest {
    @TempDir
    Path tmp;

    @ParameterizedTest
    @ValueSource(strings = {"2:1", "4:2", "6:3"})
    void stretchRunsForEveryOctaveTypeAndLeavesA3ToA4AtEqualTemperament(String octave) throws Exception {
        Path out = tmp.resolve("stretch.csv");
        ReportCommandTest.Run r = ReportCommandTest.run("stretch", ReportCommandTest.GRAND.toString(),
                "--octave", octave, "--out", out.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("tuning stretch for " + octave + " octaves"), r.out());
        List<String[]> rows = ReportCommandTest.csv(out);
        assertEquals(List.of("key", "note", "stretch_cents"), Arrays.asList(rows.get(0)).subList(0, 3));
        assertEquals(89, rows.size());
        for (String[] row : rows.subList(1, rows.size())) {
            int key = Integer.parseInt(row[0]);
            double cents = Double.parseDouble(row[2]);
            if (key >= 37 && key <= 49) {
                assertEquals(0.0, cents, 0.0, "key " + key);
            } else if (key > 49) {
                assertTrue(cents > 0, "treble key " + key + " sharp: " + cents);
            } else {
                assertTrue(cents < 0, "bass key " + key + " flat: " + cents);
            }
        }
        ReportCommandTest.noFormulaCells(out);
    }

    @Test
    void withoutOutItOnlyPrints() {
        ReportCommandTest.Run r = ReportCommandTest.run("stretch", ReportCommandTest.UPRIGHT.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("A4") && r.out().contains("stretch cents"), r.out());
        assertFalse(r.out().contains("wrote"));
    }

    @Test
    void aBadOctaveTypeOrSheetWritesNothingAndExitsTwo() throws Exception {
        Path out = tmp.resolve("s.csv");
        ReportCommandTest.Run r = ReportCommandTest.run("stretch", ReportCommandTest.GRAND.toString(),
                "--octave", "8:4", "--out", out.toString());
        assertEquals(2, r.status());
        assertTrue(r.err().contains("octave type must be 2:1, 4:2 or 6:3, was '8:4'"), r.err());
        Path bad = Files.writeString(tmp.resolve("bad.csv"), "key,strings,length_mm,wire\n1,4,1000,14\n");
        r = ReportCommandTest.run("stretch", bad.toString(), "--out", out.toString());
        assertEquals(2, r.status());
        assertTrue(r.err().contains("bad.csv"), r.err());
        assertFalse(Files.exists(out));
    }
}
