package org.scalewright.model;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * The music-wire size numbers a scale sheet may name, with their diameters, thinnest first.
 *
 * @param sizes the sizes, thinnest first
 */
public record WireSizeTable(List<WireSize> sizes) {

    public WireSizeTable {
        if (sizes.isEmpty()) {
            throw new IllegalArgumentException("a wire size table needs at least one size");
        }
        List<WireSize> sorted = new ArrayList<>(sizes);
        sorted.sort(Comparator.comparingDouble(WireSize::diameter));
        sizes = List.copyOf(sorted);
    }

    /** @return the diameter of a size number, m, or empty when the table has no such size */
    public Optional<WireSize> bySize(double size) {
        for (WireSize s : sizes) {
            if (Math.abs(s.size() - size) < 1e-9) {
                return Optional.of(s);
            }
        }
        return Optional.empty();
    }

    /** @return the size whose diameter equals {@code diameter} within 0.1 µm, if any */
    public Optional<WireSize> byDiameter(double diameter) {
        for (WireSize s : sizes) {
            if (Math.abs(s.diameter() - diameter) < 1e-7) {
                return Optional.of(s);
            }
        }
        return Optional.empty();
    }

    /** @return every size's diameter, m, in the table's order */
    public List<Double> diameters() {
        return sizes.stream().map(WireSize::diameter).toList();
    }

    /** @return a phrase naming the table's range, e.g. {@code 12 to 23 in half steps} */
    public String rangeText() {
        return String.format(Locale.ROOT, "%s to %s", fmt(sizes.get(0).size()),
                fmt(sizes.get(sizes.size() - 1).size()));
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }
}
