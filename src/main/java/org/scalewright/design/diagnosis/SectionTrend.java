package org.scalewright.design.diagnosis;

import org.scalewright.design.SmoothTrend;

/**
 * A robust smooth trend of one section that a group of notes standing out together cannot drag:
 * the {@link SmoothTrend} is fitted, the note furthest from it (by more than the margin) is left
 * out, and the trend fitted again, until no note left in is further out than the margin or half
 * the section has been left out. This is done first with a wide trend (bandwidth 1: every local
 * fit spans the section), then with the ordinary bandwidth, which gives the final trend; a note
 * left out that lies within the margin of the trend fitted with it put back stays in. At the notes left out, the trend is interpolated linearly
 * between its neighbours (extrapolated by a straight line through the nearest five at the ends).
 *
 * <p>Why: a local robust fit (LOESS, bandwidth one half) follows a group of neighbouring notes
 * that fill a good part of its window, bending into a ramp so that the normal notes beside the
 * group look furthest out; the wide fit cannot bend that far, so the group's own notes are
 * taken out first, one at a time, leaving the trend of the rest.
 *
 * @param keys     the section's key numbers, increasing
 * @param values   the fitted values
 * @param trend    the trend at every key
 * @param leftOut  true where a note was left out of the final fit
 */
public record SectionTrend(double[] keys, double[] values, double[] trend, boolean[] leftOut) {
    /** Bandwidth of the first, wide trend. */
    static final double WIDE_BANDWIDTH = 1.0;

    /**
     * @param keys      key numbers, strictly increasing
     * @param values    values at those keys, finite and &gt; 0 (the deviation is relative)
     * @param marginPct a note further than this percent from the trend is left out, &gt; 0
     * @return the trend
     */
    public static SectionTrend fit(double[] keys, double[] values, double marginPct) {
        if (keys.length != values.length) {
            throw new IllegalArgumentException("keys and values must have the same length, were " + keys.length
                    + " and " + values.length);
        }
        if (!(marginPct > 0)) {
            throw new IllegalArgumentException("margin must be > 0 %, was " + marginPct);
        }
        boolean[] out = new boolean[keys.length];
        // first against a wide trend, which a group of neighbours cannot bend into a ramp, then against
        // the ordinary one
        peel(keys, values, marginPct, out, WIDE_BANDWIDTH);
        peel(keys, values, marginPct, out, SmoothTrend.DEFAULT_BANDWIDTH);
        double[] trend = trendWithout(keys, values, out, SmoothTrend.DEFAULT_BANDWIDTH);
        // a note the wide trend left out wrongly (on a curved section) comes back when, fitted with it
        // put back, it lies within the margin of the trend
        for (int round = 0; round < keys.length; round++) {
            boolean back = false;
            for (int i = 0; i < keys.length; i++) {
                if (!out[i]) {
                    continue;
                }
                out[i] = false;
                double with = trendWithout(keys, values, out, SmoothTrend.DEFAULT_BANDWIDTH)[i];
                if (Math.abs(deviationPct(values[i], with)) <= marginPct) {
                    back = true;
                } else {
                    out[i] = true;
                }
            }
            if (!back) {
                break;
            }
            peel(keys, values, marginPct, out, SmoothTrend.DEFAULT_BANDWIDTH);
            trend = trendWithout(keys, values, out, SmoothTrend.DEFAULT_BANDWIDTH);
        }
        return new SectionTrend(keys, values, trend, out);
    }

    /** Leaves out, worst first, the notes further than the margin from the trend of the rest. */
    private static void peel(double[] keys, double[] values, double marginPct, boolean[] out, double bandwidth) {
        int n = keys.length;
        int maxLeftOut = n / 2;
        int leftOut = 0;
        for (boolean o : out) {
            leftOut += o ? 1 : 0;
        }
        while (n - leftOut > 3 && leftOut < maxLeftOut) {
            double[] trend = trendWithout(keys, values, out, bandwidth);
            int worst = -1;
            double worstDev = 0;
            for (int i = 0; i < n; i++) {
                if (!out[i]) {
                    double dev = Math.abs(deviationPct(values[i], trend[i]));
                    if (dev > worstDev) {
                        worstDev = dev;
                        worst = i;
                    }
                }
            }
            if (worst < 0 || worstDev <= marginPct) {
                return;
            }
            out[worst] = true;
            leftOut++;
        }
    }

    public SectionTrend {
        keys = keys.clone();
        values = values.clone();
        trend = trend.clone();
        leftOut = leftOut.clone();
    }

    @Override
    public double[] keys() {
        return keys.clone();
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    @Override
    public double[] trend() {
        return trend.clone();
    }

    @Override
    public boolean[] leftOut() {
        return leftOut.clone();
    }

    /**
     * The trend of other values of the same notes, fitted with the same notes left out (so that a
     * quantity's trend is not dragged by the notes that stand out in percent of breaking strength).
     *
     * @param otherValues values at {@link #keys()}
     * @return the trend of those values at every key
     */
    public double[] trendOf(double[] otherValues) {
        if (otherValues.length != keys.length) {
            throw new IllegalArgumentException("needs one value per key, had " + otherValues.length);
        }
        return trendWithout(keys, otherValues, leftOut, SmoothTrend.DEFAULT_BANDWIDTH);
    }

    /** @return 100 · (value − trend) / trend, % */
    public static double deviationPct(double value, double trend) {
        return 100.0 * (value - trend) / trend;
    }

    private static double[] trendWithout(double[] keys, double[] values, boolean[] out, double bandwidth) {
        int n = keys.length;
        int m = 0;
        for (boolean o : out) {
            m += o ? 0 : 1;
        }
        double[] k = new double[m];
        double[] v = new double[m];
        for (int i = 0, j = 0; i < n; i++) {
            if (!out[i]) {
                k[j] = keys[i];
                v[j++] = values[i];
            }
        }
        double[] fitted = SmoothTrend.fit(k, v, bandwidth, SmoothTrend.DEFAULT_ROBUSTNESS_ITERATIONS);
        double[] trend = new double[n];
        for (int i = 0, j = 0; i < n; i++) {
            trend[i] = out[i] ? at(keys[i], k, fitted) : fitted[j++];
        }
        return trend;
    }

    /** Linear interpolation in (k, f) at x; a least-squares line through the nearest five at the ends. */
    private static double at(double x, double[] k, double[] f) {
        int m = k.length;
        if (m == 1) {
            return f[0];
        }
        if (x > k[0] && x < k[m - 1]) {
            int i = 0;
            while (k[i + 1] < x) {
                i++;
            }
            double t = (x - k[i]) / (k[i + 1] - k[i]);
            return f[i] + t * (f[i + 1] - f[i]);
        }
        int count = Math.min(5, m);
        int from = x <= k[0] ? 0 : m - count;
        double mk = 0;
        double mf = 0;
        for (int i = from; i < from + count; i++) {
            mk += k[i];
            mf += f[i];
        }
        mk /= count;
        mf /= count;
        double sxy = 0;
        double sxx = 0;
        for (int i = from; i < from + count; i++) {
            sxy += (k[i] - mk) * (f[i] - mf);
            sxx += (k[i] - mk) * (k[i] - mk);
        }
        double slope = sxx == 0 ? 0 : sxy / sxx;
        return mf + slope * (x - mk);
    }
}
