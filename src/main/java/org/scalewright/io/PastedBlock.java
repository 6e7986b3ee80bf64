package org.scalewright.io;

import com.opencsv.CSVParser;
import com.opencsv.CSVParserBuilder;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.IntPredicate;

/**
 * A block of cells as a spreadsheet puts it on the clipboard: rows on lines, cells separated by tabs, a
 * cell holding a tab, a quote or a line break quoted. Its numbers are read as a tab-separated file's are
 * ({@link DecimalReading}): a decimal comma is taken, and a number whose reading depends on the locale
 * is refused with its row and column.
 */
public final class PastedBlock {
    /** Names the clipboard in messages. */
    public static final Path CLIPBOARD = Path.of("clipboard");

    private PastedBlock() {
    }

    /**
     * @param text       the clipboard's text
     * @param textColumn true for the block's column positions (from 0) that take words, not numbers
     * @return the rows of cells, trimmed, every number a plain decimal with a point; a problem's line is
     *         the block's row (from 1) and its column the block's column (from 1)
     * @throws BadInputException naming each cell that cannot be read
     */
    public static List<List<String>> read(String text, IntPredicate textColumn) throws BadInputException {
        List<String> lines = new ArrayList<>(text.lines().toList());
        while (!lines.isEmpty() && lines.get(lines.size() - 1).isEmpty()) {
            lines.remove(lines.size() - 1);
        }
        CSVParser parser = new CSVParserBuilder().withSeparator('\t').build();
        List<CsvTable.Row> rows = new ArrayList<>();
        List<String> cells = new ArrayList<>();
        for (String line : lines) {
            if (rows.size() > InputLimits.MAX_KEY_ROWS) {
                throw BadInputException.of(CLIPBOARD, "holds more than " + InputLimits.MAX_KEY_ROWS + " rows");
            }
            try {
                cells.addAll(Arrays.asList(parser.parseLineMulti(line)));
            } catch (IOException e) {
                throw BadInputException.of(CLIPBOARD, "cannot be split into cells: " + e.getMessage());
            }
            if (!parser.isPending()) {
                if (cells.size() > CsvTable.MAX_CELLS) {
                    throw BadInputException.of(CLIPBOARD, "a row holds more than " + CsvTable.MAX_CELLS + " cells");
                }
                rows.add(new CsvTable.Row(rows.size() + 1, cells.stream().map(String::strip).toList()));
                cells = new ArrayList<>();
            }
        }
        if (parser.isPending()) {
            throw BadInputException.of(CLIPBOARD, "a quoted cell is not closed (a \" is missing)");
        }
        int width = rows.stream().mapToInt(r -> r.cells().size()).max().orElse(0);
        List<String> names = new ArrayList<>();
        for (int c = 0; c < width; c++) {
            names.add(Integer.toString(c + 1));
        }
        DecimalReading reading = DecimalReading.of(CLIPBOARD, '\t', names, rows, textColumn);
        List<SheetProblem> problems = new ArrayList<>();
        List<List<String>> out = new ArrayList<>();
        for (CsvTable.Row r : rows) {
            List<String> plain = new ArrayList<>(r.cells());
            for (int c = 0; c < plain.size(); c++) {
                if (!textColumn.test(c)) {
                    String p = reading.plain(plain.get(c), r.line(), names.get(c), problems);
                    plain.set(c, p == null ? plain.get(c) : p);
                }
            }
            while (plain.size() < width) {
                plain.add("");
            }
            out.add(List.copyOf(plain));
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        return List.copyOf(out);
    }
}
