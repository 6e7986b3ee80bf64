package org.scalewright.design.wirecheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.junit.jupiter.api.Test;

class PitchStateTest {
    @Test
    void measuredFiguresAreInterpolatedBetweenKeysAndHeldBeyondTheEnds() {
        PitchState s = PitchState.measured(Map.of(10, 20.0, 20, 40.0, 40, 30.0));
        assertEquals(20.0, s.centsFlat(1), 0);
        assertEquals(20.0, s.centsFlat(10), 0);
        assertEquals(30.0, s.centsFlat(15), 1e-12);
        assertEquals(35.0, s.centsFlat(30), 1e-12);
        assertEquals(30.0, s.centsFlat(88), 0);
        assertEquals(PitchState.Source.MEASURED, s.source(20));
        assertEquals(PitchState.Source.INTERPOLATED, s.source(21));
        assertTrue(s.isPerNote());
    }

    @Test
    void oneFigureForEveryNote() {
        PitchState s = PitchState.uniform(35);
        assertEquals(35.0, s.centsFlat(-2), 0);
        assertEquals(PitchState.Source.UNIFORM, s.source(50));
        assertFalse(s.noRaise());
        assertTrue(PitchState.uniform(-5).noRaise());
        assertTrue(PitchState.atPitch().noRaise());
    }

    @Test
    void badFiguresAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> PitchState.uniform(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> PitchState.measured(Map.of()));
    }

    @Test
    void stageLimitInPercentOrKiloNewtons() {
        assertEquals(9000, StageLimit.percentOfTotal(5).newtons(180_000), 1e-9);
        assertEquals(12_000, StageLimit.kiloNewtons(12).newtons(180_000), 1e-9);
        assertEquals("5 % of the present total", StageLimit.DEFAULT.describe());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> StageLimit.kiloNewtons(-3));
        assertTrue(e.getMessage().contains("-3"), e.getMessage());
    }
}
