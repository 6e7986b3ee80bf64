package org.scalewright.io;

import java.util.List;

/**
 * A table ready to be written as CSV by {@link CsvReportWriter}: comment lines,
 * the header and the rows as text cells.
 *
 * @param comments lines written first as {@code # } comments
 * @param header   column names
 * @param rows     the rows, each as many cells as the header
 */
public record CsvSheet(List<String> comments, List<String> header, List<List<String>> rows) {

    public CsvSheet {
        comments = List.copyOf(comments);
        header = List.copyOf(header);
        rows = rows.stream().map(List::copyOf).toList();
        for (List<String> r : rows) {
            if (r.size() != header.size()) {
                throw new IllegalArgumentException("row has " + r.size() + " cells, header " + header.size());
            }
        }
    }

    /** @return the CSV file's bytes in {@code dialect}, spreadsheet-safe */
    public byte[] toBytes(CsvDialect dialect) {
        return CsvReportWriter.toBytes(comments, header, rows, dialect);
    }

    /** @return the CSV text, spreadsheet-safe */
    public String toText() {
        return CsvReportWriter.toText(comments, header, rows);
    }
}
