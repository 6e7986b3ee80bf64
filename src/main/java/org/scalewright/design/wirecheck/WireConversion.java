package org.scalewright.design.wirecheck;

import java.util.List;
import java.util.Locale;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Note;
import org.scalewright.model.WireSize;
import org.scalewright.model.WireSizeTable;

/**
 * Converts plain wire to the other size system: inch sizes to the nearest, next larger or next
 * smaller metric diameter, or metric diameters to music-wire sizes. A diameter that the target
 * list already holds is kept. Wound strings keep their core (the conversion applies to plain
 * wire only).
 *
 * @param system          the size system to convert to ({@link SizeSystem#KEEP}: no conversion)
 * @param rounding        which neighbour to take
 * @param metricDiameters metric plain-wire diameters offered, m (used for {@link SizeSystem#METRIC})
 * @param inchSizes       music-wire sizes offered (used for {@link SizeSystem#INCH})
 */
public record WireConversion(SizeSystem system, SizeRounding rounding, List<Double> metricDiameters,
                             WireSizeTable inchSizes) {

    public WireConversion {
        if (system == null) {
            system = SizeSystem.KEEP;
        }
        if (rounding == null) {
            rounding = SizeRounding.NEAREST;
        }
        metricDiameters = metricDiameters == null ? List.of() : List.copyOf(metricDiameters.stream().sorted().toList());
        if (system == SizeSystem.METRIC && metricDiameters.isEmpty()) {
            throw new IllegalArgumentException("converting to metric needs a list of metric diameters");
        }
        if (system == SizeSystem.INCH && inchSizes == null) {
            throw new IllegalArgumentException("converting to inch sizes needs a table of music-wire sizes");
        }
    }

    /** @return no conversion: every wire is kept */
    public static WireConversion keep() {
        return new WireConversion(SizeSystem.KEEP, SizeRounding.NEAREST, List.of(), null);
    }

    /** @return conversion to the given metric diameters (m) */
    public static WireConversion toMetric(SizeRounding rounding, List<Double> metricDiameters) {
        return new WireConversion(SizeSystem.METRIC, rounding, metricDiameters, null);
    }

    /** @return conversion to the given music-wire sizes */
    public static WireConversion toInch(SizeRounding rounding, WireSizeTable sizes) {
        return new WireConversion(SizeSystem.INCH, rounding, List.of(), sizes);
    }

    /** @return the conversion in words, e.g. {@code plain wire to metric, next larger} */
    public String describe() {
        if (system == SizeSystem.KEEP) {
            return "wire kept as it is";
        }
        String side = switch (rounding) {
            case NEAREST -> "nearest";
            case UP -> "next larger (or same)";
            case DOWN -> "next smaller (or same)";
        };
        return "plain wire to " + (system == SizeSystem.METRIC ? "metric diameters" : "music-wire sizes") + ", "
                + side;
    }

    /**
     * @param note a note of the scale
     * @return what the conversion does to its wire (wound strings and {@link SizeSystem#KEEP}: unchanged)
     */
    public WireChange convert(Note note) {
        CoreWire w = note.wire();
        if (system == SizeSystem.KEEP) {
            return new WireChange(w, w, "");
        }
        if (note.isWound()) {
            return new WireChange(w, w, "wound: core kept");
        }
        double d = w.diameter();
        if (system == SizeSystem.METRIC) {
            double[] offered = metricDiameters.stream().mapToDouble(Double::doubleValue).toArray();
            NeighbourPick p = NeighbourPick.of(d, offered, rounding);
            double to = offered[p.index()];
            return new WireChange(w, CoreWire.ofDiameter(to), remark(p, d, to, "metric diameter"));
        }
        List<WireSize> sizes = inchSizes.sizes();
        double[] offered = sizes.stream().mapToDouble(WireSize::diameter).toArray();
        NeighbourPick p = NeighbourPick.of(d, offered, rounding);
        WireSize s = sizes.get(p.index());
        return new WireChange(w, CoreWire.ofSize(s.size(), s.diameter()), remark(p, d, s.diameter(), "music-wire size"));
    }

    private String remark(NeighbourPick p, double from, double to, String what) {
        if (p.exact()) {
            return "already a " + what;
        }
        if (p.fellBack()) {
            return String.format(Locale.ROOT, "no %s %s %.3f mm; took %.3f mm", what,
                    rounding == SizeRounding.UP ? "at or above" : "at or below", from * 1e3, to * 1e3);
        }
        return "";
    }
}
