package org.scalewright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A sheet (CSV file or workbook) split into its comment lines, its header and its data rows, each row
 * keeping its line number: the one reading path of every input (DESIGN §4). Lines whose first cell
 * begins with {@code #} are comments (a comment written as {@code #,"quoted text"} is read as its
 * text, {@link CommentLines}; padding a spreadsheet added is left out); blank lines are skipped.
 * Quoted cells may hold delimiters, quotes and line breaks (OpenCSV's parser). Number cells are
 * given as plain decimals with a point ({@link DecimalReading}).
 *
 * @param file     the file read
 * @param comments the text of the comment lines before the header, without the {@code #}
 * @param commentLines the line number of each comment line
 * @param header   the header cells, trimmed and lower-cased
 * @param headerLine line number of the header
 * @param rows     the data rows
 */
record CsvTable(Path file, List<String> comments, List<Integer> commentLines, List<String> header, int headerLine,
                List<Row> rows) {

    /** One data row. @param line 1-based line number @param cells the cells, trimmed */
    record Row(int line, List<String> cells) {
    }

    /** @return the table's name: its first comment line (whose data it is), else the file name */
    String title() {
        return comments.isEmpty() ? String.valueOf(file.getFileName()) : comments.get(0);
    }

    /** The most cells a line may have; no input of the program has more than 16 columns. */
    static final int MAX_CELLS = 100;

    /**
     * What a file's rows are, for the message when there are too many.
     *
     * @param maxRows the most data rows read
     * @param what    what one row is, in words ({@code "a scale sheet has one row per key"})
     */
    record RowLimit(int maxRows, String what) {
        static final RowLimit KEYS = new RowLimit(InputLimits.MAX_KEY_ROWS, "one row per key");
        static final RowLimit TABLE = new RowLimit(InputLimits.MAX_TABLE_ROWS, "one row per diameter");
    }

    /** Header names of the columns that hold words, not numbers, in any file the program reads. */
    static final List<String> TEXT_COLUMNS = List.of("remark", "section", "wrap_metal", "metal", "note");

    /**
     * Reads a CSV file or a workbook (DESIGN §4, "Sheets come from spreadsheets"): the encoding from the
     * bytes ({@link TextFile}), the delimiter from the header ({@link CsvRecords}), a workbook's first
     * sheet ({@link WorkbookRecords}); number cells are given back as plain decimals with a point
     * ({@link DecimalReading}). How the file was read is told to {@link ReadNotes} where it is worth
     * telling.
     */
    static CsvTable read(Path file, RowLimit limit) throws BadInputException {
        return parse(file, TextFile.bytes(file), limit);
    }

    /** As {@link #read}, from bytes already in memory; {@code file} names them in messages. */
    static CsvTable parse(Path file, byte[] bytes, RowLimit limit) throws BadInputException {
        SheetRecords records;
        if (WorkbookRecords.isWorkbook(bytes)) {
            records = WorkbookRecords.read(file, bytes);
        } else {
            TextFile.Text text = TextFile.decode(file, bytes);
            records = CsvRecords.split(file, text.text(), text.note());
        }
        CsvTable table = build(file, records, limit);
        for (String note : records.notes()) {
            ReadNotes.tell(file, note);
        }
        return table;
    }

    private static CsvTable build(Path file, SheetRecords records, RowLimit limit) throws BadInputException {
        List<String> comments = new ArrayList<>();
        List<Integer> commentLines = new ArrayList<>();
        List<String> header = null;
        int headerLine = 0;
        List<Row> rows = new ArrayList<>();
        for (SheetRecords.Record r : records.records()) {
            if (r.isComment()) {
                if (header == null) {
                    comments.add(r.comment());
                    commentLines.add(r.line());
                }
                continue;
            }
            if (r.cells().size() > MAX_CELLS) {
                throw new BadInputException(List.of(new SheetProblem(file, r.line(), "", "the line has "
                        + r.cells().size() + " cells; at most " + MAX_CELLS + " are read")));
            }
            List<String> trimmed = new ArrayList<>(r.cells().size());
            for (String c : r.cells()) {
                trimmed.add(c.strip());
            }
            if (header != null && rows.size() == limit.maxRows()) {
                throw new BadInputException(List.of(new SheetProblem(file, r.line(), "", "more than "
                        + limit.maxRows() + " rows; at most " + limit.maxRows() + " are read (" + limit.what()
                        + ")")));
            }
            if (header == null) {
                header = trimmed.stream().map(h -> h.toLowerCase(Locale.ROOT)).toList();
                headerLine = r.line();
            } else {
                rows.add(new Row(r.line(), trimmed));
            }
        }
        if (header == null) {
            throw BadInputException.of(file, records.records().isEmpty()
                    ? "the file is empty; expected a header line and rows"
                    : "has no header line; expected a line of column names such as key,strings,length_mm,wire");
        }
        CsvTable t = dropBlankTrailingColumns(new CsvTable(file, List.copyOf(comments), List.copyOf(commentLines),
                header, headerLine, List.copyOf(rows)));
        return t.withPlainNumbers(DecimalReading.of(file, records.delimiter(), t.header(), t.rows(), t::isText));
    }

    /**
     * @return this table with every cell of a number column written as a plain decimal with a point
     * @throws BadInputException naming every cell whose reading depends on the locale
     */
    private CsvTable withPlainNumbers(DecimalReading reading) throws BadInputException {
        List<SheetProblem> problems = new ArrayList<>();
        List<Row> plain = new ArrayList<>(rows.size());
        for (Row r : rows) {
            List<String> cells = new ArrayList<>(r.cells());
            for (int c = 0; c < cells.size(); c++) {
                String name = c < header.size() ? header.get(c) : "";
                if (!isText(c)) {
                    String p = reading.plain(cells.get(c), r.line(), name, problems);
                    cells.set(c, p == null ? cells.get(c) : p);
                }
            }
            plain.add(new Row(r.line(), List.copyOf(cells)));
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        List<String> plainComments = comments;
        if (reading.commaIsDecimal()) {
            plainComments = comments.stream().map(CsvTable::plainSetting).toList();
        }
        return new CsvTable(file, plainComments, commentLines, header, headerLine, List.copyOf(plain));
    }

    /** @return true when the column at {@code position} holds words, not numbers */
    private boolean isText(int position) {
        return position < header.size() && TEXT_COLUMNS.contains(header.get(position));
    }

    /** A {@code # name: 442,5} setting of a decimal-comma file, its number with a point. */
    private static String plainSetting(String comment) {
        return comment.matches("[^:]+:\\s*[+-]?\\d+,\\d+\\s*") ? comment.replace(',', '.') : comment;
    }

    /**
     * Spreadsheet exports often end every line with a comma: trailing columns with no name and
     * no value in any row are dropped. A blank-named column that holds values is kept (and
     * reported by the reader).
     */
    private static CsvTable dropBlankTrailingColumns(CsvTable t) {
        int width = t.header().size();
        while (width > 0 && t.header().get(width - 1).isEmpty() && columnIsBlank(t.rows(), width - 1)) {
            width--;
        }
        if (width == t.header().size()) {
            return t;
        }
        final int w = width;
        List<Row> rows = t.rows().stream()
                .map(r -> r.cells().size() > w ? new Row(r.line(), r.cells().subList(0, w)) : r).toList();
        return new CsvTable(t.file(), t.comments(), t.commentLines(), t.header().subList(0, w), t.headerLine(),
                rows);
    }

    private static boolean columnIsBlank(List<Row> rows, int col) {
        for (Row r : rows) {
            if (r.cells().size() > col && !r.cells().get(col).isEmpty()) {
                return false;
            }
        }
        return true;
    }

    private static final java.util.regex.Pattern DECIMAL =
            java.util.regex.Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");

    /**
     * @return true when a cell is a plain decimal number such as {@code 12}, {@code -3.5} or {@code 1e-3};
     *         false for what Java would also read as a number but a user would not write ({@code 12d},
     *         {@code 0x1p3}, {@code NaN}, {@code Infinity})
     */
    static boolean isDecimal(String cell) {
        return DECIMAL.matcher(cell).matches();
    }

    /** @return the cell of {@code row} at {@code col}, "" when the row is shorter */
    static String cell(Row row, int col) {
        return col >= 0 && col < row.cells().size() ? row.cells().get(col) : "";
    }

    /**
     * Reads a required number cell written as a plain decimal, as every reader of the program
     * accepts them; adds a problem and returns null when the cell is empty or not such a number.
     *
     * @param column the column's name, for the message
     * @param what   what the number is, in words, for the message ({@code "a tension in N"})
     */
    static Double requiredNumber(Path file, Row row, int col, String column, String what, List<SheetProblem> problems) {
        String text = cell(row, col);
        if (text.isEmpty()) {
            problems.add(new SheetProblem(file, row.line(), column, "a value is required here (" + what + ")"));
            return null;
        }
        if (!isDecimal(text)) {
            problems.add(new SheetProblem(file, row.line(), column, "expected " + what + ", was '" + text + "'"));
            return null;
        }
        return Double.parseDouble(text);
    }

    /** @return the line number of the {@code # name: value} comment, or 0 */
    int commentLine(String name) {
        for (int i = 0; i < comments.size(); i++) {
            String c = comments.get(i);
            int colon = c.indexOf(':');
            if (colon > 0 && c.substring(0, colon).strip().equalsIgnoreCase(name)) {
                return commentLines.get(i);
            }
        }
        return 0;
    }

    /** @return the value of a {@code # name: value} comment, or null */
    String commentValue(String name) {
        for (String c : comments) {
            int colon = c.indexOf(':');
            if (colon > 0 && c.substring(0, colon).strip().equalsIgnoreCase(name)) {
                return c.substring(colon + 1).strip();
            }
        }
        return null;
    }
}
