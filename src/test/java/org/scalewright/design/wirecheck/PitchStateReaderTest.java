package org.scalewright.design.wirecheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.scalewright.io.BadInputException;
import org.scalewright.io.PitchStateReader;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;

class PitchStateReaderTest {
    @TempDir
    Path dir;

    private Path file(String text) throws IOException {
        Path p = dir.resolve("flat.csv");
        Files.writeString(p, text);
        return p;
    }

    private static Scale scale() {
        return new Scale("", PitchStandard.ISO_16, List.of(Note.plain(40, 3, 0.8, CoreWire.ofDiameter(1e-3)),
                Note.plain(49, 3, 0.6, CoreWire.ofDiameter(1e-3)), Note.plain(60, 3, 0.3, CoreWire.ofDiameter(1e-3))),
                null);
    }

    @Test
    void readsKeysByNumberOrNameWithCommentsAndRemarks() throws Exception {
        PitchState s = PitchStateReader.read(file("# measured before the raise\nKey,Cents_Flat,remark\n40,30,\nA4,40,fork\n"
                + "60,-5,sharp\n"), scale());
        assertEquals(30, s.centsFlat(40), 0);
        assertEquals(40, s.centsFlat(49), 0);
        assertEquals(-5, s.centsFlat(60), 0);
        assertEquals(30 + 10 * 4 / 9.0, s.centsFlat(44), 1e-12);
        assertEquals(PitchState.Source.INTERPOLATED, s.source(44));
    }

    @Test
    void everyProblemIsReportedWithLineAndColumn() throws Exception {
        BadInputException e = assertThrows(BadInputException.class, () -> PitchStateReader.read(file(
                "key,cents_flat\n40,abc\n49,\nH9,10\n40,12\n41,10\n60,5000\n"), scale()));
        String m = e.getMessage();
        assertTrue(m.contains("line 2, column cents_flat: expected a number of cents, was 'abc'"), m);
        assertTrue(m.contains("line 3, column cents_flat: a value is required here"), m);
        assertTrue(m.contains("line 4, column key: not a key number or note name"), m);
        assertTrue(m.contains("line 6, column key: key 41 is not in the scale"), m);
        assertTrue(m.contains("line 7, column cents_flat: must be between -1200 and 1200"), m);
        assertEquals(5, e.problems().size(), m);
    }

    @Test
    void numbersOnlyJavaWouldReadAreRefusedLikeInScaleSheets() throws Exception {
        BadInputException e = assertThrows(BadInputException.class, () -> PitchStateReader.read(file(
                "key,cents_flat\n40,12d\n41,0x1p3\n42,NaN\n"), scale()));
        assertEquals(3, e.problems().size(), e.getMessage());
        assertTrue(e.getMessage().contains("line 2, column cents_flat: expected a number of cents, was '12d'"),
                e.getMessage());
    }

    @Test
    void duplicateKeysAndBadHeadersAreRefused() throws Exception {
        BadInputException dup = assertThrows(BadInputException.class, () -> PitchStateReader.read(file(
                "key,cents_flat\n40,10\nC4,12\n")));
        assertTrue(dup.getMessage().contains("line 3, column key: key 40 appears twice (first on line 2)"),
                dup.getMessage());
        BadInputException header = assertThrows(BadInputException.class, () -> PitchStateReader.read(file(
                "key,flatness\n40,10\n")));
        assertTrue(header.getMessage().contains("column flatness: unknown column"), header.getMessage());
        assertTrue(header.getMessage().contains("no cents_flat column"), header.getMessage());
        BadInputException empty = assertThrows(BadInputException.class, () -> PitchStateReader.read(file(
                "key,cents_flat\n")));
        assertTrue(empty.getMessage().contains("no rows"), empty.getMessage());
        BadInputException wide = assertThrows(BadInputException.class, () -> PitchStateReader.read(file(
                "key,cents_flat\n40,10,extra\n")));
        assertTrue(wide.getMessage().contains("more cells than the header"), wide.getMessage());
        BadInputException missing = assertThrows(BadInputException.class, () -> PitchStateReader.read(
                dir.resolve("nowhere.csv")));
        assertTrue(missing.getMessage().contains("no such file"), missing.getMessage());
    }
}
