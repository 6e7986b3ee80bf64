package org.scalewright.io;

import java.nio.file.Path;

/**
 * One problem found in an input file.
 *
 * @param file    the file
 * @param line    1-based line number (in a workbook its row number), 0 when the problem concerns the whole file
 * @param column  the column's header name, or "" when none applies
 * @param message what is wrong and what was expected, in plain words
 */
public record SheetProblem(Path file, int line, String column, String message) {

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder(String.valueOf(file.getFileName()));
        if (line > 0) {
            b.append(TableFiles.isWorkbook(file) ? ", row " : ", line ").append(line);
        }
        if (!column.isEmpty()) {
            b.append(", column ").append(column);
        }
        return b.append(": ").append(message).toString();
    }
}
