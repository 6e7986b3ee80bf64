package org.scalewright.report;

import java.util.List;
import java.util.Set;

/**
 * A table to lay out in the PDF: columns, rows of text cells, and which rows are totals.
 *
 * @param columns   the columns
 * @param rows      the rows, each as many cells as there are columns
 * @param totalRows indices of rows to draw in bold with a rule above (totals)
 */
record PdfTable(List<Column> columns, List<List<String>> rows, Set<Integer> totalRows) {

    /**
     * @param header heading (wrapped onto several lines where the column is narrow)
     * @param right  true to right-align (numbers)
     * @param wrap   true for a column of long text that takes the remaining width and wraps
     */
    record Column(String header, boolean right, boolean wrap) {
        static Column text(String header) {
            return new Column(header, false, false);
        }

        static Column number(String header) {
            return new Column(header, true, false);
        }

        static Column wrapping(String header) {
            return new Column(header, false, true);
        }
    }

    PdfTable {
        columns = List.copyOf(columns);
        rows = rows.stream().map(List::copyOf).toList();
        totalRows = Set.copyOf(totalRows);
        for (List<String> r : rows) {
            if (r.size() != columns.size()) {
                throw new IllegalArgumentException("table row has " + r.size() + " cells, columns " + columns.size());
            }
        }
    }

    PdfTable(List<Column> columns, List<List<String>> rows) {
        this(columns, rows, Set.of());
    }
}
