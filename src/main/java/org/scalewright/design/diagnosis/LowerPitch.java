package org.scalewright.design.diagnosis;

import java.util.Locale;
import org.scalewright.physics.Pitch;

/**
 * Tune the whole piano to a lower pitch standard.
 *
 * @param presentA4   the present pitch standard, Hz
 * @param newA4       the pitch standard that brings the range under the caution band, Hz
 * @param maxPctAfter the highest percent of breaking strength in the range at {@code newA4}, %
 * @param fixes       true when that is under the caution band
 */
public record LowerPitch(double presentA4, double newA4, double maxPctAfter, boolean fixes) implements Remedy {

    /** @return how many Hz lower A4 goes */
    public double lowerByHz() {
        return presentA4 - newA4;
    }

    /** @return how many cents lower the whole piano goes */
    public double lowerByCents() {
        return Pitch.cents(newA4, presentA4);
    }

    @Override
    public String describe() {
        return String.format(Locale.ROOT, "A lower pitch standard: A4 = %.1f Hz instead of %.1f Hz (%.1f Hz, "
                        + "%.0f cents lower) brings the highest note of the range to %.1f %% of breaking strength.",
                newA4, presentA4, lowerByHz(), lowerByCents(), maxPctAfter);
    }
}
