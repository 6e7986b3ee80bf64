package org.scalewright.design;

import org.apache.commons.math3.analysis.interpolation.LoessInterpolator;

/**
 * A robust smooth trend through values over key numbers: LOESS (locally weighted regression)
 * with robustness iterations, so that a few notes that stand out do not drag the trend
 * (Cleveland 1979, J. Am. Stat. Assoc. 74, 829; Commons Math {@link LoessInterpolator}).
 */
public final class SmoothTrend {
    /** Default bandwidth: the fraction of the points used for each local fit. */
    public static final double DEFAULT_BANDWIDTH = 0.5;
    /** Default number of robustness iterations. */
    public static final int DEFAULT_ROBUSTNESS_ITERATIONS = 4;

    private SmoothTrend() {
    }

    /**
     * @param keys       key numbers, strictly increasing
     * @param values     the values at those keys (any unit), finite
     * @param bandwidth  fraction of points in each local fit, in (0, 1]; widened as needed so
     *                   each fit has at least 3 points
     * @param iterations robustness iterations, &ge; 0
     * @return the trend at each key, same unit as {@code values}; for fewer than 3 points the
     *         values themselves
     */
    public static double[] fit(double[] keys, double[] values, double bandwidth, int iterations) {
        if (keys.length != values.length) {
            throw new IllegalArgumentException("keys and values must have the same length, were "
                    + keys.length + " and " + values.length);
        }
        if (!(bandwidth > 0 && bandwidth <= 1)) {
            throw new IllegalArgumentException("bandwidth must be in (0, 1], was " + bandwidth);
        }
        if (iterations < 0) {
            throw new IllegalArgumentException("robustness iterations must be >= 0, was " + iterations);
        }
        int n = keys.length;
        if (n < 3) {
            return values.clone();
        }
        double bw = Math.min(1.0, Math.max(bandwidth, 3.0 / n));
        return new LoessInterpolator(bw, iterations).smooth(keys, values);
    }

    /** @return {@link #fit} with the default bandwidth and robustness iterations */
    public static double[] fit(double[] keys, double[] values) {
        return fit(keys, values, DEFAULT_BANDWIDTH, DEFAULT_ROBUSTNESS_ITERATIONS);
    }
}
