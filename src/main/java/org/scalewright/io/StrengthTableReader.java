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

    private static final TableColumns.Kind STRENGTH = new TableColumns.Kind("strength",
            "tensile_mpa", "tensile_ksi", "breaking_load_n", "breaking_load_lbf");

    /** Parses a read table; also the parser of the bundled ones ({@link BuiltInData}, {@link BundledTable}). */
    static StrengthTable parse(Path file, CsvTable t) throws BadInputException {
        TableColumns columns = TableColumns.find(file, t, TableColumns.DIAMETER, STRENGTH);
        LengthUnit dUnit = columns.unit(TableColumns.DIAMETER);
        String sKind = columns.name(STRENGTH);
        List<SheetProblem> problems = new ArrayList<>();
        TreeMap<Double, Double> rows = new TreeMap<>();
        TreeMap<Double, Integer> lines = new TreeMap<>();
        for (CsvTable.Row r : t.rows()) {
            if (!columns.fits(r, problems)) {
                continue;
            }
            Double d = columns.positive(r, TableColumns.DIAMETER, problems);
            Double s = columns.positive(r, STRENGTH, problems);
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
                problems.add(new SheetProblem(file, r.line(), columns.name(TableColumns.DIAMETER),
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
        return new StrengthTable(t.title(), t.comments(), ds, ss);
    }
}
