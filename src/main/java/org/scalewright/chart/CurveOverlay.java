package org.scalewright.chart;

import java.util.Collections;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * A named series of percent-of-breaking-strength values per key, drawn over the curves of the
 * percent-of-breaking-strength chart (e.g. a wire check's "after" and "peak", or the notes a
 * diagnosis finds standing out). Other charts do not draw it.
 *
 * @param name   the legend label; unique among the overlays of one {@link CurveData}
 * @param values percent of breaking strength by key number, %; non-finite values are left out
 * @param look   how it is drawn
 */
public record CurveOverlay(String name, SortedMap<Integer, Double> values, Look look) {
    /** How an overlay is drawn. */
    public enum Look {
        /** a solid line, in violet */
        LINE,
        /** a dotted line, in deep red */
        DOTTED,
        /** open diamonds at the keys, no line, in deep teal */
        MARKS
    }

    public CurveOverlay {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("an overlay needs a name, was '" + name + "'");
        }
        if (look == null) {
            throw new IllegalArgumentException("overlay '" + name + "' needs a look, was null");
        }
        TreeMap<Integer, Double> copy = new TreeMap<>();
        if (values != null) {
            for (Map.Entry<Integer, Double> e : values.entrySet()) {
                if (e.getValue() != null && Double.isFinite(e.getValue())) {
                    copy.put(e.getKey(), e.getValue());
                }
            }
        }
        values = Collections.unmodifiableSortedMap(copy);
    }

    /** @return an overlay of {@code values} (percent by key) drawn with {@code look} */
    public static CurveOverlay of(String name, Map<Integer, Double> values, Look look) {
        return new CurveOverlay(name, new TreeMap<>(values), look);
    }
}
