package org.scalewright.model;

import java.util.Locale;

/**
 * Precondition checks shared by the engine. Each failure throws an
 * {@link IllegalArgumentException} whose message names the quantity, the rule and the value
 * in the unit a user would recognise, e.g. {@code speaking length must be > 0 mm, was -51}.
 */
public final class Checks {
    private Checks() {
    }

    /**
     * @param name     what the value is, in words
     * @param value    the SI value
     * @param unit     the unit to show in the message
     * @param perUnit  the factor from the SI value to the shown unit (e.g. 1000 for m → mm)
     * @return the value when it is finite and &gt; 0
     */
    public static double positive(String name, double value, String unit, double perUnit) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "%s must be > 0 %s, was %s",
                    name, unit, format(value * perUnit)));
        }
        return value;
    }

    /** @return the value when it is finite and &ge; 0 */
    public static double nonNegative(String name, double value, String unit, double perUnit) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "%s must be >= 0 %s, was %s",
                    name, unit, format(value * perUnit)));
        }
        return value;
    }

    /** @return the value when it is finite */
    public static double finite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be a finite number, was " + value);
        }
        return value;
    }

    /** @return {@code v} as a message shows it: whole numbers without decimals, else six significant digits */
    public static String format(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return String.format(Locale.ROOT, "%.6g", v).replaceAll("\\.?0+$", "");
    }
}
