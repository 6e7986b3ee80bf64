package org.scalewright.design.wirecheck;

import java.util.List;
import java.util.Locale;
import org.scalewright.model.UnitConversions;

/**
 * Total tension on the plate (sum over the notes of strings × tension per string), N.
 *
 * @param present        present wire at the present (flat) pitch
 * @param beforeAtTarget present wire at the target pitch
 * @param afterAtTarget  replacement wire at the target pitch
 * @param peak           replacement wire with every note at its overpull peak
 */
public record TensionTotals(double present, double beforeAtTarget, double afterAtTarget, double peak) {

    /** @return change from the present state to the replacement at the target pitch, N */
    public double changeToTarget() {
        return afterAtTarget - present;
    }

    /** @return change from the present state to the overpull peak, N */
    public double changeToPeak() {
        return peak - present;
    }

    /** @return {@link #changeToTarget()} as a percent of the present total, % */
    public double changeToTargetPct() {
        return 100.0 * changeToTarget() / present;
    }

    /** @return {@link #changeToPeak()} as a percent of the present total, % */
    public double changeToPeakPct() {
        return 100.0 * changeToPeak() / present;
    }

    /** @return the four states, present first, each with its change from the present state */
    public List<State> states() {
        return List.of(new State("present (present wire, present pitch)", present, Double.NaN, Double.NaN),
                new State("present wire at target", beforeAtTarget, beforeAtTarget - present,
                        100.0 * (beforeAtTarget - present) / present),
                new State("replacement at target", afterAtTarget, changeToTarget(), changeToTargetPct()),
                new State("replacement at the overpull peak", peak, changeToPeak(), changeToPeakPct()));
    }

    /**
     * One state of the plate: its name and total, and the change from the present state.
     *
     * @param name      the state in words
     * @param total     total tension, N
     * @param change    change from the present state, N (NaN for the present state itself)
     * @param changePct that change in percent of the present total, % (NaN for the present state)
     */
    public record State(String name, double total, double change, double changePct) {
        /** @return {@code replacement at target: 181.2 kN (40,735 lbf), +9.1 kN (+2,046 lbf, +5.3 %)} */
        public String words() {
            String s = String.format(Locale.ROOT, "%s: %.1f kN (%,.0f lbf)", name, total / 1e3,
                    UnitConversions.newtonsToLbf(total));
            if (Double.isFinite(change)) {
                s += String.format(Locale.ROOT, ", %+.1f kN (%+,.0f lbf, %+.1f %%)", change / 1e3,
                        UnitConversions.newtonsToLbf(change), changePct);
            }
            return s;
        }
    }
}
