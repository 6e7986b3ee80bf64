package org.scalewright.design.rescale;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.scalewright.model.Checks;
import org.scalewright.model.Materials;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;
import org.scalewright.physics.StringPhysics;

/**
 * The wrap of a wound string from the tension it should have, in closed form (SI throughout).
 *
 * <p>From the stiff-string tension T = 4 L² μ f² − K (DESIGN §3) the mass per length a target
 * tension needs is μ = (T + K)/(4 L² f²), K = π³ E d⁴/(64 L²) of the core. The wrap carries
 * μ − ρ_s π d²/4. Without the helical factor, DESIGN §3's wrap mass
 * ρ_w π² w1 (d + w1)/4 + ρ_w π² w2 (d + 2 w1 + w2)/4 would give w1 (and w2) as the positive root
 * of a quadratic, see {@link WindingRule}. The helical factor h &ge; 1 makes the real wrap a
 * little thinner than that root, so the root bounds the wrap from above and the wrap is solved
 * within [0, root] by Brent's method (Commons Math) on {@link StringPhysics#massPerLength}.
 */
public final class WrapSolver {
    private WrapSolver() {
    }

    /**
     * @param tension   target tension per string, N, &gt; 0
     * @param length    speaking length, m, &gt; 0
     * @param frequency working pitch, Hz, &gt; 0
     * @param stiffness K of the core, N, &ge; 0
     * @return the mass per length the string needs, (T + K)/(4 L² f²), kg/m
     */
    public static double neededMassPerLength(double tension, double length, double frequency, double stiffness) {
        Checks.positive("target tension", tension, "N", 1);
        Checks.positive("speaking length", length, "mm", 1e3);
        Checks.positive("pitch", frequency, "Hz", 1);
        return (tension + stiffness) / (4.0 * length * length * frequency * frequency);
    }

    /**
     * The exact (unrounded) wrap that gives a string the mass per length {@code mu}.
     *
     * @param core  core diameter, m, &gt; 0
     * @param mu    wanted mass per length, kg/m
     * @param rule  single or double, and how a double wrap is split
     * @param metal wrap metal
     * @param m     densities
     * @return the wrap, or empty when the core alone (or the core with the fixed inner wrap) is
     *         already at or above {@code mu}
     */
    public static Optional<Wrap> exact(double core, double mu, WindingRule rule, WrapMetal metal, Materials m) {
        Checks.positive("core diameter", core, "mm", 1e3);
        double rhoW = m.densityOf(metal);
        double coreMass = StringPhysics.plainMassPerLength(core, m.steelDensity());
        double wrapMass = mu - coreMass;
        if (!(wrapMass > 0)) {
            return Optional.empty();
        }
        double c = 4.0 * wrapMass / (rhoW * Math.PI * Math.PI);
        return switch (rule.kind()) {
            case SINGLE -> {
                double w1 = solve(w -> coreMass + StringPhysics.wrapLayerMassPerLength(core, w, rhoW), mu,
                        positiveRoot(core, c));
                yield Optional.of(Wrap.single(w1, metal));
            }
            case OUTER_RATIO -> {
                double r = rule.value();
                double u = positiveRoot(core, c);
                double w1 = solve(w -> coreMass + StringPhysics.wrapLayerMassPerLength(core, w, rhoW)
                        + StringPhysics.wrapLayerMassPerLength(core + 2 * w, r * w, rhoW), mu, u / (1.0 + r));
                yield Optional.of(new Wrap(w1, r * w1, metal));
            }
            case FIXED_INNER -> {
                double w1 = rule.value();
                Optional<Double> w2 = outerFor(core, w1, mu, metal, m);
                yield w2.map(v -> new Wrap(w1, v, metal));
            }
        };
    }

    /**
     * @return the outer wrap that, over core {@code core} and inner wrap {@code inner}, gives the
     *         mass per length {@code mu}; empty when core and inner wrap already reach it
     */
    public static Optional<Double> outerFor(double core, double inner, double mu, WrapMetal metal, Materials m) {
        double rhoW = m.densityOf(metal);
        double coreAndInner = StringPhysics.massPerLength(core, Wrap.single(inner, metal), m);
        double left = mu - coreAndInner;
        if (!(left > 0)) {
            return Optional.empty();
        }
        double c = 4.0 * left / (rhoW * Math.PI * Math.PI);
        double upper = positiveRoot(core + 2 * inner, c);
        return Optional.of(solve(w -> coreAndInner + StringPhysics.wrapLayerMassPerLength(core + 2 * inner, w, rhoW),
                mu, upper));
    }

    /**
     * @param massOf the string's mass per length as a function of one wrap diameter, increasing
     * @param mu     the mass per length wanted, kg/m
     * @param upper  a wrap diameter at or above the answer (the root without the helical factor), m
     * @return the wrap diameter in [0, upper] at which {@code massOf} gives {@code mu}, m
     */
    private static double solve(DoubleUnaryOperator massOf, double mu, double upper) {
        double hi = upper * (1 + 1e-9);
        if (massOf.applyAsDouble(hi) <= mu) {
            return upper; // within rounding, the pitch-free root is the answer
        }
        UnivariateFunction g = w -> massOf.applyAsDouble(w) - mu;
        return new BrentSolver(1e-15, 1e-17).solve(200, g, 0, hi);
    }

    /** The positive root of x² + b x − c = 0 (b, c &gt; 0), in a form without cancellation. */
    static double positiveRoot(double b, double c) {
        return 2.0 * c / (b + Math.sqrt(b * b + 4.0 * c));
    }

    /**
     * The wraps from the list nearest the exact one, for choosing the one that comes closest to
     * the target: for a single wrap the listed wires either side of w1; for a double wrap each
     * listed w1 either side of the exact one, with w2 re-solved for the mass left and taken
     * from the list either side of that (so the split is the rule's only approximately).
     *
     * @param exact the exact wrap
     * @param core  core diameter, m
     * @param mu    wanted mass per length, kg/m
     * @param wires the wire available
     * @return candidate wraps made of listed wire, possibly none
     */
    public static List<Wrap> roundedCandidates(Wrap exact, double core, double mu, WrapWires wires, Materials m) {
        List<Wrap> out = new ArrayList<>();
        if (!exact.isDouble()) {
            for (double w : wires.around(exact.inner(), exact.metal())) {
                out.add(Wrap.single(w, exact.metal()));
            }
            return out;
        }
        for (double w1 : wires.around(exact.inner(), exact.metal())) {
            Optional<Double> w2 = outerFor(core, w1, mu, exact.metal(), m);
            if (w2.isEmpty()) {
                continue;
            }
            for (double v : wires.around(w2.get(), exact.metal())) {
                out.add(new Wrap(w1, v, exact.metal()));
            }
        }
        return out;
    }
}
