package org.scalewright.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import java.util.Random;
import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The one number-formatting home: fixed point against the JDK, and the rules for written cells. */
class NumberTextTest {
    @Test
    @DisplayName("fixed gives the digits of the JDK's String.format (independent check), ties included")
    void fixedAgreesWithStringFormat() {
        Random r = new Random(7);
        for (int i = 0; i < 20000; i++) {
            double v = (r.nextDouble() - 0.3) * Math.pow(10, r.nextInt(5));
            if (i % 4 == 0) {
                v = Math.round(v * 1000) / 1000.0 + 0.0005; // a decimal tie such as 2.6755
            }
            for (int places = 0; places <= 3; places++) {
                String expected = String.format(Locale.ROOT, "%." + places + "f", v);
                if (expected.matches("-0(\\.0+)?")) {
                    expected = expected.substring(1);
                }
                assertEquals(expected, NumberText.fixed(v, places), "v=" + v + " places=" + places);
            }
        }
    }

    @Test
    void signedAddsAPlusToPositiveValues() {
        assertEquals("+8.1", NumberText.signed(8.1, 1));
        assertEquals("-21.5", NumberText.signed(-21.5, 1));
        assertEquals("+0.0", NumberText.signed(0.0, 1));
    }

    @Test
    @DisplayName("plain writes whole numbers without a point and cuts arithmetic noise off")
    void plain() {
        assertEquals("12", NumberText.plain(12));
        assertEquals("14.5", NumberText.plain(14.5));
        assertEquals("0.3", NumberText.plain(0.1 + 0.2));
        assertEquals("1.04", NumberText.plain(104 * 0.01));
        assertEquals("0.00001", NumberText.plain(1e-5));
        assertEquals("-2.5", NumberText.plain(-2.5));
    }

    @Test
    void upToDropsZerosBeyondTheMinimum() {
        assertEquals("1480.0", NumberText.upTo(1480, 1, 2));
        assertEquals("1.075", NumberText.upTo(1.075, 2, 3));
        assertEquals("1.10", NumberText.upTo(1.1, 2, 3));
        assertEquals("1.040", NumberText.upTo(104 * 0.01, 3, 4));
        assertEquals("17", NumberText.upTo(17, 0, 2));
    }

    @Test
    void roundedAndSignificant() {
        assertEquals("1445.6", NumberText.rounded(1445.62, 1));
        assertEquals("325", NumberText.rounded(325.0, 1));
        assertEquals("0", NumberText.rounded(-0.01, 1));
        assertEquals("", NumberText.rounded(Double.NaN, 1));
        assertEquals("0.3", NumberText.significant(0.1 + 0.2, 10));
        assertEquals("1234567890", NumberText.number(1234567890.1));
        assertEquals("0.001234567891", NumberText.number(0.0012345678912345));
    }

    private static final DoubleUnaryOperator MM = LengthUnit.MM::toMetres;
    private static final DoubleUnaryOperator IN = LengthUnit.IN::toMetres;

    private static String mm(double metres, int places) {
        return NumberText.sheetCell(metres, MM, LengthUnit.MM.fromMetres(metres), places);
    }

    private static String in(double metres, int places) {
        return NumberText.sheetCell(metres, IN, LengthUnit.IN.fromMetres(metres), places);
    }

    @Test
    @DisplayName("a sheet cell keeps the digits a user typed")
    void typedValuesKeepTheirDigits() {
        for (String typed : new String[] {"1.6", "1985.5", "0.925", "1987.123456789", "1234.5678901234", "2010"}) {
            assertEquals(typed, mm(MM.applyAsDouble(Double.parseDouble(typed)), 3), typed);
        }
        for (String typed : new String[] {"0.0591", "0.05905", "46.5", "2.0625"}) {
            assertEquals(typed, in(IN.applyAsDouble(Double.parseDouble(typed)), 5), typed);
        }
    }

    @Test
    @DisplayName("a computed value is written without noise, to the precision of its quantity")
    void computedValuesLoseTheNoise() {
        assertEquals("1.04", mm(104 * 0.01e-3, 3));
        assertEquals("2.1", mm(0.0021000000000000003, 3)); // 2.1 mm, one unit in the last place off
        assertEquals("1.075", mm(43 * 0.025e-3, 3)); // planned on a 0.025 mm grid
        assertEquals("1.0025", mm(401 * 0.0025e-3, 3)); // a finer grid keeps its one digit more
        assertEquals("1.414", mm(Math.sqrt(2) * 1e-3, 3)); // genuinely computed: to 0.001 mm
        // a metric catalogue diameter on an inch sheet: 0.00001 in, which reads back to the same 0.001 mm
        String cell = in(1.125e-3, 5);
        assertEquals("0.04429", cell);
        assertEquals(1.125, Math.round(Double.parseDouble(cell) * 25.4 * 1000) / 1000.0, 0);
    }

    @Test
    @DisplayName("a pitch or cents value keeps every digit it needs to read back")
    void exactCells() {
        double hz = 27.5 * Math.pow(2, 5 / 12.0);
        assertEquals(hz, Double.parseDouble(NumberText.sheetCellExact(hz, x -> x, hz)), 0);
        assertEquals("442", NumberText.sheetCellExact(442, x -> x, 442));
        assertEquals("-2.5", NumberText.sheetCellExact(-2.5, x -> x, -2.5));
        assertEquals("0.3", NumberText.sheetCellExact(0.1 + 0.2, x -> x, 0.1 + 0.2));
    }

    /**
     * The exact text of a double: the examples are IEEE 754 binary64 values worked by hand
     * (0.1 + 0.2 is 0.3000000000000000444…, so 17 digits are needed); the random values check the
     * round trip bit for bit over the whole range, and that no more significant digits are used than
     * Java's own {@link Double#toString} (Java SE 17 API: "as many, but only as many, more digits as
     * are needed to uniquely distinguish the argument value"), an independent upper bound.
     */
    @Test
    void exactTextReadsBackBitForBitAndIsPlain() {
        assertEquals("1052", NumberText.exact(1052.0));
        assertEquals("0.0001", NumberText.exact(1.0E-4));
        assertEquals("0.30000000000000004", NumberText.exact(0.1 + 0.2));
        assertEquals("-0", NumberText.exact(-0.0));
        assertEquals("0", NumberText.exact(0.0));
        assertEquals("-2.5", NumberText.exact(-2.5));
        Random r = new Random(20261202);
        for (int i = 0; i < 20_000; i++) {
            double v = i % 10 == 0 ? Double.longBitsToDouble(r.nextLong()) : (r.nextDouble() - 0.5) * Math.pow(10, r.nextInt(13) - 6);
            if (!Double.isFinite(v)) {
                continue;
            }
            String t = NumberText.exact(v);
            assertEquals(Double.doubleToRawLongBits(v), Double.doubleToRawLongBits(Double.parseDouble(t)), t);
            assertEquals(-1, t.indexOf('E'), t);
            if (v != 0) {
                assertTrue(significantDigits(t) <= significantDigits(Double.toString(v)), t + " vs " + v);
            }
        }
    }

    private static int significantDigits(String text) {
        String mantissa = text.replaceFirst("[eE].*$", "").replace("-", "").replace(".", "");
        return mantissa.replaceFirst("^0+", "").replaceFirst("0+$", "").length();
    }
}
