package org.scalewright.physics;

import org.scalewright.model.Checks;
import org.scalewright.model.Materials;
import org.scalewright.model.Wrap;

/**
 * The stiff-string physics of one piano string, SI throughout (m, kg, N, Pa, Hz).
 *
 * <p>Tension of a stiff string with hinged ends tuned to fundamental f
 * (Fletcher 1964, J. Acoust. Soc. Am. 36, 203: f_n = n f₀ √(1 + B n²), B = K/T):
 * T = 4 L² μ f² − K, with the stiffness constant K = π³ E d⁴ / (64 L²) of the core alone.
 */
public final class StringPhysics {
    private static final double PI = Math.PI;

    private StringPhysics() {
    }

    /**
     * @param d diameter of the wire, m, &gt; 0
     * @return cross-section area π d²/4, m²
     */
    public static double area(double d) {
        return PI * d * d / 4.0;
    }

    /**
     * Mass per length of plain wire, μ = ρ π d²/4.
     *
     * @param d   diameter, m, &gt; 0
     * @param rho density, kg/m³, &gt; 0
     * @return μ, kg/m
     */
    public static double plainMassPerLength(double d, double rho) {
        return rho * area(d);
    }

    /**
     * Mass per length of a wound string: steel core plus close-wound round wrap wire(s), each
     * turn's centre line π × the diameter it lies on:
     * μ = ρ_s π d²/4 + ρ_w π² w1 (d + w1)/4 + ρ_w π² w2 (d + 2 w1 + w2)/4.
     *
     * @param core core diameter, m, &gt; 0
     * @param wrap the winding (null for plain wire)
     * @param m    material densities
     * @return μ, kg/m
     */
    public static double massPerLength(double core, Wrap wrap, Materials m) {
        double mu = plainMassPerLength(core, m.steelDensity());
        if (wrap != null) {
            double rhoW = m.densityOf(wrap.metal());
            double w1 = wrap.inner();
            double w2 = wrap.outer();
            mu += rhoW * PI * PI * w1 * (core + w1) / 4.0;
            if (w2 > 0) {
                mu += rhoW * PI * PI * w2 * (core + 2 * w1 + w2) / 4.0;
            }
        }
        return mu;
    }

    /**
     * Stiffness constant of the core, K = π³ E d⁴ / (64 L²) (the wrap adds mass, not stiffness).
     *
     * @param core core or plain-wire diameter, m, &gt; 0
     * @param length speaking length, m, &gt; 0
     * @param youngsModulus E, Pa
     * @return K, N
     */
    public static double stiffness(double core, double length, double youngsModulus) {
        Checks.positive("speaking length", length, "mm", 1e3);
        return PI * PI * PI * youngsModulus * (core * core) * (core * core) / (64.0 * length * length);
    }

    /**
     * Tension of a stiff string with hinged ends tuned to {@code f}: T = 4 L² μ f² − K.
     *
     * @param length speaking length L, m, &gt; 0
     * @param mu mass per length, kg/m, &gt; 0
     * @param f fundamental frequency, Hz, &gt; 0
     * @param k stiffness constant, N, &ge; 0
     * @return T, N (negative only for an absurdly stiff, slack wire)
     */
    public static double tension(double length, double mu, double f, double k) {
        return 4.0 * length * length * mu * f * f - k;
    }

    /** @return the flexible-string (Mersenne) tension 4 L² μ f², N: the B → 0 limit */
    public static double flexibleTension(double length, double mu, double f) {
        return 4.0 * length * length * mu * f * f;
    }

    /** @return inharmonicity coefficient B = K / T (dimensionless), for T &gt; 0 */
    public static double inharmonicity(double k, double tension) {
        return k / tension;
    }

    /**
     * Frequency of partial n of a stiff string whose first partial sounds at f1:
     * f_n = n f1 √((1 + B n²)/(1 + B)).
     *
     * @param f1 frequency of the first partial, Hz
     * @param b inharmonicity coefficient, &ge; 0
     * @param n partial number, &ge; 1
     * @return f_n, Hz
     */
    public static double partial(double f1, double b, int n) {
        if (n < 1) {
            throw new IllegalArgumentException("partial number must be >= 1, was " + n);
        }
        return n * f1 * Math.sqrt((1.0 + b * n * n) / (1.0 + b));
    }

    /** @return stress σ = T / (π d²/4) of the core, Pa */
    public static double stress(double tension, double core) {
        return tension / area(core);
    }

    /**
     * Frequency at which the core's stress reaches {@code strength}:
     * f_b = √((σ_b A + K)/(4 L² μ)).
     *
     * @return f_b, Hz
     */
    public static double breakingFrequency(double strength, double core, double k, double length, double mu) {
        return Math.sqrt((strength * area(core) + k) / (4.0 * length * length * mu));
    }

    /** @return string impedance Z = √(T μ), kg/s */
    public static double impedance(double tension, double mu) {
        return Math.sqrt(Math.max(tension, 0) * mu);
    }

    /**
     * Elongation from slack to pitch, ΔL = T L_t / (E A).
     *
     * @param tension T, N
     * @param stretchedLength L_t, m
     * @param core core diameter, m
     * @param youngsModulus E, Pa
     * @return ΔL, m
     */
    public static double elongation(double tension, double stretchedLength, double core, double youngsModulus) {
        return tension * stretchedLength / (youngsModulus * area(core));
    }
}
