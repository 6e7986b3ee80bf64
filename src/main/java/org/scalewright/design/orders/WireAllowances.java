package org.scalewright.design.orders;

import org.scalewright.model.Checks;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.NumberText;

/**
 * How much plain wire to allow per string beyond what the scale sheet gives.
 *
 * <p>Each string needs its stretched length (hitch pin to tuning pin) plus the wire coiled on
 * the tuning pin and turned round the hitch pin: {@code pinAllowance}. Where the sheet gives only
 * the speaking length, the front and back lengths are estimated as {@code lengthAllowance}.
 *
 * <p>Pieces: on bichords and trichords two adjacent strings of the same note (same wire size)
 * are usually one piece of wire looped round a hitch pin, so a bichord is one piece and a
 * trichord one looped piece and one single string (common practice, no source). With
 * {@code looped} false every string is counted as its own piece (single-tied strings). The
 * length to buy is the same either way: each string's length plus its allowance.
 *
 * @param pinAllowance    wire per string for the tuning-pin coil and the hitch, m, &ge; 0;
 *                        default 150 mm (common practice, no source: about three turns on a
 *                        7 mm pin, the end in the pin and the turn or eye at the hitch, with a
 *                        margin for handling)
 * @param lengthAllowance front and back length added to the speaking length where the sheet
 *                        gives no stretched length, m, &ge; 0; default 150 mm (common practice,
 *                        no source)
 * @param looped          true to count pairs of adjacent strings of a note as one looped piece
 */
public record WireAllowances(double pinAllowance, double lengthAllowance, boolean looped) {
    /** 150 mm for the coil and hitch, 150 mm front and back length, looped pairs. */
    public static final WireAllowances DEFAULT = new WireAllowances(0.150, 0.150, true);

    public WireAllowances {
        Checks.nonNegative("tuning-pin and hitch allowance", pinAllowance, "mm", 1e3);
        Checks.nonNegative("front and back length allowance", lengthAllowance, "mm", 1e3);
        if (pinAllowance > 2 || lengthAllowance > 5) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "allowances must be at most 2000 mm (pin) and 5000 mm (length), were %.0f mm and %.0f mm",
                    pinAllowance * 1e3, lengthAllowance * 1e3));
        }
    }

    /** The largest tuning-pin and hitch allowance accepted, mm. */
    public static final double MAX_PIN_ALLOWANCE_MM = 2000;
    /** The largest front and back length allowance accepted, mm. */
    public static final double MAX_LENGTH_ALLOWANCE_MM = 5000;

    /**
     * Checks a tuning-pin and hitch allowance a user gave.
     *
     * @param mm the allowance, mm
     * @return the allowance in metres
     * @throws InvalidInput when it is not a number from 0 to {@value #MAX_PIN_ALLOWANCE_MM} mm
     */
    public static double pinAllowanceOf(double mm) {
        return userAllowance("tuning-pin and hitch allowance", mm, MAX_PIN_ALLOWANCE_MM);
    }

    /**
     * Checks a front and back length allowance a user gave.
     *
     * @param mm the allowance, mm
     * @return the allowance in metres
     * @throws InvalidInput when it is not a number from 0 to {@value #MAX_LENGTH_ALLOWANCE_MM} mm
     */
    public static double lengthAllowanceOf(double mm) {
        return userAllowance("front and back length allowance", mm, MAX_LENGTH_ALLOWANCE_MM);
    }

    private static double userAllowance(String what, double mm, double max) {
        if (!(mm >= 0 && mm <= max)) {
            throw new InvalidInput(what + " must be 0 to " + NumberText.plain(max) + " mm, was "
                    + NumberText.plain(mm));
        }
        return mm / 1e3;
    }
}
