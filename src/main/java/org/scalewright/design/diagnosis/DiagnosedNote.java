package org.scalewright.design.diagnosis;

import java.util.OptionalDouble;
import org.scalewright.physics.NoteResult;

/**
 * One note of a diagnosed range.
 *
 * @param result             the note at its working pitch (stress, % of breaking strength,
 *                           headroom, breaking frequency…)
 * @param speakingLength     its speaking length, m
 * @param trendPct           the section's trend of percent of breaking strength at this key, %
 * @param trendDeviationPct  100 · (pct − trend) / trend, %
 * @param standsOut          true when |trendDeviationPct| exceeds the stand-out margin
 * @param trendLength        the section's trend of speaking length at this key, m
 * @param share              how length, pitch, mass per area and strength each raise the stress
 *                           ratio above (positive) or below the trend
 * @param lengthForTrend     the speaking length that would put this note on the trend, m (notes
 *                           standing out high only)
 * @param lengthNeeded       the speaking length that would put this note under the caution band,
 *                           m (notes at or above the aim just under the caution band only)
 */
public record DiagnosedNote(NoteResult result, double speakingLength, double trendPct, double trendDeviationPct,
                            boolean standsOut, double trendLength, Shares share, OptionalDouble lengthForTrend,
                            OptionalDouble lengthNeeded) {

    /**
     * How far each factor of percent of breaking strength, 4 L² f² (μ/A) / σ_b, lies from its
     * section trend, each as the percent it raises the note above the trend (negative: lowers).
     *
     * @param lengthPct   from the speaking length (L²), %
     * @param pitchPct    from the pitch (f²), %
     * @param massPct     from the mass per area of the core (μ/A: the wrap's load on the core; 0
     *                    for plain wire), %
     * @param strengthPct from the wire's strength (1/σ_b: weaker wire raises it), %
     */
    public record Shares(double lengthPct, double pitchPct, double massPct, double strengthPct) {
        /** @return the share of length and pitch together, % */
        public double lengthAndPitchPct() {
            return 100.0 * ((1 + lengthPct / 100) * (1 + pitchPct / 100) - 1);
        }

        /** @return the share of the wire (mass per area and strength) together, % */
        public double wirePct() {
            return 100.0 * ((1 + massPct / 100) * (1 + strengthPct / 100) - 1);
        }
    }

    /** @return key number */
    public int key() {
        return result.key();
    }

    /** @return percent of breaking strength, % */
    public double breakPct() {
        return result.breakPct();
    }

    /** @return true when the note stands out above the trend */
    public boolean standsOutHigh() {
        return standsOut && trendDeviationPct > 0;
    }
}
