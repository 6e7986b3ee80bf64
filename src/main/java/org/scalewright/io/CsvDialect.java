package org.scalewright.io;

/**
 * How a results CSV is written. {@link #PLAIN} is for machines and for this program (commas between
 * cells, decimal points, UTF-8 without a byte-order mark); {@link #DECIMAL_COMMA} is for spreadsheets in
 * the many locales that write decimals with a comma: semicolons between cells, a decimal comma in every
 * number cell, and a UTF-8 byte-order mark so that the spreadsheet takes the text as UTF-8. The program
 * reads both back (DESIGN §4).
 */
public enum CsvDialect {
    PLAIN(',', false),
    DECIMAL_COMMA(';', true);

    private final char separator;
    private final boolean decimalComma;

    CsvDialect(char separator, boolean decimalComma) {
        this.separator = separator;
        this.decimalComma = decimalComma;
    }

    /** @return the character between cells */
    public char separator() {
        return separator;
    }

    /** @return a number cell as this dialect writes it */
    String number(String cell) {
        return decimalComma && CsvTable.isDecimal(cell) ? cell.replace('.', ',') : cell;
    }

    /** @return a comment line as this dialect writes it (a quoted comment after {@code #;} instead of {@code #,}) */
    String comment(String text) {
        String line = CommentLines.line(text);
        return separator != ',' && line.startsWith("#,") ? "#" + separator + line.substring(2) : line;
    }

    /** @return the bytes that begin the file: a UTF-8 byte-order mark for a spreadsheet's dialect */
    byte[] start() {
        return decimalComma ? new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF} : new byte[0];
    }
}
