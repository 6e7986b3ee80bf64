package org.scalewright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The bounds every reader other than the scale sheet's holds (issue 14, part 4): keys of target
 * curves and pitch files, rows, file size, and at most 50 problems told.
 */
class InputBoundsTest {
    @TempDir
    Path dir;

    private Path file(String text) throws IOException {
        return Files.writeString(dir.resolve("in.csv"), text, StandardCharsets.UTF_8);
    }

    private static List<SheetProblem> problems(Executable read) {
        return assertThrows(BadInputException.class, read::run).problems();
    }

    private interface Executable {
        void run() throws Exception;
    }

    @ParameterizedTest
    @DisplayName("a target curve's key of 200 or near 2^31 is refused at its cell, nothing is built")
    @ValueSource(strings = {"200", "2147483000", "2147483648", "C99"})
    void targetCurveKeyOutOfRange(String key) throws IOException {
        Path f = file("key,tension_n\n40,700\n" + key + ",600\n");
        List<SheetProblem> ps = problems(() -> TargetCurveReader.read(f));
        assertEquals(1, ps.size(), ps.toString());
        assertEquals(3, ps.get(0).line());
        assertEquals("key", ps.get(0).column());
        assertTrue(ps.get(0).message().startsWith("key must be -20 to 108"), ps.toString());
    }

    @ParameterizedTest
    @DisplayName("a pitch file's key of 200 or near 2^31 is refused at its cell")
    @ValueSource(strings = {"200", "2147483647", "-21"})
    void pitchFileKeyOutOfRange(String key) throws IOException {
        Path f = file("key,cents_flat\n40,10\n" + key + ",12\n");
        List<SheetProblem> ps = problems(() -> PitchStateReader.read(f));
        assertEquals("in.csv, line 3, column key: key must be -20 to 108 (A0 is 1, C8 is 88), was " + key,
                ps.get(0).toString());
    }

    @Test
    @DisplayName("a strength table with 1,000 bad rows tells 50 problems and how many more there were")
    void strengthTableTellsAtMostFifty() throws IOException {
        StringBuilder b = new StringBuilder("diameter_mm,tensile_mpa\n");
        for (int i = 0; i < 1000; i++) {
            b.append("x,2000\n");
        }
        Path f = file(b.toString());
        List<SheetProblem> ps = problems(() -> StrengthTableReader.read(f));
        assertEquals(51, ps.size());
        assertEquals(2, ps.get(0).line());
        assertEquals(51, ps.get(49).line());
        assertEquals("in.csv: 950 more problems not shown (the first 50 are above)", ps.get(50).toString());
    }

    @Test
    @DisplayName("a pitch file of 100,000 rows is refused at row 401 with one message")
    void pitchFileRowLimit() throws IOException {
        StringBuilder b = new StringBuilder("key,cents_flat\n");
        for (int i = 0; i < 100_000; i++) {
            b.append("H9,abc\n");
        }
        Path f = file(b.toString());
        List<SheetProblem> ps = problems(() -> PitchStateReader.read(f));
        assertEquals(List.of(new SheetProblem(f, 402, "", "more than 400 rows; at most 400 are read (one row per key)")),
                ps);
    }

    @Test
    @DisplayName("a strength table over 2 MiB is refused before it is read")
    void strengthTableTooLarge() throws IOException {
        Path f = file("diameter_mm,tensile_mpa\n" + "1.0,2000\n".repeat(300_000));
        List<SheetProblem> ps = problems(() -> StrengthTableReader.read(f));
        assertEquals(1, ps.size());
        assertTrue(ps.get(0).message().startsWith("is too large to be a piano's data (2,700,024 bytes; at most "
                + "2,097,152 bytes are read)"), ps.toString());
    }
}
