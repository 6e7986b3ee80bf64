package org.scalewright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.scalewright.model.Alternatives;
import org.scalewright.model.LengthUnit;

/**
 * The header of a small data table (a strength table, a wrap-wire catalogue): each column is one
 * of a few kinds, and each kind appears exactly once. Finding the columns tells every problem of the
 * header at once: a column of no kind, a kind twice, a kind missing.
 */
final class TableColumns {
    /**
     * A kind of column.
     *
     * @param what    what it holds, for messages ({@code diameter})
     * @param names   the header names it may have
     * @param missing what the message of a missing column suggests in brackets
     */
    record Kind(String what, List<String> names, String missing) {
        /** A kind whose missing message suggests its names. */
        Kind(String what, String... names) {
            this(what, List.of(names), Alternatives.of(List.of(names)));
        }
    }

    /** A length column: {@code diameter_mm} or {@code diameter_in}. */
    static final Kind DIAMETER = new Kind("diameter", "diameter_mm", "diameter_in");

    private final Path file;
    private final CsvTable table;
    private final Map<Kind, Integer> positions;

    private TableColumns(Path file, CsvTable table, Map<Kind, Integer> positions) {
        this.file = file;
        this.table = table;
        this.positions = positions;
    }

    /**
     * @param kinds the kinds of column the table holds, each exactly once, in the order problems are told
     * @throws BadInputException listing every problem of the header
     */
    static TableColumns find(Path file, CsvTable t, Kind... kinds) throws BadInputException {
        List<SheetProblem> problems = new ArrayList<>();
        Map<Kind, Integer> positions = new LinkedHashMap<>();
        for (int i = 0; i < t.header().size(); i++) {
            String h = t.header().get(i);
            Kind kind = null;
            for (Kind k : kinds) {
                if (k.names().contains(h)) {
                    kind = k;
                }
            }
            if (kind == null) {
                List<String> expected = new ArrayList<>();
                for (Kind k : kinds) {
                    expected.add(Alternatives.of(k.names()));
                }
                problems.add(new SheetProblem(file, t.headerLine(), h,
                        "unknown column; expected " + String.join(", and ", expected)));
            } else if (positions.putIfAbsent(kind, i) != null) {
                problems.add(new SheetProblem(file, t.headerLine(), h, "more than one " + kind.what() + " column"));
                positions.put(kind, i);
            }
        }
        for (Kind k : kinds) {
            if (!positions.containsKey(k)) {
                problems.add(new SheetProblem(file, t.headerLine(), "",
                        "no " + k.what() + " column (" + k.missing() + ")"));
            }
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        return new TableColumns(file, t, positions);
    }

    /** @return the header name the table gives {@code kind} */
    String name(Kind kind) {
        return table.header().get(positions.get(kind));
    }

    /** @return the unit of a length column, from its name's ending */
    LengthUnit unit(Kind kind) {
        return name(kind).endsWith("_mm") ? LengthUnit.MM : LengthUnit.IN;
    }

    /** @return the text of the row's cell of {@code kind}, as {@link CsvTable#cell} */
    String cell(CsvTable.Row row, Kind kind) {
        return CsvTable.cell(row, positions.get(kind));
    }

    /** @return false, telling the problem, when the row has more cells than the header */
    boolean fits(CsvTable.Row row, List<SheetProblem> problems) {
        if (row.cells().size() > table.header().size()) {
            problems.add(new SheetProblem(file, row.line(), "", "the row has more cells than the header"));
            return false;
        }
        return true;
    }

    /** @return the row's number of {@code kind}, or null after telling why it is missing or not above 0 */
    Double positive(CsvTable.Row row, Kind kind, List<SheetProblem> problems) {
        int col = positions.get(kind);
        String name = name(kind);
        Double v = CsvTable.requiredNumber(file, row, col, name, "a number", problems);
        if (v != null && !(v > 0)) {
            problems.add(new SheetProblem(file, row.line(), name, "must be greater than 0, was " + CsvTable.cell(row, col)));
            return null;
        }
        return v;
    }
}
