package org.scalewright.model;

import java.util.Arrays;
import java.util.Locale;

/** Where along the string it broke: at one of its bearing points or in the speaking length. */
public enum BreakPlace {
    TUNING_PIN("tuning-pin", "at the tuning pin"),
    FRONT_BEARING("front-bearing", "at the front bearing (agraffe, capo or pressure bar)"),
    SPEAKING_LENGTH("speaking-length", "in the speaking length"),
    BRIDGE("bridge", "at the bridge pins"),
    HITCH_PIN("hitch-pin", "at the hitch pin"),
    UNKNOWN("unknown", "at a place not recorded");

    private final String word;
    private final String phrase;

    BreakPlace(String word, String phrase) {
        this.word = word;
        this.phrase = phrase;
    }

    /** @return the word written in files and typed on the command line ({@code front-bearing}) */
    public String word() {
        return word;
    }

    /** @return the place in a sentence ({@code at the hitch pin}) */
    public String phrase() {
        return phrase;
    }

    /**
     * @param text one of the words ({@code tuning-pin}, {@code front-bearing}, {@code speaking-length},
     *             {@code bridge}, {@code hitch-pin}, {@code unknown}); case and blanks do not matter
     * @throws InvalidInput naming the accepted words
     */
    public static BreakPlace of(String text) {
        String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
        return Arrays.stream(values()).filter(a -> a.word.equals(t)).findFirst()
                .orElseThrow(() -> new InvalidInput("where the string broke must be one of " + words() + ", was '"
                        + text + "'"));
    }

    /** @return the accepted words, comma-separated */
    public static String words() {
        return String.join(", ", Arrays.stream(values()).map(BreakPlace::word).toList());
    }
}
