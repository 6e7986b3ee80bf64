package org.scalewright.design.rescale;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.scalewright.model.CoreWire;
import org.scalewright.model.WireSize;
import org.scalewright.model.WireSizeTable;

/**
 * Settings of the plain-wire planner.
 *
 * @param sizes       the plain wire available, at least one; sorted thickest first here, each
 *                    diameter once
 * @param maxBreakPct every planned string must stay at or under this percent of breaking
 *                    strength, in (0, 100] %
 * @param changeCost  cost of each change of wire size between neighbouring keys, &ge; 0, in
 *                    units of the squared relative deviation from the target (0.002 costs as
 *                    much as one key 4.5 % off the target)
 * @param stepCost    cost per unit fraction by which a neighbour step in per-string tension
 *                    exceeds the neighbour-step limit, &ge; 0 (1: a step 1 % over the limit
 *                    weighs as much as one key 10 % off the target; 0: steps only reported)
 */
public record PlainPlanOptions(List<CoreWire> sizes, double maxBreakPct, double changeCost, double stepCost) {
    /** Default cost per change of size. */
    public static final double DEFAULT_CHANGE_COST = 0.002;
    /** Default cost of neighbour steps beyond the limit. */
    public static final double DEFAULT_STEP_COST = 1.0;

    /**
     * @throws org.scalewright.model.InvalidInput when a setting is out of its range or a
     *         diameter is listed twice (the message names the setting, the range and the value)
     */
    public PlainPlanOptions {
        if (sizes == null || sizes.isEmpty()) {
            throw new org.scalewright.model.InvalidInput(WireLists.PLAIN + " is empty: the plain-wire planner needs "
                    + "at least one wire size");
        }
        PlanChecks.maxBreakPct(maxBreakPct);
        PlanChecks.changeCost(changeCost);
        PlanChecks.stepCost(stepCost);
        WireLists.distinct(WireLists.PLAIN, sizes.stream().map(CoreWire::diameter).toList());
        List<CoreWire> sorted = new ArrayList<>(sizes);
        sorted.sort(Comparator.comparingDouble(CoreWire::diameter).reversed());
        sizes = List.copyOf(sorted);
    }

    /** @return options with the default change and step costs */
    public static PlainPlanOptions of(List<CoreWire> sizes, double maxBreakPct) {
        return new PlainPlanOptions(sizes, maxBreakPct, DEFAULT_CHANGE_COST, DEFAULT_STEP_COST);
    }

    /** @return every size of a music-wire size table as wires that keep their size number */
    public static List<CoreWire> sizesOf(WireSizeTable table) {
        List<CoreWire> list = new ArrayList<>();
        for (WireSize s : table.sizes()) {
            list.add(CoreWire.ofSize(s.size(), s.diameter()));
        }
        return list;
    }

    /** @return wires given by diameter, m */
    public static List<CoreWire> diameters(List<Double> metres) {
        return metres.stream().map(CoreWire::ofDiameter).toList();
    }

    public PlainPlanOptions withChangeCost(double cost) {
        return new PlainPlanOptions(sizes, maxBreakPct, cost, stepCost);
    }

    public PlainPlanOptions withStepCost(double cost) {
        return new PlainPlanOptions(sizes, maxBreakPct, changeCost, cost);
    }
}
