package org.scalewright.physics;

import java.util.Locale;
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
     * Mass per length of a wound string: steel core plus close-wound round wrap wire(s). Each
     * layer's wire centre line is a helix on the diameter D of that layer's turn centre line
     * (D1 = d + w1, D2 = d + 2 w1 + w2) advancing one wire diameter w per turn, so one turn is
     * √((π D)² + w²) long (geometry of a close-wound helix: the turn unrolls to a right triangle
     * with legs π D and w) and carries the mass ρ_w π w²/4 per metre of wire:
     * μ = ρ_s π d²/4 + ρ_w π² w1 D1 h1/4 + ρ_w π² w2 D2 h2/4, with the helical factor
     * h = √(1 + (w/(π D))²) (DESIGN §3).
     *
     * @param core core diameter, m, &gt; 0
     * @param wrap the winding (null for plain wire)
     * @param m    material densities
     * @return μ of the wound part, kg/m
     */
    public static double massPerLength(double core, Wrap wrap, Materials m) {
        double mu = plainMassPerLength(core, m.steelDensity());
        if (wrap != null) {
            double rhoW = m.densityOf(wrap.metal());
            double w1 = wrap.inner();
            double w2 = wrap.outer();
            mu += wrapLayerMassPerLength(core, w1, rhoW);
            if (w2 > 0) {
                mu += wrapLayerMassPerLength(core + 2 * w1, w2, rhoW);
            }
        }
        return mu;
    }

    /**
     * Mass per string length of one close-wound layer of round wire {@code w} laid over the
     * diameter {@code under}: ρ_w π² w D h/4 with D = under + w and h = {@link #helicalFactor}.
     *
     * @param under diameter the layer lies on (the core, or core + 2 × inner wrap), m, &gt; 0
     * @param w     wrap wire diameter, m, &ge; 0
     * @param rhoW  density of the wrap wire, kg/m³, &gt; 0
     * @return the layer's mass per length, kg/m (0 for w = 0)
     */
    public static double wrapLayerMassPerLength(double under, double w, double rhoW) {
        double centre = under + w;
        return rhoW * PI * PI * w * centre * helicalFactor(w, centre) / 4.0;
    }

    /**
     * The helical factor of a close-wound layer: the length of one turn, √((π D)² + w²), over
     * the length π D of a turn without pitch (geometry of a close-wound helix).
     *
     * @param w      wrap wire diameter = the helix's advance per turn, m, &ge; 0
     * @param centre diameter D of the turn's centre line, m, &gt; 0
     * @return h = √(1 + (w/(π D))²), &ge; 1 (about 1.0005–1.01 for piano wraps)
     */
    public static double helicalFactor(double w, double centre) {
        double x = w / (PI * centre);
        return Math.sqrt(1.0 + x * x);
    }

    /**
     * Effective mass per length of a wound string whose speaking length has bare core at its
     * ends, for the fundamental: Rayleigh's principle with the fundamental's mode shape
     * sin(πx/L) (hinged ends) weighs the mass by sin², μ_eff = (2/L) ∫₀ᴸ μ(x) sin²(πx/L) dx,
     * which for bare lengths a (front) and b (back) inside the speaking length is
     * μ_eff = μ_w − (μ_w − μ_core) · (2/L) · Σ_{x∈{a,b}} [x/2 − L/(4π) · sin(2πx/L)]
     * (DESIGN §3). Bare core near an end, where the string hardly moves, counts little: 40 mm
     * at each end of a 1.4 m string removes about 0.03 % of the wrap's share, a quarter of
     * the length at each end about 18 %.
     *
     * <p>First order in the mass change: the finite-difference eigen-solution of the
     * non-uniform string ({@code BareEndsEigenTest}) shows how close it is.
     *
     * @param muWound   mass per length of the wound part, kg/m, &gt; 0
     * @param muCore    mass per length of the bare core, kg/m, &gt; 0
     * @param length    speaking length L, m, &gt; 0
     * @param bareFront bare core inside the speaking length at the front end, m, &ge; 0
     * @param bareBack  bare core inside the speaking length at the back end, m, &ge; 0;
     *                  bareFront + bareBack &le; L
     * @return μ_eff, kg/m, between μ_core and μ_w (μ_w when both bare lengths are 0)
     * @throws IllegalArgumentException naming the parameter and its value when one is out of range
     */
    public static double effectiveMassPerLength(double muWound, double muCore, double length,
                                                double bareFront, double bareBack) {
        Checks.positive("wound mass per length", muWound, "g/m", 1e3);
        double weight = bareEndsWeight(muCore, length, bareFront, bareBack, false);
        return muWound - (muWound - muCore) * weight;
    }

    /**
     * The wound part's mass per length that gives a wanted effective one: the inverse of
     * {@link #effectiveMassPerLength}, μ_w = (μ_eff − μ_core · w) / (1 − w) with
     * w = (2/L) · Σ_{x∈{a,b}} [x/2 − L/(4π) · sin(2πx/L)], so that a wound-string designer plans the
     * winding of a string with bare ends to tune where the analysis says it does.
     *
     * @param muEffective the effective mass per length wanted, kg/m, &gt; 0
     * @param muCore      mass per length of the bare core, kg/m, &gt; 0
     * @param length      speaking length L, m, &gt; 0
     * @param bareFront   bare core inside the speaking length at the front end, m, &ge; 0
     * @param bareBack    bare core inside the speaking length at the back end, m, &ge; 0; together &lt; L
     * @return μ_w, kg/m (below μ_core when the wanted μ_eff is lighter than the bare core can give)
     * @throws IllegalArgumentException naming the parameter and its value when one is out of range
     */
    public static double woundMassForEffective(double muEffective, double muCore, double length,
                                               double bareFront, double bareBack) {
        Checks.positive("effective mass per length", muEffective, "g/m", 1e3);
        double weight = bareEndsWeight(muCore, length, bareFront, bareBack, true);
        return (muEffective - muCore * weight) / (1 - weight);
    }

    /**
     * Checks the bare-ends arguments shared by {@link #effectiveMassPerLength} and its inverse.
     *
     * @param someWound true when some winding must remain (front + back &lt; L), else front + back &le; L
     * @return w = (2/L) · Σ_{x∈{a,b}} ∫₀ˣ sin²(π s/L) ds, the share of the fundamental's weight in the bare ends
     */
    private static double bareEndsWeight(double muCore, double length, double bareFront, double bareBack,
                                         boolean someWound) {
        Checks.positive("core mass per length", muCore, "g/m", 1e3);
        Checks.positive("speaking length", length, "mm", 1e3);
        Checks.nonNegative("bare core at the front", bareFront, "mm", 1e3);
        Checks.nonNegative("bare core at the back", bareBack, "mm", 1e3);
        double bare = bareFront + bareBack;
        if (someWound ? bare >= length : bare > length) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "bare core at the front and back together must be %s the speaking length %s mm, was %s mm",
                    someWound ? "<" : "<=", Checks.format(length * 1e3), Checks.format(bare * 1e3)));
        }
        return (2.0 / length) * (sinSquaredIntegral(bareFront, length) + sinSquaredIntegral(bareBack, length));
    }

    /** @return ∫₀ˣ sin²(π s/L) ds = x/2 − L/(4π) sin(2πx/L), m */
    private static double sinSquaredIntegral(double x, double length) {
        return x / 2.0 - length / (4.0 * PI) * Math.sin(2.0 * PI * x / length);
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
