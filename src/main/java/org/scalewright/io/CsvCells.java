package org.scalewright.io;

/**
 * Spreadsheet safety of the text cells the program writes; numbers are written by
 * {@link org.scalewright.model.NumberText}.
 */
public final class CsvCells {
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
}
