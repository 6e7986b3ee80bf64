package org.scalewright.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

class SmoothTrendTest {
    @Test
    void aStraightLineIsItsOwnTrend() {
        double[] k = new double[20];
        double[] v = new double[20];
        for (int i = 0; i < k.length; i++) {
            k[i] = 30 + i;
            v[i] = 700 + 3.5 * i;
        }
        double[] t = SmoothTrend.fit(k, v);
        for (int i = 0; i < k.length; i++) {
            assertEquals(v[i], t[i], 1e-9);
        }
    }

    @Test
    void oneBumpedNoteDoesNotDragTheTrend() {
        double[] k = new double[25];
        double[] v = new double[25];
        for (int i = 0; i < k.length; i++) {
            k[i] = 60 + i;
            // a little ripple, as real scales have: on exactly straight data every residual but
            // the bump is zero, and Commons Math then stops its robustness iterations early
            v[i] = 50 + 0.1 * i + 0.2 * Math.sin(1.7 * i);
        }
        v[12] = 65;
        double[] t = SmoothTrend.fit(k, v);
        assertEquals(50 + 1.2 + 0.2 * Math.sin(1.7 * 12), t[12], 0.5, "trend at the bumped note");
    }

    @Test
    void shortNoisyRunsWithOutliersGiveAFiniteTrend() {
        Random r = new Random(11);
        for (int trial = 0; trial < 500; trial++) {
            int n = 3 + r.nextInt(12);
            double[] k = new double[n];
            double[] v = new double[n];
            for (int i = 0; i < n; i++) {
                k[i] = i;
                v[i] = 800 + r.nextGaussian() * 5 + (r.nextInt(4) == 0 ? 300 * r.nextDouble() : 0);
            }
            SmoothTrend.Fit f = SmoothTrend.robustFit(k, v, 0.3, 4);
            for (double x : f.values()) {
                assertTrue(Double.isFinite(x), "n=" + n + " trial=" + trial);
            }
            assertTrue(f.bandwidth() * n >= Math.min(n, SmoothTrend.MIN_POINTS) - 1e-9);
        }
    }
}
