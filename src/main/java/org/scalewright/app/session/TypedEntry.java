package org.scalewright.app.session;

import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.scalewright.model.InvalidInput;

/**
 * The one reader of what a user types into a number field of the window: a number, written with
 * a decimal point or a decimal comma ({@code 442,5}), optionally followed by its unit
 * ({@code 442 Hz}, {@code 25 %}). Sheet files keep their own, stricter rules (io); only typed
 * entries take a decimal comma.
 */
public final class TypedEntry {
    /** A plain decimal, sign and exponent allowed, with a point or a comma; no hex, no NaN. */
    private static final Pattern NUMBER = Pattern.compile("[+-]?(\\d+([.,]\\d*)?|[.,]\\d+)([eE][+-]?\\d+)?");

    private TypedEntry() {
    }

    /**
     * Reads a number typed into a field.
     *
     * @param text what was typed (null reads as empty)
     * @param what the field's name, for the message ({@code overpull})
     * @param unit the field's unit, which may follow the number ({@code Hz}, {@code %}, {@code c}
     *             for cents); "" for a number without unit
     * @return the number, finite
     * @throws InvalidInput naming the field, what it takes and the text:
     *                      {@code overpull: expected a number in %, was 'lots'}
     */
    public static double parse(String text, String what, String unit) {
        String t = text == null ? "" : text.strip();
        if (!unit.isEmpty() && t.toLowerCase(Locale.ROOT).endsWith(unit.toLowerCase(Locale.ROOT))) {
            t = t.substring(0, t.length() - unit.length()).strip();
        }
        Matcher m = NUMBER.matcher(t);
        if (m.matches()) {
            double v = Double.parseDouble(t.replace(',', '.'));
            if (Double.isFinite(v)) {
                return v;
            }
        }
        throw new InvalidInput(what + ": expected a number" + unitWords(unit) + ", was '"
                + (text == null ? "" : text.strip()) + "'");
    }

    /**
     * Reads a number typed into a field that may be left blank.
     *
     * @return empty when nothing (or only blanks) was typed, else the number as {@link #parse} reads it
     * @throws InvalidInput as {@link #parse} does
     */
    public static OptionalDouble optional(String text, String what, String unit) {
        return text == null || text.isBlank() ? OptionalDouble.empty() : OptionalDouble.of(parse(text, what, unit));
    }

    /** @return the number in {@code text} (see {@link #parse}), or null with the problem added to {@code bad} */
    public static Double number(String text, String what, String unit, List<String> bad) {
        try {
            return parse(text, what, unit);
        } catch (InvalidInput e) {
            bad.add(e.getMessage());
            return null;
        }
    }

    private static String unitWords(String unit) {
        return switch (unit) {
            case "" -> "";
            case "c" -> " of cents";
            default -> " in " + unit;
        };
    }
}
