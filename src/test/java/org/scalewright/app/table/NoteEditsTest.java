package org.scalewright.app.table;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.scalewright.model.DisplayUnits;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Note;
import org.scalewright.model.UnitConversions;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;

class NoteEditsTest {
    private final NoteEdits edits = new NoteEdits(BuiltInData.musicWireSizes());
    private final Note plain = Note.plain(40, 3, 0.660, CoreWire.ofDiameter(1.0e-3));
    private final Note wound = plain.withWrap(Wrap.single(0.5e-3, WrapMetal.COPPER));

    @Test
    void aWireNumberOfFiveOrMoreIsASizeNumber() {
        Note n = edits.apply(plain, NoteColumn.WIRE, "17", DisplayUnits.METRIC);
        assertEquals(OptionalDouble.of(17), n.wire().musicWireSize());
        assertEquals(BuiltInData.musicWireSizes().bySize(17).orElseThrow().diameter(), n.wire().diameter(), 0);
        assertEquals(OptionalDouble.of(14.5), edits.apply(plain, NoteColumn.WIRE, "#14.5", DisplayUnits.METRIC)
                .wire().musicWireSize());
    }

    @Test
    void aSmallerWireNumberIsADiameterInTheDisplayUnitOrItsOwn() {
        Note mm = edits.apply(plain, NoteColumn.WIRE, "1.1", DisplayUnits.METRIC);
        assertEquals(1.1e-3, mm.wire().diameter(), 1e-15);
        assertTrue(mm.wire().musicWireSize().isEmpty());
        // 1 in = 25.4 mm exactly (NIST SP 811, B.8)
        Note in = edits.apply(plain, NoteColumn.WIRE, "0.043", DisplayUnits.IMPERIAL);
        assertEquals(0.043 * UnitConversions.METRES_PER_INCH, in.wire().diameter(), 1e-15);
        Note named = edits.apply(plain, NoteColumn.WIRE, "1.2 mm", DisplayUnits.IMPERIAL);
        assertEquals(1.2e-3, named.wire().diameter(), 1e-15);
    }

    @Test
    void aSizeOutsideTheTableIsRefusedWithTheRange() {
        var e = assertThrows(IllegalArgumentException.class,
                () -> edits.apply(plain, NoteColumn.WIRE, "25", DisplayUnits.METRIC));
        assertTrue(e.getMessage().contains("25") && e.getMessage().contains("12 to 23"), e.getMessage());
        var text = assertThrows(IllegalArgumentException.class,
                () -> edits.apply(plain, NoteColumn.WIRE, "thick", DisplayUnits.METRIC));
        assertTrue(text.getMessage().contains("'thick'"), text.getMessage());
    }

    @Test
    void lengthsAreReadInTheDisplayUnit() {
        assertEquals(0.6505, edits.apply(plain, NoteColumn.LENGTH, "650.5", DisplayUnits.METRIC).speakingLength(),
                1e-12);
        assertEquals(26 * UnitConversions.METRES_PER_INCH,
                edits.apply(plain, NoteColumn.LENGTH, "26", DisplayUnits.IMPERIAL).speakingLength(), 1e-12);
        var e = assertThrows(IllegalArgumentException.class,
                () -> edits.apply(plain, NoteColumn.LENGTH, "-51", DisplayUnits.METRIC));
        assertEquals("speaking length must be > 0 mm, was -51", e.getMessage());
    }

    @Test
    void wrapsMakeAndUnmakeAWoundString() {
        Note w = edits.apply(plain, NoteColumn.WRAP1, "0.40", DisplayUnits.METRIC);
        assertTrue(w.isWound());
        assertEquals(WrapMetal.COPPER, w.wrap().metal());
        assertEquals(0.40e-3, w.wrap().inner(), 1e-15);
        Note twice = edits.apply(w, NoteColumn.WRAP2, "0.3", DisplayUnits.METRIC);
        assertTrue(twice.wrap().isDouble());
        assertFalse(edits.apply(twice, NoteColumn.WRAP2, "", DisplayUnits.METRIC).wrap().isDouble());
        assertNull(edits.apply(twice, NoteColumn.WRAP1, "", DisplayUnits.METRIC).wrap());
        var e = assertThrows(IllegalArgumentException.class,
                () -> edits.apply(plain, NoteColumn.WRAP2, "0.3", DisplayUnits.METRIC));
        assertTrue(e.getMessage().contains("wrap 1 first"));
    }

    @Test
    void wrapMetalAcceptsItsNameOrFirstLetters() {
        assertEquals(WrapMetal.IRON, edits.apply(wound, NoteColumn.METAL, "Iron", DisplayUnits.METRIC).wrap().metal());
        assertEquals(WrapMetal.STEEL, edits.apply(wound, NoteColumn.METAL, "st", DisplayUnits.METRIC).wrap().metal());
        assertThrows(IllegalArgumentException.class,
                () -> edits.apply(wound, NoteColumn.METAL, "brass", DisplayUnits.METRIC));
        assertThrows(IllegalArgumentException.class,
                () -> edits.apply(plain, NoteColumn.METAL, "copper", DisplayUnits.METRIC));
    }

    @Test
    void stringsPerNoteAreOneToThree() {
        assertEquals(2, edits.apply(plain, NoteColumn.STRINGS, " 2 ", DisplayUnits.METRIC).strings());
        var e = assertThrows(IllegalArgumentException.class,
                () -> edits.apply(plain, NoteColumn.STRINGS, "4", DisplayUnits.METRIC));
        assertEquals("strings per note must be 1, 2 or 3, was '4'", e.getMessage());
    }

    @Test
    void computedColumnsCannotBeEdited() {
        assertThrows(IllegalArgumentException.class,
                () -> edits.apply(plain, NoteColumn.TENSION, "700", DisplayUnits.METRIC));
        assertThrows(IllegalArgumentException.class,
                () -> edits.apply(plain, NoteColumn.KEY, "41", DisplayUnits.METRIC));
    }
}
