package org.scalewright.physics;

/**
 * The percent-of-breaking-strength bands a string is judged by. Defaults: below 30 % low,
 * from 60 % caution, from 70 % danger, against the minimum-strength table
 * (common practice, no source; user-settable).
 *
 * @param low     below this percent a string is flagged as low (poor tone, weak sustain), %
 * @param caution from this percent a string is in the caution band, %
 * @param danger  from this percent a string is in the danger band, %
 */
public record StressBands(double low, double caution, double danger) {
    /** The defaults 30 / 60 / 70 % (common practice, no source). */
    public static final StressBands DEFAULT = new StressBands(30, 60, 70);

    public StressBands {
        if (!(low >= 0 && low < caution && caution < danger && danger <= 200)) {
            throw new IllegalArgumentException("stress bands must rise 0 <= low < caution < danger <= 200 %, were "
                    + low + " / " + caution + " / " + danger);
        }
    }

    /** @return the band of a percent of breaking strength */
    public StressBand bandOf(double breakPct) {
        if (breakPct >= danger) {
            return StressBand.DANGER;
        }
        if (breakPct >= caution) {
            return StressBand.CAUTION;
        }
        if (breakPct < low) {
            return StressBand.LOW;
        }
        return StressBand.NORMAL;
    }
}
