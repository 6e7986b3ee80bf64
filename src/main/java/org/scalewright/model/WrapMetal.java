package org.scalewright.model;

import java.util.Locale;

/** The metal of a wound string's wrap wire. */
public enum WrapMetal {
    COPPER, IRON, STEEL;

    /** @return the lower-case name used in scale sheets ({@code copper}, {@code iron}, {@code steel}) */
    public String sheetName() {
        return name().toLowerCase(Locale.ROOT);
    }

    /**
     * @param text a sheet cell such as {@code copper}; case and surrounding blanks ignored
     * @return the metal, or null when the text names none
     */
    public static WrapMetal parse(String text) {
        String t = text.trim().toUpperCase(Locale.ROOT);
        for (WrapMetal m : values()) {
            if (m.name().equals(t)) {
                return m;
            }
        }
        return null;
    }
}
