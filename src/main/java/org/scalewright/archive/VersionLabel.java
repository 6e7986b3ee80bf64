package org.scalewright.archive;

import java.util.Locale;

/**
 * The label of a scale version: one of the usual three (as measured, planned, as strung) or any
 * short text of the user's.
 */
public final class VersionLabel {
    public static final String AS_MEASURED = "as measured";
    public static final String PLANNED = "planned";
    public static final String AS_STRUNG = "as strung";
    /** The longest label accepted, characters. */
    public static final int LONGEST = 80;

    private VersionLabel() {
    }

    /**
     * @param text {@code as-measured}, {@code planned}, {@code as-strung} (with a blank or a hyphen,
     *             any case) or a free label
     * @return the label as stored: the usual three written with a blank, a free label as typed
     * @throws ArchiveRefused when the label is blank or longer than {@link #LONGEST}
     */
    public static String of(String text) {
        String t = text == null ? "" : text.strip();
        if (t.isEmpty() || t.length() > LONGEST) {
            throw new ArchiveRefused("a version's label must be 1 to " + LONGEST + " characters, was '" + t + "'");
        }
        String word = t.toLowerCase(Locale.ROOT).replace('-', ' ').replace('_', ' ');
        for (String usual : new String[] {AS_MEASURED, PLANNED, AS_STRUNG}) {
            if (word.equals(usual)) {
                return usual;
            }
        }
        return t;
    }

    /** @return true for a label that describes the strings on the instrument (not a plan) */
    public static boolean describesTheStrings(String label) {
        return !PLANNED.equals(label);
    }
}
