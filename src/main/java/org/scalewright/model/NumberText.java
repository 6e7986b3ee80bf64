package org.scalewright.model;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;

/**
 * The one place where numbers become text: terminal, window, CSV files, scale sheets and the PDF
 * all write their numbers through it, so a value is never printed with binary-float noise
 * ({@code 1.0399999999999998}) and the same value reads the same everywhere.
 *
 * <p>{@link #fixed} is allocation-light: flag texts are built on every analysis, and
 * {@code String.format} costs microseconds a call. It gives the same digits as
 * {@code String.format("%.nf")} (the shortest decimal of the double, rounded half up), except
 * that a value that rounds to zero never carries a minus sign.
 *
 * <p>Precision rules for what the program writes (DESIGN §4, DEVELOPERS.md "Numbers in files"):
 * {@link #sheetCell} keeps a value the user typed as typed and writes a computed value to the
 * precision of its quantity.
 */
public final class NumberText {
    private static final long[] POW10 = {1, 10, 100, 1000, 10000, 100000, 1000000};
    /** Digits at which arithmetic noise is cut off: a planned 1.0399999999999998 is 1.04 at 12 digits. */
    private static final MathContext CLEAN = new MathContext(12, RoundingMode.HALF_EVEN);
    /** A number typed by hand has at most this many significant digits; more is arithmetic. */
    private static final int TYPED_DIGITS = 15;

    private NumberText() {
    }

    /**
     * @param places decimals, 0–6
     * @return {@code v} with exactly {@code places} decimals: {@code fixed(61.64, 1)} → {@code 61.6},
     *         {@code fixed(1.1, 3)} → {@code 1.100}; {@code NaN}/{@code Infinity} as Java writes them
     */
    public static String fixed(double v, int places) {
        if (places < 0 || places >= POW10.length) {
            throw new IllegalArgumentException("decimal places must be 0 to 6, was " + places);
        }
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        double scaled = Math.abs(v) * POW10[places];
        if (scaled > 1e15 || Math.abs(scaled - Math.floor(scaled) - 0.5) < 1e-6) {
            // near a tie (or too large for a long): let the decimal value of the double decide
            return exactFixed(v, places);
        }
        long scale = POW10[places];
        long r = Math.round(scaled);
        String sign = v < 0 && r != 0 ? "-" : "";
        if (places == 0) {
            return sign + r;
        }
        String frac = Long.toString(r % scale);
        StringBuilder b = new StringBuilder(24).append(sign).append(r / scale).append('.');
        for (int i = frac.length(); i < places; i++) {
            b.append('0');
        }
        return b.append(frac).toString();
    }

    private static String exactFixed(double v, int places) {
        BigDecimal b = BigDecimal.valueOf(v).setScale(places, RoundingMode.HALF_UP);
        return (b.signum() == 0 ? b.abs() : b).toPlainString();
    }

    /** @return like {@link #fixed} with a leading {@code +} unless the text begins with a minus */
    public static String signed(double v, int places) {
        String s = fixed(v, places);
        return s.startsWith("-") ? s : "+" + s;
    }

    /**
     * @return {@code v} with at least {@code min} and at most {@code max} decimals, zeros beyond
     *         {@code min} dropped: {@code upTo(1480, 1, 2)} → {@code 1480.0}, {@code upTo(1.075, 2, 3)} → {@code 1.075}
     */
    public static String upTo(double v, int min, int max) {
        String s = fixed(v, max);
        int dot = s.indexOf('.');
        if (dot < 0) {
            return s;
        }
        int end = s.length();
        while (end > dot + 1 + min && s.charAt(end - 1) == '0') {
            end--;
        }
        if (end == dot + 1) {
            end = dot;
        }
        return s.substring(0, end);
    }

    /**
     * @return {@code v} rounded to {@code places} decimals, trailing zeros dropped, no exponent
     *         ({@code rounded(1445.62, 1)} → {@code 1445.6}, {@code rounded(325.0, 1)} → {@code 325});
     *         empty for a value that is not finite
     */
    public static String rounded(double v, int places) {
        if (!Double.isFinite(v)) {
            return "";
        }
        BigDecimal b = BigDecimal.valueOf(v).setScale(places, RoundingMode.HALF_EVEN).stripTrailingZeros();
        return b.signum() == 0 ? "0" : b.toPlainString();
    }

    /** @return {@code v} to 10 significant digits, trailing zeros dropped, no exponent; empty if not finite */
    public static String number(double v) {
        return significant(v, 10);
    }

    /** @return {@code v} to {@code digits} significant digits, trailing zeros dropped, no exponent; empty if not finite */
    public static String significant(double v, int digits) {
        if (!Double.isFinite(v)) {
            return "";
        }
        if (v == 0) {
            return "0";
        }
        return new BigDecimal(v).round(new MathContext(digits, RoundingMode.HALF_EVEN)).stripTrailingZeros().toPlainString();
    }

    /**
     * @return a value as a person writes it, with the arithmetic noise cut off: {@code 12}, {@code 14.5},
     *         {@code 0.01}, {@code 0.1 + 0.2} → {@code 0.3}; no exponent
     */
    public static String plain(double v) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return BigDecimal.valueOf(v).round(CLEAN).stripTrailingZeros().toPlainString();
    }

    /**
     * @return the shortest plain decimal (no exponent) that reads back with {@link Double#parseDouble} to
     *         exactly {@code v}, bit for bit: {@code 1052}, {@code 0.0001}, {@code 0.30000000000000004},
     *         {@code -0} for negative zero; {@code NaN}/{@code Infinity} as Java writes them
     */
    public static String exact(double v) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        if (v == 0) {
            return 1 / v < 0 ? "-0" : "0";
        }
        // Java's own text reads back exactly (Double.toString) but may carry a digit more than needed
        BigDecimal java = new BigDecimal(Double.toString(v)).stripTrailingZeros();
        BigDecimal whole = new BigDecimal(v);
        for (int digits = 1; digits < java.precision(); digits++) {
            String text = whole.round(new MathContext(digits, RoundingMode.HALF_EVEN)).stripTrailingZeros()
                    .toPlainString();
            if (Double.parseDouble(text) == v) {
                return text;
            }
        }
        return java.toPlainString();
    }

    /** @return scientific notation with {@code decimals} decimals in the mantissa, {@code 3.41e-04}; empty if not finite */
    public static String scientific(double v, int decimals) {
        if (!Double.isFinite(v)) {
            return "";
        }
        return String.format(Locale.ROOT, "%." + decimals + "e", v);
    }

    /** @return a whole number with thousands separated by commas: {@code 40,990} */
    public static String grouped(double v) {
        return String.format(Locale.ROOT, "%,.0f", v);
    }

    /**
     * The text of a number cell in a file the program writes and reads back (a scale sheet). In
     * this order:
     * <ol>
     * <li>the shortest text with at most {@code places + 1} decimals that reads back exactly
     *     (a value typed with the usual digits, or a clean planned one);</li>
     * <li>the shortest text that reads back exactly, when it has at most 15 significant digits
     *     (a value the user typed with more digits than usual keeps them);</li>
     * <li>the shortest text with at most {@code places + 1} decimals within 10⁻¹² of the value
     *     (a planned value on a grid, carrying arithmetic noise: {@code 1.0399999999999998} → {@code 1.04});</li>
     * <li>else the value rounded to {@code places} decimals (computed, e.g. converted between units).</li>
     * </ol>
     *
     * @param value    the value as the program holds it (e.g. metres)
     * @param readBack how the reader turns the written number into {@code value} (e.g. mm → m)
     * @param shown    the value in the unit of the cell (e.g. mm)
     * @param places   the decimals of the quantity's precision in that unit (3 for a diameter in mm)
     */
    public static String sheetCell(double value, DoubleUnaryOperator readBack, double shown, int places) {
        return sheetCell(value, readBack, shown, places, true);
    }

    /**
     * Like {@link #sheetCell} for a quantity that has no catalogue precision (a pitch in Hz, cents):
     * steps 1 to 3 with up to 6 decimals, else the shortest text that reads back exactly.
     */
    public static String sheetCellExact(double value, DoubleUnaryOperator readBack, double shown) {
        return sheetCell(value, readBack, shown, 5, false);
    }

    private static String sheetCell(double value, DoubleUnaryOperator readBack, double shown, int places,
                                    boolean roundLast) {
        if (!Double.isFinite(shown)) {
            return "";
        }
        for (int d = 0; d <= places + 1; d++) {
            String t = rounded(shown, d);
            if (readBack.applyAsDouble(Double.parseDouble(t)) == value) {
                return t;
            }
        }
        BigDecimal shortest = new BigDecimal(Double.toString(shown)).stripTrailingZeros();
        String exact = null;
        for (int digits = Math.min(10, shortest.precision()); digits <= 17; digits++) {
            String t = new BigDecimal(shown).round(new MathContext(digits, RoundingMode.HALF_EVEN))
                    .stripTrailingZeros().toPlainString();
            if (readBack.applyAsDouble(Double.parseDouble(t)) == value) {
                if (digits <= TYPED_DIGITS) {
                    return t;
                }
                exact = t;
                break;
            }
        }
        for (int d = 0; d <= places + 1; d++) {
            String t = rounded(shown, d);
            if (Math.abs(Double.parseDouble(t) - shown) <= 1e-12 * Math.abs(shown)) {
                return t;
            }
        }
        return roundLast || exact == null ? rounded(shown, places) : exact;
    }
}
