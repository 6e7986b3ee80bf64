package org.scalewright.design.rescale;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** The dynamic programme against enumeration of every sequence on small random cases. */
class ChoiceChainTest {

    @Test
    void monotoneOptimumEqualsBruteForce() {
        Random rnd = new Random(11);
        for (int trial = 0; trial < 300; trial++) {
            int n = 1 + rnd.nextInt(5);
            int m = 1 + rnd.nextInt(4);
            double[][] cost = randomCost(rnd, n, m);
            double change = rnd.nextDouble() * 0.5;
            double[][][] step = randomStep(rnd, n, m);
            ChoiceChain.Result r = ChoiceChain.monotone(cost, change, (k, i, j) -> step[k][i][j]);
            double brute = brute(cost, change, step, true);
            if (brute == Double.POSITIVE_INFINITY) {
                assertNull(r, "no allowed sequence, trial " + trial);
            } else {
                assertNotNull(r, "trial " + trial);
                assertEquals(brute, r.total(), 1e-12, "trial " + trial);
                assertEquals(brute, objective(r.choice(), cost, change, step), 1e-12, "trial " + trial);
            }
        }
    }

    @Test
    void unconstrainedChainEqualsBruteForce() {
        Random rnd = new Random(12);
        for (int trial = 0; trial < 300; trial++) {
            int n = 1 + rnd.nextInt(5);
            int m = 1 + rnd.nextInt(4);
            double[][] cost = randomCost(rnd, n, m);
            double[][][] step = randomStep(rnd, n, m);
            int[][] wire = new int[n][m];
            ChoiceChain.Result r = ChoiceChain.solve(cost, wire, 0, (k, i, j) -> step[k][i][j], (k, i, j) -> true);
            double brute = brute(cost, 0, step, false);
            if (brute == Double.POSITIVE_INFINITY) {
                assertNull(r);
            } else {
                assertEquals(brute, r.total(), 1e-12, "trial " + trial);
            }
        }
    }

    private static double[][] randomCost(Random rnd, int n, int m) {
        double[][] c = new double[n][m];
        for (int k = 0; k < n; k++) {
            for (int j = 0; j < m; j++) {
                c[k][j] = rnd.nextDouble() < 0.2 ? Double.POSITIVE_INFINITY : rnd.nextDouble();
            }
        }
        return c;
    }

    private static double[][][] randomStep(Random rnd, int n, int m) {
        double[][][] s = new double[n][m][m];
        for (int k = 0; k < n; k++) {
            for (int i = 0; i < m; i++) {
                for (int j = 0; j < m; j++) {
                    s[k][i][j] = rnd.nextDouble() < 0.5 ? 0 : rnd.nextDouble() * 0.3;
                }
            }
        }
        return s;
    }

    private static double brute(double[][] cost, double change, double[][][] step, boolean monotone) {
        int n = cost.length;
        int m = cost[0].length;
        int total = (int) Math.pow(m, n);
        double best = Double.POSITIVE_INFINITY;
        int[] seq = new int[n];
        for (int code = 0; code < total; code++) {
            int c = code;
            for (int k = 0; k < n; k++) {
                seq[k] = c % m;
                c /= m;
            }
            boolean ok = true;
            for (int k = 1; k < n && monotone; k++) {
                ok &= seq[k] >= seq[k - 1];
            }
            if (ok) {
                best = Math.min(best, objective(seq, cost, change, step));
            }
        }
        return best;
    }

    private static double objective(int[] seq, double[][] cost, double change, double[][][] step) {
        double sum = 0;
        for (int k = 0; k < seq.length; k++) {
            sum += cost[k][seq[k]];
            if (k > 0) {
                sum += (seq[k] != seq[k - 1] ? change : 0) + step[k][seq[k - 1]][seq[k]];
            }
        }
        return sum;
    }
}
