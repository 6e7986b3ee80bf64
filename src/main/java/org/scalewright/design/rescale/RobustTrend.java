package org.scalewright.design.rescale;

import org.scalewright.design.SmoothTrend;

/**
 * The robust smooth trend used for targets: {@link SmoothTrend} with at least
 * {@link #MIN_POINTS} keys in each local fit (fewer let one bumped note carry its own fit),
 * and, where Commons Math's robustness weights leave a local fit without weight (it then
 * returns NaN, seen on short runs of keys), the bandwidth widened step by step and, at full
 * width, fewer robustness iterations.
 */
final class RobustTrend {
    /** Fewest keys in each local fit. */
    static final int MIN_POINTS = 7;

    /**
     * @param values    the trend at each key, same unit as the input
     * @param bandwidth the bandwidth used in the end, in (0, 1]
     * @param iterations the robustness iterations used in the end
     */
    record Fit(double[] values, double bandwidth, int iterations) {
    }

    private RobustTrend() {
    }

    static Fit fit(double[] keys, double[] values, double bandwidth, int iterations) {
        int n = keys.length;
        double bw = n == 0 ? bandwidth : Math.min(1.0, Math.max(bandwidth, (double) MIN_POINTS / n));
        int it = iterations;
        while (true) {
            double[] f = SmoothTrend.fit(keys, values, bw, it);
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

    private static boolean allFinite(double[] v) {
        for (double x : v) {
            if (!Double.isFinite(x)) {
                return false;
            }
        }
        return true;
    }
}
