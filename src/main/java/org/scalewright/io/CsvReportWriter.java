package org.scalewright.io;

import com.opencsv.CSVWriter;
import com.opencsv.ICSVWriter;
import java.io.IOException;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Writes a table of results as CSV: comment lines, a header row of column names, then the rows. Text
 * cells are made spreadsheet-safe ({@link CsvCells#safeText}), comment lines too ({@link CommentLines});
 * the file is written atomically.
 */
public final class CsvReportWriter {
    private CsvReportWriter() {
    }

    /**
     * @param file     the file to write (replaced atomically)
     * @param comments lines written first, each after {@code # } (may be empty)
     * @param header   column names
     * @param rows     cells, one list per row, as many as the header
     */
    public static void write(Path file, List<String> comments, List<String> header, List<List<String>> rows)
            throws IOException {
        write(file, comments, header, rows, false);
    }

    /**
     * As {@link #write(Path, List, List, List)}.
     *
     * @param keepBackup keep a file replaced as {@code NAME.bak}
     */
    public static void write(Path file, List<String> comments, List<String> header, List<List<String>> rows,
                             boolean keepBackup) throws IOException {
        AtomicFiles.write(file, toBytes(comments, header, rows, CsvDialect.PLAIN), keepBackup);
    }

    /** @return the file's bytes in {@code dialect}: a byte-order mark where it has one, then the UTF-8 text */
    public static byte[] toBytes(List<String> comments, List<String> header, List<List<String>> rows,
                                 CsvDialect dialect) {
        byte[] start = dialect.start();
        byte[] text = toText(comments, header, rows, dialect).getBytes(StandardCharsets.UTF_8);
        byte[] all = java.util.Arrays.copyOf(start, start.length + text.length);
        System.arraycopy(text, 0, all, start.length, text.length);
        return all;
    }

    /** @return the CSV text */
    public static String toText(List<String> comments, List<String> header, List<List<String>> rows) {
        return toText(comments, header, rows, CsvDialect.PLAIN);
    }

    /** @return the CSV text in {@code dialect} */
    public static String toText(List<String> comments, List<String> header, List<List<String>> rows,
                                CsvDialect dialect) {
        StringWriter out = new StringWriter();
        for (String c : comments) {
            out.write(dialect.comment(c) + "\n");
        }
        List<List<String>> cells = new ArrayList<>(rows.size());
        for (List<String> row : rows) {
            if (row.size() != header.size()) {
                throw new IllegalArgumentException("row has " + row.size() + " cells, header " + header.size());
            }
            cells.add(row.stream().map(CsvCells::safeText).map(dialect::number).toList());
        }
        writeTable(out, dialect.separator(), false, header, cells);
        return out.toString();
    }

    /**
     * The one place OpenCSV writes a table (results and archive dumps): a header row, then the rows, each
     * line ending in {@code \n}; a cell holding a quote, the separator or a line break is quoted, quotes doubled
     * (RFC 4180).
     *
     * @param quoteAll quote every cell (a dump), else only the cells that need it
     */
    static void writeTable(StringWriter out, char separator, boolean quoteAll, List<String> header,
                           List<List<String>> rows) {
        try (CSVWriter csv = new CSVWriter(out, separator, ICSVWriter.DEFAULT_QUOTE_CHARACTER,
                ICSVWriter.DEFAULT_QUOTE_CHARACTER, "\n")) {
            csv.writeNext(header.toArray(String[]::new), quoteAll);
            for (List<String> row : rows) {
                csv.writeNext(row.toArray(String[]::new), quoteAll);
            }
        } catch (IOException e) {
            throw new IllegalStateException("writing CSV into memory failed", e);
        }
    }
}
