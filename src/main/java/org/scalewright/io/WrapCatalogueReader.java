package org.scalewright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.scalewright.design.rescale.WrapWires;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.WrapMetal;

/**
 * Reads a wrap-wire catalogue: comment lines naming whose list it is (the first names it), a
 * {@code metal} column ({@code copper}, {@code iron} or {@code steel}) and one diameter column
 * ({@code diameter_mm} or {@code diameter_in}), one row per wire. The conventions of a strength
 * table ({@link StrengthTableReader}): every problem listed with line and column.
 */
public final class WrapCatalogueReader {
    private WrapCatalogueReader() {
    }

    /**
     * @param file a wrap-wire catalogue, read as a scale sheet is (DESIGN §4)
     * @return the wire by metal
     * @throws BadInputException listing every problem with line and column
     */
    public static WrapWires read(Path file) throws BadInputException {
        return parse(file, CsvTable.read(file, CsvTable.RowLimit.TABLE));
    }

    private static final TableColumns.Kind METAL = new TableColumns.Kind("metal", List.of("metal"),
            "copper, iron or steel");

    /** Parses a read table; also the parser of the bundled ones ({@link BuiltInData}, {@link BundledTable}). */
    static WrapWires parse(Path file, CsvTable t) throws BadInputException {
        TableColumns columns = TableColumns.find(file, t, METAL, TableColumns.DIAMETER);
        LengthUnit dUnit = columns.unit(TableColumns.DIAMETER);
        String dName = columns.name(TableColumns.DIAMETER);
        List<SheetProblem> problems = new ArrayList<>();
        Map<WrapMetal, List<Double>> wires = new EnumMap<>(WrapMetal.class);
        Map<String, Integer> seen = new HashMap<>();
        for (CsvTable.Row r : t.rows()) {
            if (!columns.fits(r, problems)) {
                continue;
            }
            WrapMetal metal = WrapMetal.parse(columns.cell(r, METAL));
            if (metal == null) {
                problems.add(new SheetProblem(file, r.line(), "metal", "must be copper, iron or steel, was '"
                        + columns.cell(r, METAL) + "'"));
            }
            Double d = columns.positive(r, TableColumns.DIAMETER, problems);
            if (metal == null || d == null) {
                continue;
            }
            double m = dUnit.toMetres(d);
            String key = metal + "/" + Math.round(m * 1e9);
            Integer earlier = seen.putIfAbsent(key, r.line());
            if (earlier != null) {
                problems.add(new SheetProblem(file, r.line(), dName, metal.sheetName() + " " + d
                        + " appears twice (first on line " + earlier + ")"));
                continue;
            }
            wires.computeIfAbsent(metal, x -> new ArrayList<>()).add(m);
        }
        if (problems.isEmpty() && wires.isEmpty()) {
            problems.add(new SheetProblem(file, t.headerLine(), "", "a wrap-wire catalogue needs at least one row"));
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        try {
            return WrapWires.catalogue(wires, t.title());
        } catch (InvalidInput e) {
            throw new BadInputException(List.of(new SheetProblem(file, t.headerLine(), "", e.getMessage())));
        }
    }
}
