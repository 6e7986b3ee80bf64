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

    @Test
    @DisplayName("every row of the built-in ASTM A228 tables is the source's row, and no row is added "
            + "(ASTM A228/A228M tensile requirements as republished by Interwire Group, "
            + "https://www.interwiregroup.com/product/tinned-coated-music-wire/)")
    void builtInRowsAreTheSourceRows() {
        double[][] src = AstmA228Source.ROWS;
        StrengthTable min = BuiltInData.astmMinimum();
        double[] minD = min.diameters();
        double[] minS = min.strengths();
        assertEquals(src.length, minD.length, "minimum table rows (" + AstmA228Source.SOURCE + ")");
        for (int i = 0; i < src.length; i++) {
            assertEquals(src[i][0] * IN, minD[i], 1e-15, "diameter of row " + (i + 1));
            assertEquals(src[i][1] * KSI, minS[i], src[i][1] * KSI * 1e-12, "minimum at " + src[i][0] + " in");
        }
        StrengthTable max = BuiltInData.astmMaximum();
        double[] maxD = max.diameters();
        double[] maxS = max.strengths();
        // the source's 0.036 in maximum (255 ksi) is a misprint, below its minimum of 321: left out
        assertEquals(src.length - 1, maxD.length, "maximum table rows (" + AstmA228Source.SOURCE + ")");
        int j = 0;
        for (double[] row : src) {
            if (row[0] == AstmA228Source.MISPRINTED_MAX_DIAMETER_IN) {
                assertTrue(row[2] < row[1], "the left-out row is the one printed below its own minimum");
                continue;
            }
            assertEquals(row[0] * IN, maxD[j], 1e-15, "diameter of maximum row " + (j + 1));
            assertEquals(row[2] * KSI, maxS[j], row[2] * KSI * 1e-12, "maximum at " + row[0] + " in");
            j++;
        }
        for (double[] row : src) {
            assertEquals(row[1] * KSI, min.strengthAt(row[0] * IN), row[1] * KSI * 1e-12, "lookup at " + row[0]);
        }
    }

    /*
     * Hand-worked log-log interpolation between two tabulated rows of the source (values above):
     * t = ln(d/d0) / ln(d1/d0), σ = σ0 · (σ1/σ0)^t.
     *   0.031 in (size 13) between 0.030 in 330 ksi and 0.032 in 327 ksi: t = 0.50807, σ = 328.472 ksi
     *   0.033 in (size 14) between 0.032 in 327 and 0.034 in 324:         t = 0.50758, σ = 325.474 ksi
     *   0.035 in (size 15) between 0.034 in 324 and 0.036 in 321:         t = 0.50714, σ = 322.475 ksi
     *   0.037 in (size 16) between 0.036 in 321 and 0.038 in 318:         t = 0.50676, σ = 319.476 ksi
     *   0.039 in (size 17) between 0.038 in 318 and 0.040 in 315:         t = 0.50641, σ = 316.477 ksi
     *   0.044 in between 0.042 in 313 and 0.045 in 309:                   t = 0.67427, σ = 310.297 ksi
     *   0.118 in between 0.112 in 266 and 0.121 in 263:                   t = 0.67518, σ = 263.971 ksi
     * (the old staircase read 330, 327, 324, 321, 318, 313 and 263 ksi at these diameters)
     */
    @ParameterizedTest(name = "{0} in: {1} ksi")
    @CsvSource({"0.031, 328.472", "0.033, 325.474", "0.035, 322.475", "0.037, 319.476", "0.039, 316.477",
            "0.044, 310.297", "0.118, 263.971"})
    @DisplayName("between tabulated rows the strength is log-log interpolated (hand-worked points)")
    void logLogInterpolation(double inches, double ksi) {
        assertEquals(ksi * KSI, BuiltInData.astmMinimum().strengthAt(inches * IN), 0.001 * KSI);
    }

    @Test
    @DisplayName("between rows the strength is exactly linear in log d – log σ")
    void logLogInterpolationIsExact() {
        StrengthTable t = BuiltInData.astmMinimum();
        double d0 = 0.042 * IN;
        double d1 = 0.045 * IN;
        double s0 = 313 * KSI;
        double s1 = 309 * KSI;
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
        // the end segment 0.225 in 235 ksi – 0.250 in 230 ksi carried on to 0.300 in:
        // t = ln(0.300/0.225)/ln(0.250/0.225) = 2.73045, σ = 235 · (230/235)^t = 221.598 ksi
        double slopeTop = Math.log(230.0 / 235.0) / Math.log(0.250 / 0.225);
        double d = 0.300 * IN;
        assertEquals(230 * KSI * Math.pow(0.300 / 0.250, slopeTop), t.strengthAt(d), KSI * 1e-9);
        assertEquals(221.598 * KSI, t.strengthAt(d), 0.001 * KSI);
        double slopeBottom = Math.log(426.0 / 439.0) / Math.log(0.005 / 0.004);
        double thin = 0.003 * IN;
        assertEquals(439 * KSI * Math.pow(0.003 / 0.004, slopeBottom), t.strengthAt(thin), KSI * 1e-9);
        assertFalse(t.covers(d));
        assertFalse(t.covers(thin));
        assertTrue(t.covers(0.004 * IN));
        assertTrue(t.covers(0.125 * IN));
        assertTrue(t.covers(0.250 * IN));
        assertTrue(t.covers(0.040 * IN));
        assertEquals(0.004 * IN, t.minDiameter(), 1e-15);
        assertEquals(0.250 * IN, t.maxDiameter(), 1e-15);
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
