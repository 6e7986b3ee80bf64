package org.scalewright.design.wirecheck;

import java.util.List;

/**
 * One pass of a pitch raise in stages: every note is raised by the same fraction of how far flat
 * it stands, tuned sharp by the overpull percent of that step, and left at the step's end. Every
 * note's percent of breaking strength at the pass's peak is worked out; the highest of them all
 * and every note at or over the danger band are kept.
 *
 * @param number        1 for the first pass
 * @param endFraction   fraction of the whole raise done after this pass, (0, 1]
 * @param totalAtStart  total tension on the plate before the pass, N
 * @param totalAtPeak   total tension with every note at this pass's peak, N
 * @param maxPeakPct    highest percent of breaking strength of any note at this pass's peak, %
 *                      (notes already in the danger band at the target included)
 * @param maxPeakKey    the key where that happens
 * @param inDanger      every note at or over the danger band at this pass's peak, from bass to
 *                      treble, with its percent
 */
public record RaiseStage(int number, double endFraction, double totalAtStart, double totalAtPeak,
                         double maxPeakPct, int maxPeakKey, List<Over> inDanger) {

    public RaiseStage {
        inDanger = List.copyOf(inDanger);
    }

    /** @return the change of total tension over the pass, start to peak, N */
    public double change() {
        return totalAtPeak - totalAtStart;
    }

    /**
     * A note at or over the danger band at a pass's peak.
     *
     * @param key key number
     * @param pct its percent of breaking strength at the peak, %
     */
    public record Over(int key, double pct) {
    }
}
