package org.scalewright.design.rescale;

/**
 * A point a target curve is drawn through: a key and the value wanted there.
 *
 * @param key   key number
 * @param value the target value at the key (N for tension, % for percent of breaking strength), &gt; 0
 */
public record ControlPoint(int key, double value) {
    public ControlPoint {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException("control point value at key " + key + " must be > 0, was " + value);
        }
    }
}
