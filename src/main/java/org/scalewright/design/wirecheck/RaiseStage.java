package org.scalewright.design.wirecheck;

/**
 * One pass of a pitch raise in stages: every note is raised by the same fraction of how far flat
 * it stands, tuned sharp by the overpull percent of that step, and left at the step's end.
 *
 * @param number        1 for the first pass
 * @param endFraction   fraction of the whole raise done after this pass, (0, 1]
 * @param totalAtStart  total tension on the plate before the pass, N
 * @param totalAtPeak   total tension with every note at this pass's peak, N
 * @param maxPeakPct    highest percent of breaking strength at this pass's peak, %
 * @param maxPeakKey    the key where that happens
 */
public record RaiseStage(int number, double endFraction, double totalAtStart, double totalAtPeak,
                         double maxPeakPct, int maxPeakKey) {

    /** @return the change of total tension over the pass, start to peak, N */
    public double change() {
        return totalAtPeak - totalAtStart;
    }
}
