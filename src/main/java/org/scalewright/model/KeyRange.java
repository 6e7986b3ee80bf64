package org.scalewright.model;

/**
 * An inclusive range of key numbers, written {@code A-B} with key numbers or note names
 * ({@code 33-88}, {@code F3-C8}).
 *
 * @param first lowest key in the range
 * @param last  highest key in the range, &ge; first
 */
public record KeyRange(int first, int last) {

    public KeyRange {
        if (last < first) {
            throw new IllegalArgumentException("key range must run from low to high, was " + first + "-" + last);
        }
    }

    /** @return true when {@code key} lies in the range */
    public boolean contains(int key) {
        return key >= first && key <= last;
    }

    /**
     * Parses {@code A-B}; each end a key number (possibly negative for extended bass: {@code -2-10})
     * or a note name.
     *
     * @throws InvalidInput with a message saying what was expected: the form, a key outside
     *         {@link KeyNames#LOWEST_KEY} … {@link KeyNames#HIGHEST_KEY}, or a range from high to low
     */
    public static KeyRange parse(String text) {
        String t = text.trim();
        // the separator is the first '-' that is not at the start of the text
        int sep = t.indexOf('-', 1);
        if (sep < 0) {
            throw new InvalidInput("key range must be written A-B (e.g. 33-88 or F3-C8), was '" + t + "'");
        }
        int first;
        int last;
        try {
            first = KeyNames.parse(t.substring(0, sep));
            last = KeyNames.parse(t.substring(sep + 1));
        } catch (InvalidInput e) {
            throw new InvalidInput("key range '" + t + "': " + e.getMessage());
        }
        if (last < first) {
            throw new InvalidInput("key range must run from low to high, was " + t);
        }
        return new KeyRange(first, last);
    }

    @Override
    public String toString() {
        return first + "-" + last;
    }
}
