package org.scalewright.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** Enum constants chosen by a word: hyphens for underscores, case and blanks around ignored, the choices told. */
class WordChoiceTest {
    @Test
    void aWordPicksItsConstantAndAnyOtherIsToldWithTheChoices() {
        assertEquals(BreakPlace.FRONT_BEARING, BreakPlace.of(" Front-Bearing "));
        assertEquals("pitch-raise", BreakActivity.PITCH_RAISE.word());
        InvalidInput e = assertThrows(InvalidInput.class, () -> BreakPlace.of("coil"));
        assertEquals("where the string broke must be tuning-pin, front-bearing, speaking-length, bridge, hitch-pin "
                + "or unknown, was 'coil'", e.getMessage());
        assertEquals("tuning-pin, front-bearing, speaking-length, bridge, hitch-pin, unknown", BreakPlace.words());
    }
}
