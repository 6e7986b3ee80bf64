package org.scalewright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.UnitConversions;
import org.scalewright.physics.StrengthTable;
import org.scalewright.physics.StringPhysics;

/**
 * Reads a wire maker's strength table (DESIGN §4): comment lines naming whose data it is, one
 * diameter column ({@code diameter_mm} or {@code diameter_in}) and one strength column
 * ({@code tensile_mpa}, {@code tensile_ksi}, {@code breaking_load_n} or {@code breaking_load_lbf}).
 */
public final class StrengthTableReader {
    private StrengthTableReader() {
    }

    /**
     * @param file a strength table, read as a scale sheet is (DESIGN §4)
     * @return the table, named after its first comment line (or the file name)
     * @throws BadInputException listing every problem with line and column
     */
    public static StrengthTable read(Path file) throws BadInputException {
        return parse(file, CsvTable.read(file, CsvTable.RowLimit.TABLE));
    }

    /** Reads a table bundled as a class-path resource; a broken bundled table is an internal error. */
    static StrengthTable readResource(String resource) {
        return BundledTable.read(resource, StrengthTableReader::parse);
    }

    private static StrengthTable parse(Path file, CsvTable t) throws BadInputException {
        List<SheetProblem> problems = new ArrayList<>();
        int dCol = -1;
        LengthUnit dUnit = null;
        int sCol = -1;
        String sKind = null;
        for (int i = 0; i < t.header().size(); i++) {
            String h = t.header().get(i);
            switch (h) {
                case "diameter_mm", "diameter_in" -> {
                    if (dCol >= 0) {
                        problems.add(new SheetProblem(file, t.headerLine(), h, "more than one diameter column"));
                    }
                    dCol = i;
                    dUnit = h.endsWith("_mm") ? LengthUnit.MM : LengthUnit.IN;
                }
                case "tensile_mpa", "tensile_ksi", "breaking_load_n", "breaking_load_lbf" -> {
                    if (sCol >= 0) {
                        problems.add(new SheetProblem(file, t.headerLine(), h, "more than one strength column"));
                    }
                    sCol = i;
                    sKind = h;
                }
                default -> problems.add(new SheetProblem(file, t.headerLine(), h, "unknown column; expected "
                        + "diameter_mm or diameter_in, and tensile_mpa, tensile_ksi, breaking_load_n or "
                        + "breaking_load_lbf"));
            }
        }
        if (dCol < 0) {
            problems.add(new SheetProblem(file, t.headerLine(), "", "no diameter column (diameter_mm or diameter_in)"));
        }
        if (sCol < 0) {
            problems.add(new SheetProblem(file, t.headerLine(), "",
                    "no strength column (tensile_mpa, tensile_ksi, breaking_load_n or breaking_load_lbf)"));
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        TreeMap<Double, Double> rows = new TreeMap<>();
        TreeMap<Double, Integer> lines = new TreeMap<>();
        for (CsvTable.Row r : t.rows()) {
            if (r.cells().size() > t.header().size()) {
                problems.add(new SheetProblem(file, r.line(), "", "the row has more cells than the header"));
                continue;
            }
            Double d = positive(file, r, dCol, t.header().get(dCol), problems);
            Double s = positive(file, r, sCol, sKind, problems);
            if (d == null || s == null) {
                continue;
            }
            double dm = dUnit.toMetres(d);
            double pa = switch (sKind) {
                case "tensile_mpa" -> s * 1e6;
                case "tensile_ksi" -> s * UnitConversions.PASCALS_PER_KSI;
                case "breaking_load_n" -> s / StringPhysics.area(dm);
                default -> UnitConversions.lbfToNewtons(s) / StringPhysics.area(dm);
            };
            Integer earlier = lines.putIfAbsent(dm, r.line());
            if (earlier != null) {
                problems.add(new SheetProblem(file, r.line(), t.header().get(dCol),
                        "diameter " + d + " appears twice (first on line " + earlier + ")"));
                continue;
            }
            rows.put(dm, pa);
        }
        if (problems.isEmpty() && rows.size() < 2) {
            problems.add(new SheetProblem(file, t.headerLine(), "", "a strength table needs at least two rows"));
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        double[] ds = rows.keySet().stream().mapToDouble(Double::doubleValue).toArray();
        double[] ss = rows.values().stream().mapToDouble(Double::doubleValue).toArray();
        String name = t.comments().isEmpty() ? String.valueOf(file.getFileName()) : t.comments().get(0);
        return new StrengthTable(name, t.comments(), ds, ss);
    }

    private static Double positive(Path file, CsvTable.Row r, int col, String name, List<SheetProblem> problems) {
        Double v = CsvTable.requiredNumber(file, r, col, name, "a number", problems);
        if (v != null && !(v > 0)) {
            problems.add(new SheetProblem(file, r.line(), name, "must be greater than 0, was " + CsvTable.cell(r, col)));
            return null;
        }
        return v;
    }
}
