package org.scalewright.app.table;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.io.ScaleSheetWriter;
import org.scalewright.model.DisplayUnits;
import org.scalewright.model.Scale;
import org.scalewright.model.UnitConversions;
import org.scalewright.model.Wrap;

/** The note table's OD and OD1 columns: shown beside the wraps, editable, one undoable edit each. */
class OutsideDiameterEditTest {
    @TempDir
    Path dir;
    private TableOnSheet t;

    @BeforeEach
    void open() throws Exception {
        t = new TableOnSheet(dir, """
                key,strings,length_mm,wire_mm,wrap1_mm,wrap2_mm,od_mm,od1_mm
                1,1,1950,1.6,0.7,1.45,,
                12,2,1500,1.3,,,3.35,
                40,3,690,1.05,,,,
                """);
    }

    @Test
    void theOdIsShownBesideTheWrapsInTheDisplayUnit() {
        assertEquals("5.900", t.text(1, NoteColumn.OD));
        assertEquals("3.000", t.text(1, NoteColumn.OD1));
        assertEquals("1.025", t.text(12, NoteColumn.WRAP1), "(3.35 − 1.3)/2");
        assertEquals("3.350", t.text(12, NoteColumn.OD));
        assertEquals("", t.text(12, NoteColumn.OD1));
        assertEquals("", t.text(40, NoteColumn.OD));
        t.session.unitsProperty().set(DisplayUnits.IMPERIAL);
        assertEquals("0.2323", t.text(1, NoteColumn.OD), "5.9 mm in inches (1 in = 25.4 mm, NIST SP 811)");
    }

    @Test
    void editingTheOdRecomputesTheWrapAsOneUndoableEdit() {
        Scale before = t.session.scale();
        double tensionBefore = t.row(12).result().tension();
        assertTrue(t.table.edit(12, NoteColumn.OD, "3.45"));
        assertEquals(1.075e-3, t.note(12).wrap().inner(), 1e-12, "(3.45 − 1.3)/2");
        assertTrue(t.note(12).wrap().givenByOd());
        assertEquals("1.075", t.text(12, NoteColumn.WRAP1));
        assertTrue(t.row(12).result().tension() > tensionBefore, "a thicker wrap is heavier");
        t.session.undo();
        assertSame(before, t.session.scale(), "one edit, undone in one step");
        assertFalse(t.session.isDirty());
    }

    @Test
    void editingTheOdOfADoubleWoundStringKeepsOd1AndRecomputesTheOuterWrap() {
        assertTrue(t.table.edit(1, NoteColumn.OD, "6.1"));
        Wrap w = t.note(1).wrap();
        assertEquals(0.7e-3, w.inner(), 1e-12);
        assertEquals((6.1 - 3.0) / 2 * 1e-3, w.outer(), 1e-12);
        assertTrue(t.table.edit(1, NoteColumn.OD1, "3.2"));
        w = t.note(1).wrap();
        assertEquals(0.8e-3, w.inner(), 1e-12);
        assertEquals(1.45e-3, w.outer(), 1e-12, "(6.1 − 3.2)/2");
        assertEquals("6.100", t.text(1, NoteColumn.OD));
    }

    @Test
    void editingAWrapUpdatesTheOdAndTheSheetKeepsItsForm() throws Exception {
        assertTrue(t.table.edit(12, NoteColumn.WRAP1, "1.1"));
        assertEquals("3.500", t.text(12, NoteColumn.OD), "1.3 + 2 × 1.1");
        assertTrue(t.note(12).wrap().givenByOd(), "a note given by OD stays given by OD");
        assertTrue(t.table.edit(1, NoteColumn.WRAP2, "1.5"));
        assertEquals("6.000", t.text(1, NoteColumn.OD), "1.6 + 2 × 0.7 + 2 × 1.5");
        Path saved = dir.resolve("saved.csv");
        ScaleSheetWriter.write(t.session.scale(), saved, false);
        String text = Files.readString(saved);
        // by OD, with the two decimals its column was typed with; by its wires
        assertTrue(text.contains("\n12,2,1500,1.3,,,3.50,\n"), text);
        assertTrue(text.contains("\n1,1,1950,1.6,0.7,1.50,,\n"), text);
        assertEquals(t.session.scale().notes(), ScaleSheetReader.standard().read(saved).notes());
    }

    @Test
    void anOdOnPlainWireMakesItWoundAndAnInchEntryIsConverted() {
        t.session.unitsProperty().set(DisplayUnits.IMPERIAL);
        assertTrue(t.table.edit(40, NoteColumn.OD, "0.1"));
        double od = 0.1 * UnitConversions.METRES_PER_INCH;
        assertEquals((od - 1.05e-3) / 2, t.note(40).wrap().inner(), 1e-12);
        assertTrue(t.table.edit(40, NoteColumn.OD, ""));
        assertFalse(t.note(40).isWound(), "a blank OD makes plain wire, as a blank wrap 1 does");
    }

    @Test
    void badOdEntriesChangeNothing() {
        Scale before = t.session.scale();
        assertFalse(t.table.edit(12, NoteColumn.OD, "1.2"), "not larger than the 1.3 mm core");
        assertFalse(t.table.edit(1, NoteColumn.OD1, "6.0"), "not below the OD");
        assertFalse(t.table.edit(1, NoteColumn.OD, "2.9"), "not above OD1");
        assertFalse(t.table.edit(40, NoteColumn.OD1, "2.0"), "plain wire has no first layer");
        assertSame(before, t.session.scale());
    }
}
