package org.scalewright.io;

import com.opencsv.CSVParser;
import com.opencsv.CSVParserBuilder;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Splits the text of a CSV file into comment lines and records (OpenCSV's parser): the delimiter,
 * {@code ,} {@code ;} or tab, is the one the header line holds outside quotes; a quoted cell may span
 * lines; a line whose first non-blank character is {@code #}, or whose quoted first cell begins with
 * one, outside a quoted cell, is a comment, its trailing empty cells left out.
 */
final class CsvRecords {
    private static final String DELIMITERS = ",;\t";

    private CsvRecords() {
    }

    /**
     * @param file names the file in messages
     * @param text the whole text
     * @param note how the text was decoded ("" for plain UTF-8)
     */
    static SheetRecords split(Path file, String text, String note) throws BadInputException {
        List<String> lines = text.lines().toList();
        char delimiter = delimiter(file, lines);
        CSVParser parser = parser(delimiter);
        List<SheetRecords.Record> records = new ArrayList<>();
        int first = 0;
        List<String> cells = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            String line = lines.get(i);
            boolean pending = parser.isPending();
            if (!pending && line.isBlank()) {
                continue;
            }
            if (!pending && isComment(line)) {
                records.add(SheetRecords.Record.comment(i + 1, commentOf(line, delimiter)));
                continue;
            }
            if (!pending) {
                first = i + 1;
                cells = new ArrayList<>();
            }
            try {
                cells.addAll(Arrays.asList(parser.parseLineMulti(line)));
            } catch (IOException e) {
                throw new BadInputException(List.of(new SheetProblem(file, first, "",
                        "cannot be split into cells: " + e.getMessage())));
            }
            if (parser.isPending()) {
                continue;
            }
            records.add(SheetRecords.Record.cells(first, cells));
        }
        if (parser.isPending()) {
            throw unclosed(file, first);
        }
        List<String> notes = new ArrayList<>();
        if (!note.isEmpty()) {
            notes.add(note);
        }
        if (delimiter != ',') {
            notes.add("cells separated by " + SheetRecords.delimiterName(delimiter) + " (found in the header line)"
                    + ", so a comma in a number is its decimal mark");
        }
        return new SheetRecords(records, delimiter, notes);
    }

    private static BadInputException unclosed(Path file, int line) {
        return new BadInputException(List.of(new SheetProblem(file, line, "", "a quoted cell that begins on this "
                + "line is not closed (a \" is missing)")));
    }

    private static CSVParser parser(char delimiter) {
        return new CSVParserBuilder().withSeparator(delimiter).withIgnoreLeadingWhiteSpace(false).build();
    }

    /**
     * A comment line: its first non-blank character is {@code #}, or its first cell is quoted and
     * begins with {@code #} (as a spreadsheet writes a comment it split at a comma:
     * {@code "# title: Grand"," 1907",,,}).
     */
    private static boolean isComment(String line) {
        String s = line.strip();
        return s.startsWith("#") || s.startsWith("\"#");
    }

    /**
     * A comment line's text. A comment whose cells a spreadsheet quoted ({@code "# title: Grand"," 1907",,})
     * or that was written as one quoted cell after the mark ({@code #,"text"}, {@code #;"text"}) is split
     * as CSV; any other is taken as it stands, without the empty cells a spreadsheet padded it with, so
     * that quotes typed in it stay as typed.
     */
    private static String commentOf(String line, char delimiter) {
        String s = line.strip();
        if (s.startsWith("\"") || s.startsWith("#" + delimiter + "\"")) {
            CSVParser parser = parser(delimiter);
            try {
                String[] cells = parser.parseLine(s);
                if (!parser.isPending()) {
                    return SheetRecords.commentText(Arrays.asList(cells));
                }
            } catch (IOException e) {
                // taken as it stands below
            }
        }
        int end = s.length();
        while (end > 1 && (s.charAt(end - 1) == delimiter || Character.isWhitespace(s.charAt(end - 1)))) {
            end--;
        }
        return CommentLines.textOf(s.substring(0, end));
    }

    /**
     * @return the delimiter of the header line, the first line that is neither blank nor a comment;
     *         a comma when it holds none (a one-column file)
     */
    static char delimiter(Path file, List<String> lines) throws BadInputException {
        for (int i = 0; i < lines.size(); i++) {
            String line = lines.get(i);
            if (line.isBlank() || isComment(line)) {
                continue;
            }
            int[] counts = new int[DELIMITERS.length()];
            boolean quoted = false;
            for (int k = 0; k < line.length(); k++) {
                char c = line.charAt(k);
                if (c == '"') {
                    quoted = !quoted;
                } else if (!quoted && DELIMITERS.indexOf(c) >= 0) {
                    counts[DELIMITERS.indexOf(c)]++;
                }
            }
            List<Character> found = new ArrayList<>();
            for (int k = 0; k < counts.length; k++) {
                if (counts[k] > 0) {
                    found.add(DELIMITERS.charAt(k));
                }
            }
            if (found.size() > 1) {
                throw new BadInputException(List.of(new SheetProblem(file, i + 1, "", "the header line holds "
                        + String.join(" and ", found.stream().map(SheetRecords::delimiterName).toList())
                        + " outside quotes, so which of them separates the cells cannot be told; "
                        + "column names are separated by one of them only")));
            }
            return found.isEmpty() ? ',' : found.get(0);
        }
        return ',';
    }
}
