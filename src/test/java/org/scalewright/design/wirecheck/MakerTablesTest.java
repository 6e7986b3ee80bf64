package org.scalewright.design.wirecheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.scalewright.model.PitchStandard;
import org.scalewright.physics.StrengthTable;

class MakerTablesTest {
    @Test
    void keepsSeveralTablesByNameAndReplacesOneOfTheSameName() {
        StrengthTable a = WireCheckTest.FLAT_2000;
        StrengthTable b = WireCheckTest.SLOPED;
        MakerTables t = MakerTables.empty().with(a).with(b);
        assertEquals(List.of(a.name(), b.name()), t.names());
        StrengthTable a2 = a.scaled(1.05, a.name());
        MakerTables replaced = t.with(a2);
        assertEquals(2, replaced.size());
        assertTrue(replaced.byName(a.name()).orElseThrow() == a2);
        assertEquals(List.of(b.name()), t.without(a.name()).names());
        assertThrows(IllegalArgumentException.class, () -> new MakerTables(List.of(a, a2)));
    }

    @Test
    void comparesTwoTablesNoteByNote() {
        StrengthComparison c = StrengthComparison.compare(WireCheckTest.testScale(), PitchStandard.ISO_16,
                WireCheckTest.settings(WireCheckTest.FLAT_2000), WireCheckTest.FLAT_2000, WireCheckTest.SLOPED);
        assertEquals(WireCheckTest.testScale().notes().size(), c.rows().size());
        for (StrengthComparison.Row r : c.rows()) {
            double ratio = WireCheckTest.SLOPED.strengthAt(r.diameter()) / 2000e6;
            assertEquals(r.pctFirst() / ratio, r.pctSecond(), 1e-9 * r.pctFirst());
            assertEquals(100 * (ratio - 1), r.secondStrongerPct(), 1e-9);
        }
    }
}
