package org.scalewright.design.rescale;

import java.util.Locale;
import org.scalewright.model.InvalidInput;

/**
 * The one home of the planners' settings checks, shared by {@link PlainPlanOptions} and
 * {@link WoundPlanOptions} where a setting means the same in both. Each check returns the value
 * when it is accepted and otherwise throws {@link InvalidInput} with the one message both front
 * ends show: the quantity, the accepted range and the value given.
 */
public final class PlanChecks {
    /** Most keys re-chosen either side of a break when it is joined (a plain bound, no source). */
    public static final int MAX_JOIN_KEYS = 20;
    /** Coarsest wrap-wire step, m (1 mm). */
    public static final double MAX_WRAP_STEP = 1e-3;

    private PlanChecks() {
    }

    /** @param pct maximum percent of breaking strength, accepted in (0, 100] % @return pct */
    public static double maxBreakPct(double pct) {
        if (!(pct > 0 && pct <= 100)) {
            throw new InvalidInput("maximum percent of breaking strength must be more than 0 and at most 100 %, was "
                    + trim(pct));
        }
        return pct;
    }

    /** @param cost cost per change of wire between neighbours, accepted finite and &ge; 0 @return cost */
    public static double changeCost(double cost) {
        return notNegative("change cost", cost);
    }

    /** @param cost cost of neighbour steps beyond the limit, accepted finite and &ge; 0 @return cost */
    public static double stepCost(double cost) {
        return notNegative("step cost", cost);
    }

    /** @param metres double-winding threshold, m, accepted finite and &gt; 0 @return metres */
    public static double doubleAbove(double metres) {
        if (!(metres > 0) || Double.isInfinite(metres)) {
            throw new InvalidInput("double-winding threshold must be more than 0 mm, was " + trim(metres * 1e3) + " mm");
        }
        return metres;
    }

    /** @param ratio outer/inner wrap ratio, accepted finite and &gt; 0 @return ratio */
    public static double doubleRatio(double ratio) {
        if (!(ratio > 0) || Double.isInfinite(ratio)) {
            throw new InvalidInput("outer/inner wrap ratio must be more than 0, was " + trim(ratio));
        }
        return ratio;
    }

    /** @param keys keys re-chosen either side of a joined break, accepted 0 (off) to {@value #MAX_JOIN_KEYS} @return keys */
    public static int joinBreakKeys(int keys) {
        if (keys < 0 || keys > MAX_JOIN_KEYS) {
            throw new InvalidInput("keys joined either side of a break must be 0 (off) to " + MAX_JOIN_KEYS + ", was "
                    + keys);
        }
        return keys;
    }

    /** @param metres wrap-wire step, m, accepted in (0, 1 mm] @return metres */
    public static double wrapStep(double metres) {
        if (!(metres > 0 && metres <= MAX_WRAP_STEP)) {
            throw new InvalidInput("wrap wire step must be more than 0 and at most 1 mm, was " + trim(metres * 1e3)
                    + " mm");
        }
        return metres;
    }

    private static double notNegative(String what, double v) {
        if (!(v >= 0) || Double.isInfinite(v)) {
            throw new InvalidInput(what + " must be 0 or more, was " + trim(v));
        }
        return v;
    }

    /** @return {@code 2}, {@code 0.05}: the value without float noise */
    static String trim(double v) {
        if (v == Math.rint(v) && !Double.isInfinite(v)) {
            return Long.toString((long) v);
        }
        String s = String.format(Locale.ROOT, "%.6f", v).replaceAll("0+$", "");
        return Double.isNaN(v) || Double.isInfinite(v) ? Double.toString(v) : s;
    }
}
