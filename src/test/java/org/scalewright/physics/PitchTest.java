package org.scalewright.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.OptionalDouble;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;

class PitchTest {

    /*
     * Reference frequencies: twelve-tone equal temperament f = 440 Hz · 2^((k − 49)/12) with
     * A4 = 440 Hz (ISO 16:1975), as tabulated in the standard table of piano key frequencies
     * (e.g. the "Piano key frequencies" table of general references), values from memory,
     * given there to 4 decimals for A0 and C4, 3 for C8. The tolerance is half a unit in the
     * last tabulated digit.
     */
    @ParameterizedTest(name = "key {0} = {1} Hz")
    @CsvSource({
            "1, 27.5000, 0.00005",     // A0
            "40, 261.6256, 0.00005",   // C4 (middle C)
            "49, 440.0000, 0.00005",   // A4, ISO 16 standard pitch
            "88, 4186.009, 0.0005",    // C8
            "52, 523.2511, 0.00005",   // C5
            "4, 32.7032, 0.00005"      // C1
    })
    @DisplayName("equal-tempered key frequencies at A4 = 440 Hz (ISO 16; piano key frequency table, from memory)")
    void equalTemperedFrequencies(int key, double hz, double tolerance) {
        assertEquals(hz, Pitch.equalTempered(key, 440.0), tolerance);
    }

    @Test
    @DisplayName("octaves double the frequency; a semitone is 2^(1/12) (definition of 12-TET)")
    void octavesAndSemitones() {
        for (int k = -5; k <= 90; k++) {
            assertEquals(2.0, Pitch.equalTempered(k + 12, 440) / Pitch.equalTempered(k, 440), 1e-12);
            assertEquals(Math.pow(2, 1 / 12.0), Pitch.equalTempered(k + 1, 440) / Pitch.equalTempered(k, 440), 1e-12);
        }
    }

    @Test
    @DisplayName("cents: an octave is 1200, a semitone 100, an interval and its inverse cancel (definition of the cent)")
    void centsArithmetic() {
        assertEquals(1200.0, Pitch.cents(440, 880), 1e-9);
        assertEquals(-1200.0, Pitch.cents(880, 440), 1e-9);
        assertEquals(100.0, Pitch.cents(Pitch.equalTempered(48, 440), Pitch.equalTempered(49, 440)), 1e-9);
        assertEquals(0.0, Pitch.cents(261.6, 261.6), 1e-12);
        // 3:2 pure fifth = 701.955 cents (1200 log2 1.5; standard value, from memory)
        assertEquals(701.955, Pitch.cents(200, 300), 0.0005);
        for (double c : new double[] {-250, -3.5, 0, 0.1, 7, 1200, 2400}) {
            double f = Pitch.shiftedByCents(261.6256, c);
            assertEquals(c, Pitch.cents(261.6256, f), 1e-9);
        }
        // A#4 from A4 by +100 cents: 466.1638 Hz (piano key frequency table, from memory)
        assertEquals(466.1638, Pitch.shiftedByCents(440, 100), 0.00005);
    }

    @Test
    @DisplayName("A4 = 442 Hz raises every key by 1200 log2(442/440) = 7.85 cents (hand-worked)")
    void a4At442() {
        double shift = 1200 * Math.log(442.0 / 440.0) / Math.log(2);
        assertEquals(7.851, shift, 0.0005); // hand-worked: ln(1.004545)/ln 2 × 1200
        for (int k : new int[] {-1, 0, 1, 40, 49, 88}) {
            assertEquals(shift, Pitch.cents(Pitch.equalTempered(k, 440), Pitch.equalTempered(k, 442)), 1e-9);
        }
        assertEquals(442.0, Pitch.equalTempered(49, 442), 1e-12);
        assertEquals(442.0 / 16, Pitch.equalTempered(1, 442), 1e-12);
        // C4 at A4 = 442: 442 · 2^(−9/12) = 262.8148 Hz (hand-worked)
        assertEquals(262.8148, Pitch.equalTempered(40, 442), 0.00005);
    }

    @Test
    @DisplayName("working pitch: explicit Hz wins over the key, cents offset applies to either")
    void workingPitch() {
        Note n = Note.plain(49, 3, 0.4, CoreWire.ofDiameter(0.001));
        PitchStandard iso = PitchStandard.ISO_16;
        assertEquals(440.0, Pitch.working(n, iso), 1e-12);
        assertEquals(442.0, Pitch.working(n, new PitchStandard(442)), 1e-12);
        Note cents = n.withPitch(OptionalDouble.empty(), -50);
        assertEquals(Pitch.shiftedByCents(440, -50), Pitch.working(cents, iso), 1e-12);
        Note measured = n.withPitch(OptionalDouble.of(436.5), 0);
        assertEquals(436.5, Pitch.working(measured, new PitchStandard(442)), 1e-12);
        Note measuredAndCents = n.withPitch(OptionalDouble.of(436.5), 12);
        assertEquals(Pitch.shiftedByCents(436.5, 12), Pitch.working(measuredAndCents, iso), 1e-12);
    }

    @Test
    @DisplayName("extended bass keys below A0: key 0 = G#0, key -1 = G0")
    void extendedKeys() {
        assertEquals(27.5 * Math.pow(2, -1 / 12.0), Pitch.equalTempered(0, 440), 1e-12);
        assertEquals(24.4997, Pitch.equalTempered(-1, 440), 0.00005); // G0 (piano key frequency table, from memory)
    }

    @Test
    void badA4IsRejectedWithItsValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Pitch.equalTempered(49, -440));
        assertEquals("A4 frequency must be > 0 Hz, was -440", e.getMessage());
    }
}
