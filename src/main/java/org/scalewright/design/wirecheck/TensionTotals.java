package org.scalewright.design.wirecheck;

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
}
