package org.scalewright.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** The one accepted range of a pitch standard a user gives. */
class PitchStandardTest {
    @Test
    void aUserMayGiveThreeHundredToSixHundredHertz() {
        // Baroque pitches near 415 Hz, ISO 16 440 Hz and the higher modern orchestral pitches all
        // fall inside 300-600 Hz (common practice, no source)
        for (double hz : new double[] {300, 392, 415, 440, 442, 466, 600}) {
            assertEquals(hz, PitchStandard.of(hz).a4());
        }
        for (double hz : new double[] {0, 299.99, 600.01, 1200, -440, Double.NaN, Double.POSITIVE_INFINITY}) {
            InvalidInput e = assertThrows(InvalidInput.class, () -> PitchStandard.of(hz));
            assertEquals("pitch standard A4 must be 300 to 600 Hz, was " + Checks.format(hz), e.getMessage());
        }
        assertEquals("pitch standard A4 must be 300 to 600 Hz, was 1200",
                assertThrows(InvalidInput.class, () -> PitchStandard.of(1200)).getMessage());
    }

    @Test
    void theEngineTakesAnyPositiveFrequency() {
        assertEquals(250.0, new PitchStandard(250).a4(), "a diagnosis may try a pitch standard below the user range");
        assertThrows(IllegalArgumentException.class, () -> new PitchStandard(0));
        assertThrows(IllegalArgumentException.class, () -> new PitchStandard(Double.POSITIVE_INFINITY));
    }
}
