package org.scalewright.design.rescale;

import java.util.Arrays;
import java.util.Locale;

/**
 * A target value for every key of a run of consecutive keys: what the rescaled strings should
 * aim at. The quantity is the caller's (per-string tension in N, or percent of breaking
 * strength); see {@link TargetQuantity}. Immutable.
 */
public final class TargetCurve {
    private final int firstKey;
    private final double[] values;
    private final String description;

    /**
     * @param firstKey    the lowest key the curve covers
     * @param values      one value per key from {@code firstKey} upwards, each finite and &gt; 0
     * @param description how the curve was made, in plain words (shown to the user)
     */
    public TargetCurve(int firstKey, double[] values, String description) {
        if (values.length == 0) {
            throw new IllegalArgumentException("a target curve needs at least one key");
        }
        for (int i = 0; i < values.length; i++) {
            if (!(values[i] > 0) || Double.isInfinite(values[i])) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "target value for key %d must be > 0, was %s", firstKey + i, values[i]));
            }
        }
        this.firstKey = firstKey;
        this.values = values.clone();
        this.description = description == null ? "" : description;
    }

    /**
     * A curve through values given at some keys, straight between them.
     *
     * @param keys   strictly increasing key numbers, at least one
     * @param values the values at those keys, &gt; 0
     */
    public static TargetCurve throughPoints(int[] keys, double[] values, String description) {
        if (keys.length != values.length || keys.length == 0) {
            throw new IllegalArgumentException("a target needs one value per key and at least one key, had "
                    + keys.length + " keys and " + values.length + " values");
        }
        for (int i = 1; i < keys.length; i++) {
            if (keys[i] <= keys[i - 1]) {
                throw new IllegalArgumentException("target keys must rise, key " + keys[i] + " follows " + keys[i - 1]);
            }
        }
        int first = keys[0];
        double[] v = new double[keys[keys.length - 1] - first + 1];
        for (int i = 0; i < keys.length; i++) {
            v[keys[i] - first] = values[i];
            if (i > 0) {
                int a = keys[i - 1];
                int b = keys[i];
                for (int k = a + 1; k < b; k++) {
                    double t = (double) (k - a) / (b - a);
                    v[k - first] = values[i - 1] + t * (values[i] - values[i - 1]);
                }
            }
        }
        return new TargetCurve(first, v, description);
    }

    /** @return the lowest key covered */
    public int firstKey() {
        return firstKey;
    }

    /** @return the highest key covered */
    public int lastKey() {
        return firstKey + values.length - 1;
    }

    /** @return true when the curve has a value for {@code key} */
    public boolean covers(int key) {
        return key >= firstKey && key <= lastKey();
    }

    /**
     * @param key a key the curve covers
     * @return the target value at that key
     * @throws IllegalArgumentException when the key lies outside the curve
     */
    public double at(int key) {
        if (!covers(key)) {
            throw new IllegalArgumentException("key " + key + " lies outside the target curve (keys "
                    + firstKey + "-" + lastKey() + ")");
        }
        return values[key - firstKey];
    }

    /** @return a copy of the values, one per key from {@link #firstKey()} */
    public double[] values() {
        return values.clone();
    }

    /**
     * Control points sampled from the curve, for a user to drag into a {@link TargetSpec.Spline}.
     *
     * @param count how many, &ge; 2 (fewer when the curve has fewer keys); the ends always included
     * @return points at evenly spaced keys, bass to treble
     */
    public java.util.List<ControlPoint> controlPoints(int count) {
        if (count < 2) {
            throw new IllegalArgumentException("control points must be >= 2, was " + count);
        }
        int n = Math.min(count, values.length);
        java.util.List<ControlPoint> out = new java.util.ArrayList<>();
        int previous = Integer.MIN_VALUE;
        for (int i = 0; i < n; i++) {
            int key = n == 1 ? firstKey : firstKey + (int) Math.round((double) i * (values.length - 1) / (n - 1));
            if (key != previous) {
                out.add(new ControlPoint(key, at(key)));
                previous = key;
            }
        }
        return out;
    }

    /** @return how the curve was made */
    public String description() {
        return description;
    }

    /** @return the same values with another description */
    public TargetCurve describedAs(String newDescription) {
        return new TargetCurve(firstKey, values, newDescription);
    }

    /** @return the part of the curve from {@code first} to {@code last}, both covered */
    public TargetCurve part(int first, int last) {
        if (!covers(first) || !covers(last) || last < first) {
            throw new IllegalArgumentException("keys " + first + "-" + last + " are not inside the target curve (keys "
                    + firstKey + "-" + lastKey() + ")");
        }
        return new TargetCurve(first, Arrays.copyOfRange(values, first - firstKey, last - firstKey + 1), description);
    }

    /**
     * Joins the curve of one section to the curve of the next so that they run on continuously.
     * Each curve's natural continuation (straight in log value, along its end slope) is
     * extended to the point half-way between the two curves' facing ends; the mismatch there
     * is taken up by bending each curve smoothly (a smoothstep over {@code blendKeys} keys
     * next to the join), {@code lowerShare} of it by the lower curve and the rest by the upper.
     * Keys between the two curves (a gap) are filled straight in log value.
     *
     * @param lower      the curve of the lower section
     * @param upper      the curve of the next section; its first key above {@code lower}'s last
     * @param blendKeys  how many keys next to the join each curve may bend over, &ge; 1
     * @param lowerShare the fraction of the mismatch the lower curve takes, in [0, 1]
     *                   (1: the lower curve bends to meet the upper one; 0.5: both meet half-way)
     * @return one curve from {@code lower}'s first key to {@code upper}'s last
     */
    public static TargetCurve join(TargetCurve lower, TargetCurve upper, int blendKeys, double lowerShare) {
        if (upper.firstKey <= lower.lastKey()) {
            throw new IllegalArgumentException("the upper curve must start above the lower one, started at key "
                    + upper.firstKey + " but the lower ends at " + lower.lastKey());
        }
        if (blendKeys < 1) {
            throw new IllegalArgumentException("blend must be >= 1 key, was " + blendKeys);
        }
        if (!(lowerShare >= 0 && lowerShare <= 1)) {
            throw new IllegalArgumentException("lower share must be in [0, 1], was " + lowerShare);
        }
        double[] lo = logs(lower.values);
        double[] up = logs(upper.values);
        double slopeLo = lo.length > 1 ? lo[lo.length - 1] - lo[lo.length - 2] : Double.NaN;
        double slopeUp = up.length > 1 ? up[1] - up[0] : Double.NaN;
        if (Double.isNaN(slopeLo)) {
            slopeLo = Double.isNaN(slopeUp) ? 0 : slopeUp;
        }
        if (Double.isNaN(slopeUp)) {
            slopeUp = slopeLo;
        }
        double mid = (lower.lastKey() + upper.firstKey) / 2.0;
        double fromLower = lo[lo.length - 1] + slopeLo * (mid - lower.lastKey());
        double fromUpper = up[0] - slopeUp * (upper.firstKey - mid);
        double mismatch = fromUpper - fromLower;
        double shiftLo = lowerShare * mismatch;
        double shiftUp = -(1 - lowerShare) * mismatch;
        for (int i = 0; i < lo.length; i++) {
            int fromEnd = lo.length - 1 - i;
            lo[i] += shiftLo * weight(fromEnd, blendKeys);
        }
        for (int i = 0; i < up.length; i++) {
            up[i] += shiftUp * weight(i, blendKeys);
        }
        int first = lower.firstKey;
        double[] v = new double[upper.lastKey() - first + 1];
        for (int i = 0; i < lo.length; i++) {
            v[i] = Math.exp(lo[i]);
        }
        int gapFrom = lower.lastKey();
        int gapTo = upper.firstKey;
        for (int k = gapFrom + 1; k < gapTo; k++) {
            double t = (double) (k - gapFrom) / (gapTo - gapFrom);
            v[k - first] = Math.exp(lo[lo.length - 1] + t * (up[0] - lo[lo.length - 1]));
        }
        for (int i = 0; i < up.length; i++) {
            v[upper.firstKey - first + i] = Math.exp(up[i]);
        }
        String d = lower.description.equals(upper.description) ? lower.description
                : lower.description + "; " + upper.description;
        return new TargetCurve(first, v, d + " (joined at keys " + lower.lastKey() + "/" + upper.firstKey + ")");
    }

    /** Smoothstep weight: 1 at the join (distance 0), falling to 0 at {@code blend} keys from it. */
    private static double weight(int distance, int blend) {
        if (distance >= blend) {
            return 0;
        }
        double x = 1.0 - (double) distance / blend;
        return x * x * (3 - 2 * x);
    }

    private static double[] logs(double[] v) {
        double[] l = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            l[i] = Math.log(v[i]);
        }
        return l;
    }

    @Override
    public String toString() {
        return description + " (keys " + firstKey + "-" + lastKey() + ")";
    }
}
