package org.scalewright.design;

import org.apache.commons.math3.analysis.interpolation.LoessInterpolator;

/**
 * A robust smooth trend through values over key numbers: LOESS (locally weighted regression)
 * with robustness iterations, so that a few notes that stand out do not drag the trend
 * (Cleveland 1979, J. Am. Stat. Assoc. 74, 829; Commons Math {@link LoessInterpolator}).
 *
 * <p>Each local fit takes at least {@link #MIN_POINTS} keys (fewer let one bumped note carry
 * its own fit). Where Commons Math's robustness weights leave a local fit without weight (it
 * then returns NaN, seen on short runs of keys), the bandwidth is widened step by step and, at
 * full width, the robustness iterations are reduced, so the trend is always finite.
 */
public final class SmoothTrend {
    /** Default bandwidth: the fraction of the points used for each local fit. */
    public static final double DEFAULT_BANDWIDTH = 0.5;
    /** Default number of robustness iterations. */
    public static final int DEFAULT_ROBUSTNESS_ITERATIONS = 4;
    /** Fewest keys in each local fit. */
    public static final int MIN_POINTS = 7;

    /**
     * A fitted trend and the settings that were needed for it.
     *
     * @param values     the trend at each key, same unit as the input
     * @param bandwidth  the bandwidth used in the end, in (0, 1]
     * @param iterations the robustness iterations used in the end
     */
    public record Fit(double[] values, double bandwidth, int iterations) {
    }

    private SmoothTrend() {
    }

    /**
     * @param keys       key numbers, strictly increasing
     * @param values     the values at those keys (any unit), finite
     * @param bandwidth  fraction of points in each local fit, in (0, 1]; widened as needed so
     *                   each fit has at least {@link #MIN_POINTS} points
     * @param iterations robustness iterations, &ge; 0
     * @return the trend and the bandwidth and iterations used; for fewer than 3 points the
     *         values themselves
     */
    public static Fit robustFit(double[] keys, double[] values, double bandwidth, int iterations) {
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
            return new Fit(values.clone(), bandwidth, iterations);
        }
        double bw = Math.min(1.0, Math.max(bandwidth, (double) MIN_POINTS / n));
        int it = iterations;
        while (true) {
            double[] f = new LoessInterpolator(bw, it).smooth(keys, values);
            if (allFinite(f)) {
                return new Fit(f, bw, it);
            }
            if (bw < 1.0) {
                bw = Math.min(1.0, bw * 1.25);
            } else if (it > 0) {
                it--;
            } else {
                return new Fit(values.clone(), bw, it);
            }
        }
    }

    /** @return the trend values of {@link #robustFit} */
    public static double[] fit(double[] keys, double[] values, double bandwidth, int iterations) {
        return robustFit(keys, values, bandwidth, iterations).values();
    }

    /** @return {@link #fit} with the default bandwidth and robustness iterations */
    public static double[] fit(double[] keys, double[] values) {
        return fit(keys, values, DEFAULT_BANDWIDTH, DEFAULT_ROBUSTNESS_ITERATIONS);
    }

    private static boolean allFinite(double[] v) {
        for (double x : v) {
            if (!Double.isFinite(x)) {
                return false;
            }
        }
        return true;
    }
}
