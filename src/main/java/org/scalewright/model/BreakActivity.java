package org.scalewright.model;

/** What was being done when a string broke; its word is {@link WordChoice#word()} ({@code pitch-raise}). */
public enum BreakActivity implements WordChoice {
    PITCH_RAISE("during a pitch raise"),
    FITTING("while fitting or bringing up a new string"),
    TUNING("during a tuning"),
    PLAYING("while being played"),
    UNKNOWN("at a time not recorded");

    private final String phrase;

    BreakActivity(String phrase) {
        this.phrase = phrase;
    }

    /** @return the activity in a sentence ({@code during a pitch raise}) */
    public String phrase() {
        return phrase;
    }

    /** @return true when a person was working at the string under rising tension (DESIGN §8 cautions apply) */
    public boolean underRisingTension() {
        return this == PITCH_RAISE || this == FITTING;
    }

    /**
     * @param text one of the words ({@code pitch-raise}, {@code fitting}, {@code tuning}, {@code playing},
     *             {@code unknown}); case and blanks around it do not matter
     * @throws InvalidInput naming the accepted words
     */
    public static BreakActivity of(String text) {
        return WordChoice.of(BreakActivity.class, text, "what the string broke during");
    }

    /** @return the accepted words, comma-separated */
    public static String words() {
        return WordChoice.words(BreakActivity.class);
    }
}
