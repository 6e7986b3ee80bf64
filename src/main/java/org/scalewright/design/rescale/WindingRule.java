package org.scalewright.design.rescale;

import java.util.Locale;

/**
 * How the wrap mass of a wound string is laid on: a single wrap, or a double wrap split by a
 * rule. The rules for a double wrap (both close-wound round wire of one metal):
 * <ul>
 *   <li>{@link Kind#OUTER_RATIO}: the outer wrap is {@code value} times the inner one,
 *       w2 = r · w1. With u = (1 + r) · w1 the mass equation of DESIGN §3 becomes
 *       u² + d · u = 4 (μ − μ_core)/(ρ_w π²), one quadratic for u.</li>
 *   <li>{@link Kind#FIXED_INNER}: the inner wrap is fixed at {@code value} metres and the outer
 *       one carries the rest of the mass: w2² + (d + 2 w1) w2 = 4 (μ − μ_core − μ_inner)/(ρ_w π²).</li>
 * </ul>
 * These quadratics leave out the helical factor of DESIGN §3; their roots are the upper bound
 * from which {@link WrapSolver} solves the mass equation with it.
 *
 * @param kind  the rule
 * @param value the outer/inner ratio (OUTER_RATIO, &gt; 0), the inner wrap diameter in m
 *              (FIXED_INNER, &gt; 0), or 0 (SINGLE)
 */
public record WindingRule(Kind kind, double value) {

    /** The kinds of winding. */
    public enum Kind {
        /** one wrap */
        SINGLE,
        /** two wraps, the outer a fixed multiple of the inner */
        OUTER_RATIO,
        /** two wraps, the inner of fixed diameter */
        FIXED_INNER
    }

    public WindingRule {
        if (kind == null) {
            throw new IllegalArgumentException("a winding rule needs a kind");
        }
        if (kind == Kind.SINGLE) {
            value = 0;
        } else if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(kind == Kind.OUTER_RATIO
                    ? "outer/inner wrap ratio must be > 0, was " + value
                    : String.format(Locale.ROOT, "fixed inner wrap must be > 0 mm, was %s", value * 1e3));
        }
    }

    /** @return a single wrap */
    public static WindingRule single() {
        return new WindingRule(Kind.SINGLE, 0);
    }

    /** @param ratio outer wrap diameter / inner wrap diameter, &gt; 0 @return a double wrap split by ratio */
    public static WindingRule outerRatio(double ratio) {
        return new WindingRule(Kind.OUTER_RATIO, ratio);
    }

    /** @param inner the inner wrap diameter, m, &gt; 0 @return a double wrap with fixed inner wrap */
    public static WindingRule fixedInner(double inner) {
        return new WindingRule(Kind.FIXED_INNER, inner);
    }

    /** @return true for a double wrap */
    public boolean isDouble() {
        return kind != Kind.SINGLE;
    }
}
