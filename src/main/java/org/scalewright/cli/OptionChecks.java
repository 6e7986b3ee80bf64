package org.scalewright.cli;

import org.scalewright.physics.AnalysisSettings;

/** Checks of option values shared by the commands; a bad value is a {@link UserError} naming the option. */
final class OptionChecks {
    private OptionChecks() {
    }

    /** @return {@code value} when it is finite and &ge; 0 */
    static double nonNegative(String option, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new UserError(option + " must be >= 0, was " + Formats.trim(value));
        }
        return value;
    }

    /** @return {@code value} when it is finite and &gt; 0 */
    static double positive(String option, double value, String unit) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new UserError(option + " must be > 0" + unit + ", was " + Formats.trim(value));
        }
        return value;
    }

    /**
     * @param maxBreak the {@code --max-break} option, or null for the danger band
     * @return the maximum percent of breaking strength, in (0, 100]
     */
    static double maxBreak(Double maxBreak, AnalysisSettings settings) {
        double max = maxBreak == null ? settings.bands().danger() : maxBreak;
        if (!(max > 0 && max <= 100)) {
            throw new UserError("--max-break must be a percent > 0 and <= 100, was " + Formats.trim(max));
        }
        return max;
    }
}
