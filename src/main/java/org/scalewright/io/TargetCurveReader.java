package org.scalewright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;
import org.scalewright.design.rescale.TargetCurve;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.KeyNames;

/**
 * Reads a target curve for the rescaling tools from a CSV file: comment lines {@code #}, a
 * header with the columns {@code key} (key number or note name) and {@code tension_n}
 * (per-string tension wanted, N), one row per key in any order, keys unique. Between the
 * keys given, the target runs straight from one to the next.
 */
public final class TargetCurveReader {
    private static final String KEY = "key";
    private static final String TENSION = "tension_n";

    private TargetCurveReader() {
    }

    /**
     * @param file a CSV file or workbook, read as a scale sheet is (DESIGN §4)
     * @return the curve from the lowest key given to the highest, N
     * @throws BadInputException listing every problem with line and column
     */
    public static TargetCurve read(Path file) throws BadInputException {
        CsvTable t = CsvTable.read(file, CsvTable.RowLimit.KEYS);
        List<SheetProblem> problems = new ArrayList<>();
        int keyCol = t.header().indexOf(KEY);
        int tCol = t.header().indexOf(TENSION);
        for (String h : t.header()) {
            if (!h.equals(KEY) && !h.equals(TENSION)) {
                problems.add(new SheetProblem(file, t.headerLine(), h.isEmpty() ? "(blank)" : h,
                        "unknown column; a target file has the columns key and tension_n"));
            }
        }
        if (keyCol < 0) {
            problems.add(new SheetProblem(file, t.headerLine(), "", "required column key is missing"));
        }
        if (tCol < 0) {
            problems.add(new SheetProblem(file, t.headerLine(), "", "required column tension_n is missing"));
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        TreeMap<Integer, Double> values = new TreeMap<>();
        TreeMap<Integer, Integer> lines = new TreeMap<>();
        for (CsvTable.Row r : t.rows()) {
            if (r.cells().size() > t.header().size()) {
                problems.add(new SheetProblem(file, r.line(), "", "the row has " + r.cells().size()
                        + " cells but the header has " + t.header().size() + " columns"));
                continue;
            }
            Integer key = key(file, r, keyCol, problems);
            Double tension = tension(file, r, tCol, problems);
            if (key == null || tension == null) {
                continue;
            }
            Integer earlier = lines.putIfAbsent(key, r.line());
            if (earlier != null) {
                problems.add(new SheetProblem(file, r.line(), KEY, "key " + key + " appears twice (first on line "
                        + earlier + ")"));
                continue;
            }
            values.put(key, tension);
        }
        if (problems.isEmpty() && values.isEmpty()) {
            problems.add(new SheetProblem(file, t.headerLine(), "", "the file has a header but no target values"));
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        int[] keys = values.keySet().stream().mapToInt(Integer::intValue).toArray();
        double[] v = values.values().stream().mapToDouble(Double::doubleValue).toArray();
        return TargetCurve.throughPoints(keys, v, "target from " + file.getFileName());
    }

    private static Integer key(Path file, CsvTable.Row r, int col, List<SheetProblem> problems) {
        String text = CsvTable.cell(r, col);
        if (text.isEmpty()) {
            problems.add(new SheetProblem(file, r.line(), KEY, "a value is required here (a key number or note name)"));
            return null;
        }
        try {
            return KeyNames.parse(text);
        } catch (InvalidInput e) {
            problems.add(new SheetProblem(file, r.line(), KEY, e.getMessage()));
            return null;
        }
    }

    private static Double tension(Path file, CsvTable.Row r, int col, List<SheetProblem> problems) {
        Double v = CsvTable.requiredNumber(file, r, col, TENSION, "a tension in N", problems);
        if (v != null && !(v > 0)) {
            problems.add(new SheetProblem(file, r.line(), TENSION, "must be greater than 0 N, was "
                    + CsvTable.cell(r, col)));
            return null;
        }
        return v;
    }
}
