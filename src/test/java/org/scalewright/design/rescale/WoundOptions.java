package org.scalewright.design.rescale;

import java.util.List;
import java.util.OptionalDouble;

/** Test settings of the wound-string designer: its defaults with the few a test changes. */
final class WoundOptions {
    private TargetQuantity quantity = TargetQuantity.TENSION;
    private WrapWires wraps = WrapWires.steps(WrapWires.DEFAULT_STEP);
    private OptionalDouble doubleAbove = OptionalDouble.empty();
    private List<Double> cores = List.of();
    private final double maxBreakPct;
    private double stepCost = WoundPlanOptions.DEFAULT_STEP_COST;
    private int joinBreakKeys;

    private WoundOptions(double maxBreakPct) {
        this.maxBreakPct = maxBreakPct;
    }

    /** @param maxBreakPct the maximum percent of breaking strength @return the defaults */
    static WoundOptions max(double maxBreakPct) {
        return new WoundOptions(maxBreakPct);
    }

    WoundOptions wraps(WrapWires w) {
        wraps = w;
        return this;
    }

    WoundOptions stepCost(double cost) {
        stepCost = cost;
        return this;
    }

    WoundOptions doubleAbove(double metres) {
        doubleAbove = OptionalDouble.of(metres);
        return this;
    }

    WoundOptions quantity(TargetQuantity q) {
        quantity = q;
        return this;
    }

    WoundOptions cores(List<Double> c) {
        cores = c;
        return this;
    }

    WoundOptions joinBreak(int keys) {
        joinBreakKeys = keys;
        return this;
    }

    /** @return the settings, checked by the record */
    WoundPlanOptions options() {
        return new WoundPlanOptions(quantity, wraps, doubleAbove, WoundPlanOptions.DEFAULT_DOUBLE_RATIO, cores,
                maxBreakPct, WoundPlanOptions.DEFAULT_CHANGE_COST, stepCost, joinBreakKeys);
    }
}
