package org.scalewright.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The engine's stiff-string formulas against an independent numerical solution.
 *
 * <p>The stiff (beam-)string equation μ ∂²y/∂t² = T y'' − E I y'''' with hinged ends
 * (y = y'' = 0 at x = 0 and L) has the modes μ ω² y = −T y'' + E I y''''. It is discretised by
 * central finite differences on N interior points (h = L/(N+1)): y'' by the 3-point stencil with
 * y = 0 at the ends, y'''' by the 5-point stencil (1, −4, 6, −4, 1)/h⁴ with the ghost points of
 * the hinged end y₋₁ = −y₁ (from y'' = 0). The symmetric eigenproblem is solved with Commons
 * Math's {@link EigenDecomposition}; the O(h²) discretisation error is removed by Richardson
 * extrapolation between h and h/2. The closed form f_n = n f₀ √(1 + B n²), B = K/T,
 * f₀ = √(T/μ)/(2L) is Fletcher (1964), J. Acoust. Soc. Am. 36, 203; the engine's
 * {@link StringPhysics#partial}, {@link StringPhysics#inharmonicity} and
 * {@link StringPhysics#tension} must agree with the eigen solution within 0.1 % for partials 1–10.
 *
 * <p>The test holds them to 0.001 %, tighter than 0.1 %: at B = 1e-5 stiffness raises partial 10
 * by only 0.05 %, so 0.1 % could not tell a stiff string from a flexible one there. The
 * extrapolated eigen solution is good to about 2e-6 (it was 0.3 % off at partial 10 on the
 * coarse grid alone).
 */
class StiffStringEigenTest {
    private static final double E = 200e9;
    private static final double RHO = 7850;
    private static final int PARTIALS = 10;
    private static final int COARSE = 160; // N + 1 intervals for h; the fine grid has twice as many
    private static final double TOLERANCE = 1e-5; // relative

    /**
     * Cases: a wire diameter and speaking length, and the B wanted; the tension is set to K/B so
     * that B spans 1e-5 to 3e-2 (the tension need not be one a real string would carry).
     */
    @ParameterizedTest(name = "B = {0}: d = {1} mm, L = {2} m")
    @CsvSource({"1e-5, 1.0, 1.9", "1e-4, 1.0, 1.0", "1e-3, 1.0, 0.40", "1e-2, 0.9, 0.09", "3e-2, 1.0, 0.05"})
    @DisplayName("partials 1–10 and B against the eigenvalues of the discretised stiff-string equation "
            + "(Fletcher 1964, JASA 36, 203; Commons Math EigenDecomposition)")
    void partialsAgreeWithEigenSolution(double b, double dmm, double length) {
        double d = dmm * 1e-3;
        double mu = StringPhysics.plainMassPerLength(d, RHO);
        double k = StringPhysics.stiffness(d, length, E);
        double t = k / b;
        double ei = E * Math.PI * Math.pow(d, 4) / 64; // E I of a round wire, I = π d⁴/64

        double[] coarse = lowestOmegaSquared(t, ei, mu, length, COARSE);
        double[] fine = lowestOmegaSquared(t, ei, mu, length, 2 * COARSE);
        double[] f = new double[PARTIALS + 1];
        for (int n = 1; n <= PARTIALS; n++) {
            double omega2 = (4 * fine[n - 1] - coarse[n - 1]) / 3; // Richardson: O(h²) term removed
            f[n] = Math.sqrt(omega2) / (2 * Math.PI);
        }

        double f0 = Math.sqrt(t / mu) / (2 * length);
        assertEquals(b, StringPhysics.inharmonicity(k, t), b * 1e-12, "B = K/T");
        for (int n = 1; n <= PARTIALS; n++) {
            double closedForm = n * f0 * Math.sqrt(1 + b * n * n);
            assertEquals(f[n], closedForm, f[n] * TOLERANCE, "Fletcher closed form, partial " + n);
            double engine = StringPhysics.partial(f[1], StringPhysics.inharmonicity(k, t), n);
            assertEquals(f[n], engine, f[n] * TOLERANCE, "StringPhysics.partial, partial " + n);
        }
        // stiffness is resolved: partial 10 lies above 10 f₁ by the amount the closed form predicts
        double stretch = f[PARTIALS] / (PARTIALS * f[1]) - 1;
        double expected = Math.sqrt((1 + b * PARTIALS * PARTIALS) / (1 + b)) - 1;
        assertEquals(expected, stretch, expected * 0.02, "partial 10 sharp of 10 f1");
        // the tension the engine computes from the eigen-solution's fundamental is the tension we set
        assertEquals(t, StringPhysics.tension(length, mu, f[1], k), t * TOLERANCE, "T = 4 L² μ f₁² − K");
        // the flexible-string law 4 L² μ f₁² is too high by exactly K = B T
        double flexible = StringPhysics.flexibleTension(length, mu, f[1]);
        assertEquals(t * (1 + b), flexible, t * TOLERANCE);
    }

    /** @return the lowest {@code PARTIALS} eigenvalues ω² of the discretised operator, ascending */
    private static double[] lowestOmegaSquared(double t, double ei, double mu, double length, int intervals) {
        int n = intervals - 1;
        double h = length / intervals;
        double a2 = t / (mu * h * h);
        double a4 = ei / (mu * h * h * h * h);
        double[][] m = new double[n][n];
        for (int i = 0; i < n; i++) {
            // −T y'': (−1, 2, −1)/h², y = 0 outside
            m[i][i] += 2 * a2;
            if (i > 0) {
                m[i][i - 1] -= a2;
            }
            if (i < n - 1) {
                m[i][i + 1] -= a2;
            }
            // E I y'''': (1, −4, 6, −4, 1)/h⁴; y₀ = 0 at the end, ghost y₋₁ = −y₁ (hinged, y'' = 0)
            m[i][i] += 6 * a4;
            if (i == 0 || i == n - 1) {
                m[i][i] -= a4; // the ghost point folds back onto the first/last interior point
            }
            for (int off : new int[] {-2, -1, 1, 2}) {
                int j = i + off;
                if (j >= 0 && j < n) {
                    m[i][j] += (Math.abs(off) == 1 ? -4 : 1) * a4;
                }
            }
        }
        double[] ev = new EigenDecomposition(new Array2DRowRealMatrix(m, false)).getRealEigenvalues();
        double[] sorted = ev.clone();
        Arrays.sort(sorted);
        return Arrays.copyOf(sorted, PARTIALS);
    }
}
