package org.scalewright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.scalewright.design.wirecheck.PitchState;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.KeyNames;
import org.scalewright.model.Scale;

/**
 * Reads how far flat a piano stands, per note: a CSV file with a {@code key} column (key number
 * or note name) and a {@code cents_flat} column (positive = flat, negative = sharp), an optional
 * free {@code remark} column, and {@code #} comment lines. Keys need not be complete: between
 * measured keys the figure is interpolated ({@link PitchState}).
 */
public final class PitchStateReader {
    /** The most cents flat or sharp a figure may be (an octave). */
    public static final double MAX_CENTS = 1200;

    private PitchStateReader() {
    }

    /**
     * @param file the CSV file
     * @return the measured state
     * @throws BadInputException listing every problem with line and column
     */
    public static PitchState read(Path file) throws BadInputException {
        return read(file, null);
    }

    /**
     * @param file  the CSV file
     * @param scale when given, every key must be a key of this scale
     * @return the measured state
     * @throws BadInputException listing every problem with line and column
     */
    public static PitchState read(Path file, Scale scale) throws BadInputException {
        CsvTable t = CsvTable.read(file, CsvTable.RowLimit.KEYS);
        List<SheetProblem> problems = new ArrayList<>();
        int keyCol = -1;
        int centsCol = -1;
        for (int i = 0; i < t.header().size(); i++) {
            String h = t.header().get(i);
            switch (h) {
                case "key" -> keyCol = duplicate(file, t, h, keyCol, i, problems);
                case "cents_flat" -> centsCol = duplicate(file, t, h, centsCol, i, problems);
                case "remark" -> {
                    // free text, not read
                }
                default -> problems.add(new SheetProblem(file, t.headerLine(), h,
                        "unknown column; expected key, cents_flat and optionally remark"));
            }
        }
        if (keyCol < 0) {
            problems.add(new SheetProblem(file, t.headerLine(), "", "no key column"));
        }
        if (centsCol < 0) {
            problems.add(new SheetProblem(file, t.headerLine(), "", "no cents_flat column"));
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        Map<Integer, Double> byKey = new TreeMap<>();
        Map<Integer, Integer> lineOf = new TreeMap<>();
        for (CsvTable.Row r : t.rows()) {
            if (r.cells().size() > t.header().size()) {
                problems.add(new SheetProblem(file, r.line(), "", "the row has more cells than the header"));
                continue;
            }
            String keyText = CsvTable.cell(r, keyCol);
            String centsText = CsvTable.cell(r, centsCol);
            Integer key = null;
            if (keyText.isEmpty()) {
                problems.add(new SheetProblem(file, r.line(), "key", "a key number or note name is required here"));
            } else {
                try {
                    key = KeyNames.parse(keyText);
                } catch (InvalidInput e) {
                    problems.add(new SheetProblem(file, r.line(), "key", e.getMessage()));
                }
            }
            Double cents = CsvTable.requiredNumber(file, r, centsCol, "cents_flat",
                    "a number of cents", problems);
            if (cents != null && Math.abs(cents) > MAX_CENTS) {
                problems.add(new SheetProblem(file, r.line(), "cents_flat", "must be between -1200 and 1200 "
                        + "cents, was " + centsText));
                cents = null;
            }
            if (key == null || cents == null) {
                continue;
            }
            if (scale != null && scale.note(key).isEmpty()) {
                problems.add(new SheetProblem(file, r.line(), "key", "key " + key + " is not in the scale"));
                continue;
            }
            Integer earlier = lineOf.putIfAbsent(key, r.line());
            if (earlier != null) {
                problems.add(new SheetProblem(file, r.line(), "key", "key " + key + " appears twice (first on line "
                        + earlier + ")"));
                continue;
            }
            byKey.put(key, cents);
        }
        if (problems.isEmpty() && byKey.isEmpty()) {
            problems.add(new SheetProblem(file, t.headerLine(), "", "no rows; expected one row per measured key"));
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        return PitchState.measured(byKey);
    }

    private static int duplicate(Path file, CsvTable t, String h, int earlier, int here, List<SheetProblem> problems) {
        if (earlier >= 0) {
            problems.add(new SheetProblem(file, t.headerLine(), h, "the column appears twice"));
        }
        return here;
    }

}
