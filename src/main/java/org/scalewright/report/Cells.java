package org.scalewright.report;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.scalewright.model.NumberText;
import org.scalewright.model.UnitConversions;

/** The report tables' cells in their units; the digits come from {@link NumberText}. */
final class Cells {
    private Cells() {
    }

    /** @return a size number as written on a sheet: 14, 14.5 */
    static String size(double s) {
        return NumberText.plain(s);
    }

    /** @return the size number, or "" */
    static String size(OptionalDouble s) {
        return s.isPresent() ? size(s.getAsDouble()) : "";
    }

    /** @return a length in mm with {@code decimals} places, from metres */
    static String mm(double metres, int decimals) {
        return NumberText.rounded(metres * 1e3, decimals);
    }

    /** @return a length in inches with {@code decimals} places, from metres */
    static String in(double metres, int decimals) {
        return NumberText.rounded(metres / UnitConversions.METRES_PER_INCH, decimals);
    }

    /** @return the optional length in mm, or "" */
    static String mm(OptionalDouble metres, int decimals) {
        return metres.isPresent() ? mm(metres.getAsDouble(), decimals) : "";
    }

    /** @return the optional length in inches, or "" */
    static String in(OptionalDouble metres, int decimals) {
        return metres.isPresent() ? in(metres.getAsDouble(), decimals) : "";
    }

    /** @return the header names of a length column: {@code name_mm}, or {@code name_in, name_mm} */
    static List<String> lengthHeader(String name, ReportUnits units) {
        return units == ReportUnits.IMPERIAL ? List.of(name + "_in", name + "_mm") : List.of(name + "_mm");
    }

    /** @return the header names of length columns, each as {@link #lengthHeader} */
    static List<String> lengthHeaders(ReportUnits units, String... names) {
        List<String> out = new ArrayList<>();
        for (String n : names) {
            out.addAll(lengthHeader(n, units));
        }
        return out;
    }

    /** Adds a diameter's cells to a row: mm to 0.001, for imperial units inches to 0.0001 before it; blank when empty. */
    static void diameter(List<String> row, OptionalDouble metres, boolean imperial) {
        if (imperial) {
            row.add(in(metres, 4));
        }
        row.add(mm(metres, 3));
    }

    /** Adds a length's cells to a row: mm to 0.1, for imperial units inches to 0.01 before it; blank when empty. */
    static void length(List<String> row, OptionalDouble metres, boolean imperial) {
        if (imperial) {
            row.add(in(metres, 2));
        }
        row.add(mm(metres, 1));
    }
}
