package org.scalewright.design.wirecheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Picking the neighbour of a diameter in a list: nearest, next larger, next smaller, exact matches, ends. */
class NeighbourPickTest {
    private static final double MM = 1e-3;
    private static final double[] LIST = {0.775 * MM, 0.800 * MM, 0.825 * MM};

    @Test
    void betweenTwoDiametersEachRoundingPicksItsSide() {
        // 0.790 mm lies between 0.775 and 0.800, nearer 0.800 (0.010 against 0.015)
        double d = 0.790 * MM;
        assertEquals(1, NeighbourPick.of(d, LIST, SizeRounding.NEAREST).index());
        assertEquals(1, NeighbourPick.of(d, LIST, SizeRounding.UP).index());
        assertEquals(0, NeighbourPick.of(d, LIST, SizeRounding.DOWN).index());
        // 0.780 mm is nearer the lower one
        d = 0.780 * MM;
        assertEquals(0, NeighbourPick.of(d, LIST, SizeRounding.NEAREST).index());
        assertEquals(1, NeighbourPick.of(d, LIST, SizeRounding.UP).index());
        assertEquals(0, NeighbourPick.of(d, LIST, SizeRounding.DOWN).index());
    }

    @Test
    void anExactMatchIsKeptWhateverTheRounding() {
        for (SizeRounding r : SizeRounding.values()) {
            NeighbourPick p = NeighbourPick.of(0.800 * MM, LIST, r);
            assertEquals(1, p.index(), r.word());
            assertTrue(p.exact(), r.word());
            // within 0.1 µm counts as the same wire
            assertEquals(1, NeighbourPick.of(0.80005 * MM, LIST, r).index(), r.word());
        }
    }

    @Test
    void anExactTieGoesToTheLargerForNearest() {
        assertEquals(1, NeighbourPick.of(0.7875 * MM, LIST, SizeRounding.NEAREST).index());
    }

    @Test
    void beyondTheEndsTheNearestEndIsTakenAndMarkedWhereTheAskedSideIsMissing() {
        NeighbourPick below = NeighbourPick.of(0.700 * MM, LIST, SizeRounding.DOWN);
        assertEquals(0, below.index());
        assertTrue(below.fellBack());
        NeighbourPick belowUp = NeighbourPick.of(0.700 * MM, LIST, SizeRounding.UP);
        assertEquals(0, belowUp.index());
        assertFalse(belowUp.fellBack());
        NeighbourPick above = NeighbourPick.of(0.900 * MM, LIST, SizeRounding.UP);
        assertEquals(2, above.index());
        assertTrue(above.fellBack());
        assertEquals(2, NeighbourPick.of(0.900 * MM, LIST, SizeRounding.NEAREST).index());
        assertFalse(NeighbourPick.of(0.900 * MM, LIST, SizeRounding.NEAREST).fellBack());
    }

    @Test
    void badArgumentsAreRefusedWithTheirValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> NeighbourPick.of(-1 * MM, LIST, SizeRounding.UP));
        assertTrue(e.getMessage().contains("-1"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> NeighbourPick.of(1 * MM, new double[0], SizeRounding.UP));
        assertThrows(org.scalewright.model.InvalidInput.class, () -> SizeRounding.parse("sideways"));
        assertEquals(SizeRounding.DOWN, SizeRounding.parse(" Down "));
    }
}
