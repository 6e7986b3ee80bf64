package org.scalewright.model;

/**
 * Where along the string it broke: at one of its bearing points or in the speaking length; its
 * word is {@link WordChoice#word()} ({@code front-bearing}).
 */
public enum BreakPlace implements WordChoice {
    TUNING_PIN("at the tuning pin"),
    FRONT_BEARING("at the front bearing (agraffe, capo or pressure bar)"),
    SPEAKING_LENGTH("in the speaking length"),
    BRIDGE("at the bridge pins"),
    HITCH_PIN("at the hitch pin"),
    UNKNOWN("at a place not recorded");

    private final String phrase;

    BreakPlace(String phrase) {
        this.phrase = phrase;
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
        return WordChoice.of(BreakPlace.class, text, "where the string broke");
    }

    /** @return the accepted words, comma-separated */
    public static String words() {
        return WordChoice.words(BreakPlace.class);
    }
}
