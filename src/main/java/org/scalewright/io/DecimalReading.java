package org.scalewright.io;

import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;

/**
 * How the numbers of one CSV file are written, and each number cell turned into a plain decimal with a
 * point (DESIGN §4: a decimal comma where the delimiter is {@code ;} or tab; never a silent misreading).
 *
 * <p>Where commas separate the cells (and in a workbook's text cells) the point is the decimal mark, and
 * a number holding a comma (a quoted {@code "1,143"}) is refused: it could be 1.143 or 1143. Where
 * semicolons or tabs separate the cells, the file itself shows its decimal mark: a number such as
 * {@code 14,5} or {@code 0,950} can only hold a decimal comma, one such as {@code 14.5} or
 * {@code 1250.5} only a decimal point, while {@code 1.143} or {@code 1,143} fits both a decimal mark
 * and a thousands separator. A file that shows one mark reads its numbers with it, and a number written
 * with the other mark is refused; a file that shows none refuses its numbers shaped like {@code 1.143};
 * a file that shows both refuses its numbers with a mark. A number with both a point and a comma
 * ({@code 1.250,5}) holds a thousands separator and is always refused. Each refusal names the file, line
 * and column and says how to write the number.
 */
final class DecimalReading {
    private static final Pattern POINT = Pattern.compile("[+-]?(\\d+\\.\\d*|\\.\\d+)([eE][+-]?\\d+)?");
    private static final Pattern COMMA = Pattern.compile("[+-]?(\\d+,\\d*|,\\d+)([eE][+-]?\\d+)?");
    /** Shaped as thousands groups: 1.143, 12.500, 1.250.000 (a leading 0 is never a group). */
    private static final Pattern GROUPED = Pattern.compile("[+-]?[1-9]\\d{0,2}([.,]\\d{3})+");
    private static final Pattern BOTH = Pattern.compile("[+-]?\\d[\\d.,]*[.,][\\d.,]*\\d([eE][+-]?\\d+)?");

    /** Where the file showed a decimal mark: line, column and the cell, or null. */
    private record Shown(int line, String column, String cell) {
        @Override
        public String toString() {
            return "'" + cell + "' on line " + line + (column.isEmpty() ? "" : " in column " + column);
        }
    }

    private final Path file;
    private final char delimiter;
    private final Shown comma;
    private final Shown point;

    private DecimalReading(Path file, char delimiter, Shown comma, Shown point) {
        this.file = file;
        this.delimiter = delimiter;
        this.comma = comma;
        this.point = point;
    }

    /**
     * @param delimiter the file's delimiter, 0 for a workbook
     * @param header    the header names, lower-cased, for the messages
     * @param rows      the data rows
     * @param textColumn true for the positions of columns that hold words, not numbers (not looked at)
     */
    static DecimalReading of(Path file, char delimiter, List<String> header, List<CsvTable.Row> rows,
                             java.util.function.IntPredicate textColumn) {
        Shown comma = null;
        Shown point = null;
        if (delimiter == ';' || delimiter == '\t') {
            for (CsvTable.Row r : rows) {
                for (int c = 0; c < r.cells().size(); c++) {
                    String name = c < header.size() ? header.get(c) : "";
                    if (textColumn.test(c)) {
                        continue;
                    }
                    String cell = r.cells().get(c);
                    if (GROUPED.matcher(cell).matches()) {
                        continue;
                    }
                    if (comma == null && COMMA.matcher(cell).matches()) {
                        comma = new Shown(r.line(), name, cell);
                    } else if (point == null && POINT.matcher(cell).matches()) {
                        point = new Shown(r.line(), name, cell);
                    }
                }
            }
        }
        return new DecimalReading(file, delimiter, comma, point);
    }

    /** @return true when the file reads its numbers with a decimal comma */
    boolean commaIsDecimal() {
        return comma != null && point == null;
    }

    /**
     * @param cell   a cell of a number column, trimmed
     * @param line   its line, for the message
     * @param column its column's name, for the message
     * @param problems where a refusal is added
     * @return the cell with a decimal comma turned into a point where the file uses one; the cell as
     *         it is when it holds no number with a mark; null when its reading depends on the locale
     */
    String plain(String cell, int line, String column, List<SheetProblem> problems) {
        boolean hasComma = cell.indexOf(',') >= 0;
        boolean hasPoint = cell.indexOf('.') >= 0;
        if (!hasComma && !hasPoint) {
            return cell;
        }
        boolean both = hasComma && hasPoint && BOTH.matcher(cell).matches();
        if (!both && !COMMA.matcher(cell).matches() && !POINT.matcher(cell).matches() && !GROUPED.matcher(cell).matches()) {
            return cell;
        }
        String refusal = refusal(cell, both, hasComma);
        if (refusal != null) {
            problems.add(new SheetProblem(file, line, column, refusal));
            return null;
        }
        return hasComma ? cell.replace(',', '.') : cell;
    }

    private String refusal(String cell, boolean both, boolean hasComma) {
        String plainly = " Write numbers without thousands separators";
        if (both) {
            return "'" + cell + "' holds both a point and a comma, so one of them is a thousands separator;"
                    + plainly + ", as 1250.5 or 1250,5.";
        }
        if (delimiter != ';' && delimiter != '\t') {
            if (!hasComma) {
                return null;
            }
            return "'" + cell + "' holds a comma, which could be a decimal comma or a thousands separator ("
                    + (delimiter == 0 ? "in a workbook a number should be a number cell, not text"
                    : "the cells are separated by commas, so the decimal mark is a point") + ")."
                    + " Write it with a decimal point and no thousands separator (" + cell.replace(',', '.')
                    + " or " + cell.replace(",", "") + ").";
        }
        if (comma != null && point != null) {
            return "'" + cell + "': this file writes decimals with a comma (" + comma + ") and with a point ("
                    + point + "), so which is meant here cannot be told. Save the file again with one decimal mark"
                    + " (in a spreadsheet: one language setting), or with commas between cells and decimal points.";
        }
        if (comma != null) {
            return hasComma ? null : "'" + cell + "': this file writes decimals with a comma (" + comma + "), so the "
                    + "point here would be a thousands separator, but " + cell + " could as well be a number with a "
                    + "decimal point; which is meant cannot be told." + plainly + ": " + cell.replace(".", "")
                    + " or " + cell.replace('.', ',') + ".";
        }
        if (point != null) {
            return !hasComma ? null : "'" + cell + "': this file writes decimals with a point (" + point + "), so "
                    + "the comma here would be a thousands separator, but " + cell + " could as well be a number "
                    + "with a decimal comma; which is meant cannot be told." + plainly + ": " + cell.replace(",", "")
                    + " or " + cell.replace(',', '.') + ".";
        }
        return "'" + cell + "' could be a number with a decimal " + (hasComma ? "comma" : "point") + " or one with a "
                + "thousands separator, and no other number of this file shows which mark it uses. If it is "
                + cell.replace(hasComma ? "," : ".", "") + ", write it so; if not, save the file with commas "
                + "between cells and decimal points (or write this column's numbers with more or fewer decimals).";
    }
}
