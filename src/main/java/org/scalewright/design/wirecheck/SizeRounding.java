package org.scalewright.design.wirecheck;

import java.util.Locale;

/** Which neighbour a wire diameter is converted to in the other size system. */
public enum SizeRounding {
    /** the closest diameter (on an exact tie, the larger one) */
    NEAREST,
    /** the next larger diameter, or the same one where it exists */
    UP,
    /** the next smaller diameter, or the same one where it exists */
    DOWN;

    /** @return the word used on the command line: {@code nearest}, {@code up} or {@code down} */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /**
     * @param text {@code nearest}, {@code up} or {@code down} (any case)
     * @throws IllegalArgumentException naming the text when it is none of these
     */
    public static SizeRounding parse(String text) {
        for (SizeRounding r : values()) {
            if (r.word().equalsIgnoreCase(text == null ? "" : text.strip())) {
                return r;
            }
        }
        throw new org.scalewright.model.InvalidInput("size rounding must be nearest, up or down, was '" + text + "'");
    }
}
