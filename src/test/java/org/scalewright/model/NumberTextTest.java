package org.scalewright.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** The fast flag formatter agrees with the JDK's {@code String.format} (independent check). */
class DecimalsTest {
    @Test
    void agreesWithStringFormatAwayFromTies() {
        Random r = new Random(7);
        for (int i = 0; i < 20000; i++) {
            double v = (r.nextDouble() - 0.3) * Math.pow(10, r.nextInt(5));
            for (int places = 0; places <= 3; places++) {
                double scaled = Math.abs(v) * Math.pow(10, places);
                if (Math.abs(scaled - Math.floor(scaled) - 0.5) < 1e-6) {
                    continue; // a tie: binary representation decides, skip
                }
                String expected = String.format(Locale.ROOT, "%." + places + "f", v);
                if (expected.matches("-0(\\.0+)?")) {
                    expected = expected.substring(1);
                }
                assertEquals(expected, Decimals.of(v, places), "v=" + v + " places=" + places);
            }
        }
    }

    @Test
    void signedAddsAPlusToPositiveValues() {
        assertEquals("+8.1", Decimals.signed(8.1, 1));
        assertEquals("-21.5", Decimals.signed(-21.5, 1));
        assertEquals("+0.0", Decimals.signed(0.0, 1));
    }
}
