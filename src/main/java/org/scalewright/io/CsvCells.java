package org.scalewright.io;

import java.math.BigDecimal;
import java.math.MathContext;

/** Formatting of cells for the CSV files the program writes. */
public final class CsvCells {
    private static final MathContext DIGITS = new MathContext(10);

    private CsvCells() {
    }

    /**
     * Makes a text cell safe for spreadsheets: a cell that begins with {@code =}, {@code +},
     * {@code -} or {@code @} and is not a number gets a leading apostrophe, so a spreadsheet
     * shows it as text instead of running it as a formula.
     */
    public static String safeText(String text) {
        if (text == null || text.isEmpty()) {
            return "";
        }
        char c = text.charAt(0);
        if ((c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r') && !isNumber(text)) {
            return "'" + text;
        }
        return text;
    }

    private static boolean isNumber(String text) {
        try {
            Double.parseDouble(text);
            return !text.endsWith("d") && !text.endsWith("f") && !text.endsWith("D") && !text.endsWith("F");
        } catch (NumberFormatException e) {
            return false;
        }
    }

    /** @return a number with up to 10 significant digits, no exponent, no trailing zeros */
    public static String number(double v) {
        if (!Double.isFinite(v)) {
            return "";
        }
        if (v == 0) {
            return "0";
        }
        return new BigDecimal(v).round(DIGITS).stripTrailingZeros().toPlainString();
    }

    /** @return a number rounded to {@code decimals} places, trailing zeros kept off */
    public static String fixed(double v, int decimals) {
        if (!Double.isFinite(v)) {
            return "";
        }
        BigDecimal b = BigDecimal.valueOf(v).setScale(decimals, java.math.RoundingMode.HALF_EVEN).stripTrailingZeros();
        return b.signum() == 0 ? "0" : b.toPlainString();
    }

    /** @return a number in scientific notation with 4 significant digits (for B) */
    public static String scientific(double v) {
        if (!Double.isFinite(v)) {
            return "";
        }
        return String.format(java.util.Locale.ROOT, "%.4e", v);
    }
}
