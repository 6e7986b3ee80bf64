package org.scalewright.report;

import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.scalewright.io.CsvCells;
import org.scalewright.model.Wrap;

/** Shared cell formatting of the report tables. */
final class Cells {
    private Cells() {
    }

    /** @return a size number as written on a sheet: 14, 14.5 */
    static String size(double s) {
        return s == Math.rint(s) ? Long.toString((long) s) : CsvCells.number(s);
    }

    /** @return the size number, or "" */
    static String size(OptionalDouble s) {
        return s.isPresent() ? size(s.getAsDouble()) : "";
    }

    /** @return a length in mm with {@code decimals} places, from metres */
    static String mm(double metres, int decimals) {
        return CsvCells.fixed(metres * 1e3, decimals);
    }

    /** @return a length in inches with {@code decimals} places, from metres */
    static String in(double metres, int decimals) {
        return CsvCells.fixed(metres / org.scalewright.model.UnitConversions.METRES_PER_INCH, decimals);
    }

    /** @return the optional length in mm, or "" */
    static String mm(OptionalDouble metres, int decimals) {
        return metres.isPresent() ? mm(metres.getAsDouble(), decimals) : "";
    }

    /** @return the optional length in inches, or "" */
    static String in(OptionalDouble metres, int decimals) {
        return metres.isPresent() ? in(metres.getAsDouble(), decimals) : "";
    }

    /** @return fixed decimals with trailing zeros kept (for aligned display) */
    static String f(double v, int decimals) {
        if (!Double.isFinite(v)) {
            return "";
        }
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }

    /**
     * @return the wire as a rebuilder writes it: plain {@code #16} (size) or {@code 1.100 mm};
     *         wound {@code 1.60 / 1.25 + 1.08 Cu} (core / wraps, mm)
     */
    static String wireSpec(OptionalDouble size, double core, Wrap wrap) {
        String c = size.isPresent() ? "#" + size(size.getAsDouble()) : f(core * 1e3, 3) + " mm";
        if (wrap == null) {
            return c;
        }
        String s = (size.isPresent() ? c : f(core * 1e3, 2)) + " / " + f(wrap.inner() * 1e3, 2);
        if (wrap.isDouble()) {
            s += " + " + f(wrap.outer() * 1e3, 2);
        }
        return s + " " + metalShort(wrap.metal());
    }

    static String metalShort(org.scalewright.model.WrapMetal m) {
        return switch (m) {
            case COPPER -> "Cu";
            case IRON -> "Fe";
            case STEEL -> "steel";
        };
    }

    /** @return the header names of a length column: {@code name_mm}, or {@code name_in, name_mm} */
    static List<String> lengthHeader(String name, ReportUnits units) {
        return units == ReportUnits.IMPERIAL ? List.of(name + "_in", name + "_mm") : List.of(name + "_mm");
    }
}
