package org.scalewright.io;

import java.util.List;

/**
 * The lines of a sheet as read from a CSV file or a workbook, before their header is known: comment
 * lines with their text, and records of cells (a record may span several lines of a CSV file when a
 * quoted cell holds a line break; it carries the number of its first line).
 *
 * @param records   the comments and records in file order, blank lines left out
 * @param delimiter what separated the cells: {@code ,} {@code ;} or tab in a CSV file, 0 in a workbook
 *                  (whose numbers need no reading)
 * @param notes     how the file was read, in words, where that is worth telling (encoding, delimiter,
 *                  which sheet of a workbook)
 */
record SheetRecords(List<Record> records, char delimiter, List<String> notes) {

    /**
     * One comment line or one record.
     *
     * @param line    1-based number of the (first) line, or the row of a workbook
     * @param comment the comment's text without the {@code #} when this is a comment line, else null
     * @param cells   the cells of a record (not trimmed), empty for a comment
     */
    record Record(int line, String comment, List<String> cells) {
        static Record comment(int line, String text) {
            return new Record(line, text, List.of());
        }

        static Record cells(int line, List<String> cells) {
            return new Record(line, null, List.copyOf(cells));
        }

        boolean isComment() {
            return comment != null;
        }
    }

    SheetRecords {
        records = List.copyOf(records);
        notes = List.copyOf(notes);
    }

    /** @return the delimiter in words, for notes and messages */
    static String delimiterName(char d) {
        return switch (d) {
            case ',' -> "commas";
            case ';' -> "semicolons";
            case '\t' -> "tabs";
            default -> "cells";
        };
    }

    /**
     * The text of a comment given as cells (a CSV comment line split at its delimiter, or a
     * workbook row whose first cell begins with {@code #}): trailing empty cells are left out (a
     * spreadsheet pads every line to the table's width), a first cell that is only {@code #} is
     * the mark of a comment written as {@code #,"text"}, and the rest is joined again with commas (a
     * spreadsheet opening a sheet splits its comment lines at their commas, whatever delimiter it saves
     * them with later); read then as {@link CommentLines#textOf} reads a line.
     */
    static String commentText(List<String> cells) {
        int end = cells.size();
        while (end > 1 && cells.get(end - 1).isBlank()) {
            end--;
        }
        List<String> kept = cells.subList(0, end);
        String joiner = ",";
        if (kept.get(0).strip().equals("#") && kept.size() > 1) {
            return CommentLines.textOf("# " + String.join(joiner, kept.subList(1, kept.size())).strip());
        }
        return CommentLines.textOf(String.join(joiner, kept));
    }
}
