package org.scalewright.design.rescale;

/**
 * The largest step in per-string tension between neighbouring keys in one part of the planned
 * keys, before and after the proposal. A step is 100 · (T_upper / T_lower − 1), %.
 *
 * @param kind        where the steps were taken
 * @param label       the section label, or "a/b" for the two sections either side of a boundary
 * @param firstKey    the lowest key of the part (for a boundary or edge: the lower key of the pair)
 * @param lastKey     the highest key of the part (for a boundary or edge: the upper key of the pair)
 * @param beforePct   the largest step before (signed; largest by size), %
 * @param beforeKey   the upper key of that step
 * @param afterPct    the largest step after (signed), %
 * @param afterKey    the upper key of that step
 * @param limitPct    the neighbour-step limit the steps are judged by, %
 */
public record StepCheck(Kind kind, String label, int firstKey, int lastKey, double beforePct, int beforeKey,
                        double afterPct, int afterKey, double limitPct) {

    /** Where a step check was taken. */
    public enum Kind {
        /** between neighbouring planned keys inside one section */
        INSIDE_SECTION,
        /** between the last planned key of one section and the first of the next (e.g. the break) */
        ACROSS_BOUNDARY,
        /** between a planned key and the unplanned neighbour just outside the planned keys */
        AT_EDGE
    }

    /** @return true when the largest step after the proposal is within the limit */
    public boolean withinLimit() {
        return Math.abs(afterPct) <= limitPct;
    }
}
