package org.scalewright.design.rescale;

import java.util.List;
import java.util.OptionalDouble;

/**
 * Settings of the wound-string designer.
 *
 * @param quantity      what the target gives: per-string tension (N) or core percent of breaking strength (%)
 * @param wraps         the wrap wire available
 * @param doubleAbove   when given (m, &gt; 0): a string whose single wrap would be thicker than
 *                      this is double-wound, every other string single-wound; when empty each
 *                      string keeps its present winding (single or double, and a double wrap
 *                      its present outer/inner ratio)
 * @param doubleRatio   outer/inner ratio for strings that become double-wound under
 *                      {@code doubleAbove} and are single-wound now, &gt; 0 (a present double
 *                      wrap keeps its own ratio)
 * @param cores         core diameters to choose from, m; empty: keep every core (except near a
 *                      break that is joined)
 * @param maxBreakPct   every planned core must stay at or under this percent of breaking strength, %
 * @param changeCost    cost of each change of core between neighbouring keys when cores are
 *                      chosen, in squared log-B units, &ge; 0
 * @param stepCost      cost per unit fraction by which a neighbour step in per-string tension
 *                      exceeds the neighbour-step limit, &ge; 0 (see {@link PlainPlanOptions#stepCost()})
 * @param joinBreakKeys 0: no join; n &gt; 0: join the break — the tension target runs on
 *                      continuously through each change of section among the planned keys and
 *                      the cores of the n keys either side are chosen so that B runs on as
 *                      smoothly as the core list allows
 */
public record WoundPlanOptions(TargetQuantity quantity, WrapWires wraps, OptionalDouble doubleAbove,
                               double doubleRatio, List<Double> cores, double maxBreakPct, double changeCost,
                               double stepCost, int joinBreakKeys) {
    /** Default outer/inner ratio of a string made double-wound: 1 (equal wraps; a plain choice, no source). */
    public static final double DEFAULT_DOUBLE_RATIO = 1.0;
    /** Default cost of a change of core, squared log-B units. */
    public static final double DEFAULT_CHANGE_COST = 0.002;
    /** Default cost of neighbour steps beyond the limit. */
    public static final double DEFAULT_STEP_COST = 1.0;
    /**
     * Step of the core diameters tried when joining a break without a core list: 0.025 mm, the
     * step of metric piano wire (common practice, no source).
     */
    public static final double JOIN_CORE_STEP = 0.025e-3;

    /**
     * @throws org.scalewright.model.InvalidInput when a setting is out of its range (the message
     *         names the setting, the range and the value); the checks shared with the plain-wire
     *         planner are those of {@link PlanChecks}
     */
    public WoundPlanOptions {
        if (quantity == null || wraps == null) {
            throw new IllegalArgumentException("the wound-string designer needs a target quantity and wrap wire");
        }
        doubleAbove = doubleAbove == null ? OptionalDouble.empty() : doubleAbove;
        doubleAbove.ifPresent(PlanChecks::doubleAbove);
        PlanChecks.doubleRatio(doubleRatio);
        cores = cores == null ? List.of() : List.copyOf(cores);
        if (!cores.isEmpty()) {
            checkCores(cores);
        }
        PlanChecks.maxBreakPct(maxBreakPct);
        PlanChecks.changeCost(changeCost);
        PlanChecks.stepCost(stepCost);
        PlanChecks.joinBreakKeys(joinBreakKeys);
    }

    private static void checkCores(List<Double> cores) {
        for (double c : cores) {
            if (!(c > 0) || Double.isInfinite(c)) {
                throw new org.scalewright.model.InvalidInput(WireLists.CORES + ": a diameter must be more than 0, was "
                        + PlanChecks.trim(c * 1e3) + " mm");
            }
        }
        WireLists.distinct(WireLists.CORES, cores);
    }

    /** @return tension target, wrap wire in 0.05 mm steps, present winding and cores kept, no join */
    public static WoundPlanOptions defaults(double maxBreakPct) {
        return new WoundPlanOptions(TargetQuantity.TENSION, WrapWires.steps(WrapWires.DEFAULT_STEP),
                OptionalDouble.empty(), DEFAULT_DOUBLE_RATIO, List.of(), maxBreakPct, DEFAULT_CHANGE_COST,
                DEFAULT_STEP_COST, 0);
    }
}
