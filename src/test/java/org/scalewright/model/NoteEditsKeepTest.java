package org.scalewright.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/**
 * An edit of one value of a note (as the window and the planners make them) keeps every value
 * it does not touch, the lengths the window does not show included.
 */
class NoteEditsKeepTest {
    private static OptionalDouble mm(double v) {
        return OptionalDouble.of(v * 1e-3);
    }

    private static Note measured() {
        return new Note(10, 2, 1.5, CoreWire.ofDiameter(1.3e-3), Wrap.single(1.05e-3, WrapMetal.COPPER),
                OptionalDouble.empty(), 3, mm(180), mm(1700), mm(1420), "bass", "re-measured", mm(40), mm(40),
                mm(120));
    }

    @Test
    void anotherCoreKeepsBackStretchedAndWoundLengthsAndBareEnds() {
        Note n = measured().withWire(CoreWire.ofDiameter(1.35e-3));
        assertEquals(1.35e-3, n.wire().diameter());
        assertEquals(mm(120), n.backLength());
        assertEquals(mm(1700), n.stretchedLength());
        assertEquals(mm(1420), n.woundLength());
        assertEquals(mm(40), n.bareFront());
        assertEquals(mm(40), n.bareBack());
        assertEquals(mm(180), n.strikePoint());
        assertEquals("re-measured", n.remark());
    }

    @Test
    void otherEditsKeepTheBackLength() {
        assertEquals(mm(120), measured().withStrings(3).backLength());
        assertEquals(mm(120), measured().withSection("tenor").backLength());
        assertEquals(mm(120), measured().withPitch(OptionalDouble.of(55), 0).backLength());
        assertEquals(mm(120), measured().withWrap(null).backLength(), "a plain string keeps its back length");
    }

    @Test
    void aLongerSpeakingLengthThatLeavesNoFrontLengthIsRefused() {
        // back 120 + speaking 1580 = 1700 mm, the whole stretched length: nothing left to the tuning pin
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> measured().withSpeakingLength(1.58));
        assertTrue(e.getMessage().contains("back length 120 mm + speaking length 1580 mm leave nothing"),
                e.getMessage());
    }
}
