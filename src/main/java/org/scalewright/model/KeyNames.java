package org.scalewright.model;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Key numbers and note names of the piano keyboard: A0 = key 1, C4 = key 40, A4 = key 49,
 * C8 = key 88; keys below 1 are extended bass (key 0 = G#0). Names are written with sharps.
 */
public final class KeyNames {
    private static final String[] NAMES = {"A", "A#", "B", "C", "C#", "D", "D#", "E", "F", "F#", "G", "G#"};
    private static final Pattern NAME = Pattern.compile("([A-Ga-g])([#b]?)(-?\\d+)");
    private static final int[] SEMITONE_OF_LETTER = {0, 2, 3, 5, 7, 8, 10}; // A B C D E F G from A

    private static final int CACHED_LOW = -24;
    private static final String[] CACHED = new String[160];

    static {
        for (int i = 0; i < CACHED.length; i++) {
            CACHED[i] = compute(CACHED_LOW + i);
        }
    }

    /**
     * The lowest key number the program accepts: 20 keys of extended bass below A0 (key 1),
     * further than any keyboard extension in use (common practice, no source). DESIGN §4.
     */
    public static final int LOWEST_KEY = -20;
    /** The highest key number the program accepts: 20 keys above C8 (key 88). DESIGN §4. */
    public static final int HIGHEST_KEY = 108;

    private KeyNames() {
    }

    /** @return true when {@code key} lies in {@value #LOWEST_KEY} … {@value #HIGHEST_KEY} */
    public static boolean accepted(int key) {
        return key >= LOWEST_KEY && key <= HIGHEST_KEY;
    }

    /** @return what a refused key number is told: the accepted range and the value given */
    public static String outOfRange(String given) {
        return "key must be " + LOWEST_KEY + " to " + HIGHEST_KEY + " (A0 is 1, C8 is 88), was " + given;
    }

    /** @return the note name of a key number, sharps on output (key 49 → {@code A4}, key 2 → {@code A#0}) */
    public static String name(int key) {
        int i = key - CACHED_LOW;
        return i >= 0 && i < CACHED.length ? CACHED[i] : compute(key);
    }

    private static String compute(int key) {
        int fromA0 = key - 1;
        int idx = Math.floorMod(fromA0, 12);
        // octave numbers change at C: key 4 (C1) is the first of octave 1
        int octave = Math.floorDiv(fromA0 + 9, 12);
        return NAMES[idx] + octave;
    }

    /**
     * @param text a key number ({@code 49}) or note name ({@code A4}, {@code C#4}, {@code Bb2})
     * @return the key number, {@value #LOWEST_KEY} … {@value #HIGHEST_KEY}
     * @throws InvalidInput if the text is neither, or names a key outside that range
     */
    public static int parse(String text) {
        String t = text.trim();
        if (t.matches("[+-]?\\d+")) {
            // compared as digits, so a number past the int range is told as typed, not overflowed
            String digits = t.replaceFirst("^[+-]?0*", "");
            if (digits.length() > 4 || !accepted(Integer.parseInt(t))) {
                throw new InvalidInput(outOfRange(t));
            }
            return Integer.parseInt(t);
        }
        Matcher m = NAME.matcher(t);
        if (!m.matches() || m.group(3).replaceFirst("^-?0*", "").length() > 3) {
            throw new InvalidInput(m.matches() ? outOfRange("'" + t + "'")
                    : "not a key number or note name (such as 49, A4 or C#3): '" + t + "'");
        }
        int letter = "ABCDEFG".indexOf(m.group(1).toUpperCase(Locale.ROOT));
        int semitone = SEMITONE_OF_LETTER[letter];
        if (m.group(2).equals("#")) {
            semitone++;
        } else if (m.group(2).equals("b")) {
            semitone--;
        }
        int octave = Integer.parseInt(m.group(3));
        // semitone counted from A of the same "A-octave"; letters C..G belong to the octave that starts at C
        int cBased = Math.floorMod(semitone - 3, 12);
        // key of C in this octave: C(octave) = 4 + 12*(octave-1)
        int keyOfC = 4 + 12 * (octave - 1);
        int key = keyOfC + cBased;
        if (m.group(2).equals("b") && m.group(1).equalsIgnoreCase("C")) {
            key = keyOfC - 1; // Cb is B of the octave below
        }
        if (m.group(2).equals("#") && m.group(1).equalsIgnoreCase("B")) {
            key = keyOfC + 12; // B# is C of the next octave
        }
        if (!accepted(key)) {
            throw new InvalidInput(outOfRange("'" + t + "' (key " + key + ")"));
        }
        return key;
    }
}
