package org.scalewright.physics;

import org.scalewright.model.Materials;

/**
 * Everything besides the scale that an analysis depends on.
 *
 * @param materials        densities and Young's modulus
 * @param strength         the breaking-strength table of the wire
 * @param bands            percent-of-breaking-strength bands
 * @param neighbourStepPct a per-string tension differing from the next key's by more than
 *                         this percent is flagged (default 8 %, common practice, no source), %
 * @param plausible        limits for the implausible-value flag
 */
public record AnalysisSettings(Materials materials, StrengthTable strength, StressBands bands,
                               double neighbourStepPct, PlausibleRange plausible) {
    /** Default neighbour step flag: 8 % (common practice, no source). */
    public static final double DEFAULT_NEIGHBOUR_STEP_PCT = 8.0;

    public AnalysisSettings {
        if (materials == null || strength == null) {
            throw new IllegalArgumentException("analysis needs materials and a strength table");
        }
        if (bands == null) {
            bands = StressBands.DEFAULT;
        }
        if (plausible == null) {
            plausible = PlausibleRange.DEFAULT;
        }
        if (!(neighbourStepPct > 0)) {
            throw new IllegalArgumentException("neighbour step must be > 0 %, was " + neighbourStepPct);
        }
    }

    /** @return settings with the default bands, neighbour step and plausible ranges */
    public static AnalysisSettings of(Materials materials, StrengthTable strength) {
        return new AnalysisSettings(materials, strength, StressBands.DEFAULT, DEFAULT_NEIGHBOUR_STEP_PCT,
                PlausibleRange.DEFAULT);
    }

    public AnalysisSettings withStrength(StrengthTable table) {
        return new AnalysisSettings(materials, table, bands, neighbourStepPct, plausible);
    }

    public AnalysisSettings withBands(StressBands newBands) {
        return new AnalysisSettings(materials, strength, newBands, neighbourStepPct, plausible);
    }

    public AnalysisSettings withNeighbourStep(double pct) {
        return new AnalysisSettings(materials, strength, bands, pct, plausible);
    }
}
