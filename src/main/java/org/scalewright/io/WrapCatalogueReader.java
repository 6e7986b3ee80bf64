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

    /** Reads a catalogue bundled as a class-path resource; a broken bundled table is an internal error. */
    static WrapWires readResource(String resource) {
        return BundledTable.read(resource, WrapCatalogueReader::parse);
    }

    private static WrapWires parse(Path file, CsvTable t) throws BadInputException {
        List<SheetProblem> problems = new ArrayList<>();
        int mCol = -1;
        int dCol = -1;
        LengthUnit dUnit = null;
        for (int i = 0; i < t.header().size(); i++) {
            String h = t.header().get(i);
            switch (h) {
                case "metal" -> mCol = i;
                case "diameter_mm", "diameter_in" -> {
                    if (dCol >= 0) {
                        problems.add(new SheetProblem(file, t.headerLine(), h, "more than one diameter column"));
                    }
                    dCol = i;
                    dUnit = h.endsWith("_mm") ? LengthUnit.MM : LengthUnit.IN;
                }
                default -> problems.add(new SheetProblem(file, t.headerLine(), h,
                        "unknown column; expected metal, and diameter_mm or diameter_in"));
            }
        }
        if (mCol < 0) {
            problems.add(new SheetProblem(file, t.headerLine(), "", "no metal column (copper, iron or steel)"));
        }
        if (dCol < 0) {
            problems.add(new SheetProblem(file, t.headerLine(), "", "no diameter column (diameter_mm or diameter_in)"));
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        Map<WrapMetal, List<Double>> wires = new EnumMap<>(WrapMetal.class);
        Map<String, Integer> seen = new HashMap<>();
        for (CsvTable.Row r : t.rows()) {
            if (r.cells().size() > t.header().size()) {
                problems.add(new SheetProblem(file, r.line(), "", "the row has more cells than the header"));
                continue;
            }
            WrapMetal metal = WrapMetal.parse(CsvTable.cell(r, mCol));
            if (metal == null) {
                problems.add(new SheetProblem(file, r.line(), "metal", "must be copper, iron or steel, was '"
                        + CsvTable.cell(r, mCol) + "'"));
            }
            String dName = t.header().get(dCol);
            Double d = CsvTable.requiredNumber(file, r, dCol, dName, "a number", problems);
            if (d != null && !(d > 0)) {
                problems.add(new SheetProblem(file, r.line(), dName, "must be greater than 0, was "
                        + CsvTable.cell(r, dCol)));
                continue;
            }
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
        String name = t.comments().isEmpty() ? String.valueOf(file.getFileName()) : t.comments().get(0);
        try {
            return WrapWires.catalogue(wires, name);
        } catch (InvalidInput e) {
            throw new BadInputException(List.of(new SheetProblem(file, t.headerLine(), "", e.getMessage())));
        }
    }
}
