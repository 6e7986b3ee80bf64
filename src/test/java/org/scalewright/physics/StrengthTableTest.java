package org.scalewright.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.UnitConversions;

class StrengthTableTest {
    private static final double IN = UnitConversions.METRES_PER_INCH;
    private static final double KSI = UnitConversions.PASCALS_PER_KSI;

    /*
     * ASTM A228/A228M tensile requirements (minimum and maximum tensile strength by diameter)
     * as republished by music and spring wire makers, from memory. At a tabulated diameter the
     * table returns the tabulated value exactly.
     */
    @ParameterizedTest(name = "{0} in: {1}–{2} ksi")
    @CsvSource({"0.004, 439, 485", "0.010, 387, 428", "0.020, 350, 387", "0.033, 327, 361", "0.040, 315, 349",
            "0.063, 293, 324", "0.080, 282, 312", "0.100, 271, 300", "0.125, 261, 289"})
    @DisplayName("ASTM A228 table points (ASTM A228 tensile requirements as republished by wire makers, from memory)")
    void astmPoints(double inches, double minKsi, double maxKsi) {
        assertEquals(minKsi * KSI, BuiltInData.astmMinimum().strengthAt(inches * IN), minKsi * KSI * 1e-12);
        assertEquals(maxKsi * KSI, BuiltInData.astmMaximum().strengthAt(inches * IN), maxKsi * KSI * 1e-12);
    }

    @Test
    @DisplayName("between rows the strength is exactly linear in log d – log σ (hand-worked)")
    void logLogInterpolation() {
        StrengthTable t = BuiltInData.astmMinimum();
        double d0 = 0.100 * IN;
        double d1 = 0.106 * IN;
        double s0 = 271 * KSI;
        double s1 = 268 * KSI;
        // geometric mean of the diameters → geometric mean of the strengths
        assertEquals(Math.sqrt(s0 * s1), t.strengthAt(Math.sqrt(d0 * d1)), s0 * 1e-12);
        for (double u : new double[] {0.1, 0.25, 0.75, 0.9}) {
            double d = Math.pow(d0, 1 - u) * Math.pow(d1, u);
            assertEquals(Math.pow(s0, 1 - u) * Math.pow(s1, u), t.strengthAt(d), s0 * 1e-12, "u = " + u);
        }
        // a hand-made two-row table: σ ∝ d^−0.145 reproduced exactly anywhere between
        StrengthTable power = new StrengthTable("power law", List.of(), new double[] {0.25e-3, 3.2e-3},
                new double[] {2211e6 * Math.pow(0.25, -0.145), 2211e6 * Math.pow(3.2, -0.145)});
        for (double dmm = 0.25; dmm <= 3.2; dmm *= 1.1) {
            assertEquals(2211e6 * Math.pow(dmm, -0.145), power.strengthAt(dmm * 1e-3), 1e-3);
        }
    }

    @Test
    @DisplayName("outside the table the end segment is extrapolated log-log, and covers() says so")
    void extrapolation() {
        StrengthTable t = BuiltInData.astmMinimum();
        double slopeTop = Math.log(261.0 / 263.0) / Math.log(0.125 / 0.118);
        double d = 0.150 * IN;
        assertEquals(261 * KSI * Math.pow(0.150 / 0.125, slopeTop), t.strengthAt(d), KSI * 1e-9);
        double slopeBottom = Math.log(426.0 / 439.0) / Math.log(0.005 / 0.004);
        double thin = 0.003 * IN;
        assertEquals(439 * KSI * Math.pow(0.003 / 0.004, slopeBottom), t.strengthAt(thin), KSI * 1e-9);
        assertFalse(t.covers(d));
        assertFalse(t.covers(thin));
        assertTrue(t.covers(0.004 * IN));
        assertTrue(t.covers(0.125 * IN));
        assertTrue(t.covers(0.040 * IN));
        assertEquals(0.004 * IN, t.minDiameter(), 1e-15);
        assertEquals(0.125 * IN, t.maxDiameter(), 1e-15);
    }

    @Test
    @DisplayName("Shigley cross-check σ = 2211 MPa·d[mm]^−0.145 agrees within 4 % over 0.25–3.2 mm "
            + "(Shigley's Mechanical Engineering Design, Table 10-4, music wire A228, from memory)")
    void shigleyCrossCheck() {
        StrengthTable t = BuiltInData.astmMinimum();
        double worst = 0;
        for (double dmm = 0.25; dmm <= 3.2 + 1e-9; dmm += 0.01) {
            double shigley = 2211e6 * Math.pow(dmm, -0.145);
            double table = t.strengthAt(dmm * 1e-3);
            double dev = Math.abs(shigley / table - 1);
            worst = Math.max(worst, dev);
            assertTrue(dev < 0.04, String.format("%.2f mm: table %.0f MPa, Shigley %.0f MPa", dmm, table / 1e6,
                    shigley / 1e6));
        }
        assertTrue(worst > 0.01, "the fit is not the table itself (worst deviation " + worst + ")");
    }

    @Test
    @DisplayName("the ASTM maximum lies above the minimum at every diameter")
    void maximumAboveMinimum() {
        StrengthTable min = BuiltInData.astmMinimum();
        StrengthTable max = BuiltInData.astmMaximum();
        for (double d : min.diameters()) {
            assertTrue(max.strengthAt(d) > min.strengthAt(d), d * 1e3 + " mm");
        }
        for (double d : max.diameters()) {
            assertTrue(max.strengthAt(d) > min.strengthAt(d), d * 1e3 + " mm");
        }
        for (double dmm = 0.05; dmm < 4.0; dmm *= 1.01) {
            assertTrue(max.strengthAt(dmm * 1e-3) > min.strengthAt(dmm * 1e-3), dmm + " mm");
        }
    }

    @Test
    @DisplayName("strength never rises with diameter in the ASTM tables")
    void strengthFallsWithDiameter() {
        for (StrengthTable t : List.of(BuiltInData.astmMinimum(), BuiltInData.astmMaximum())) {
            double[] s = t.strengths();
            for (int i = 1; i < s.length; i++) {
                assertTrue(s[i] <= s[i - 1], t.name() + " row " + i);
            }
        }
    }

    @Test
    void scaledTable() {
        StrengthTable t = BuiltInData.astmMinimum();
        StrengthTable s = t.scaled(1.05, "5 % stronger");
        assertEquals("5 % stronger", s.name());
        for (double dmm = 0.2; dmm < 3.5; dmm += 0.1) {
            assertEquals(1.05 * t.strengthAt(dmm * 1e-3), s.strengthAt(dmm * 1e-3), 1e-3);
        }
    }

    @Test
    void preconditionsNameTheValue() {
        StrengthTable t = BuiltInData.astmMinimum();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> t.strengthAt(-0.001));
        assertEquals("wire diameter must be > 0 mm, was -1", e.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> new StrengthTable("x", List.of(), new double[] {1e-3, 1e-3}, new double[] {2e9, 2e9}));
        assertThrows(IllegalArgumentException.class,
                () -> new StrengthTable("x", List.of(), new double[] {1e-3}, new double[] {2e9}));
        assertThrows(IllegalArgumentException.class,
                () -> new StrengthTable("x", List.of(), new double[] {1e-3, 2e-3}, new double[] {2e9}));
        assertThrows(IllegalArgumentException.class,
                () -> new StrengthTable("x", List.of(), new double[] {1e-3, 2e-3}, new double[] {2e9, -1}));
    }
}
