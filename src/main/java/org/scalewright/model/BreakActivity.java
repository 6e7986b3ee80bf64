package org.scalewright.model;

import java.util.Arrays;
import java.util.Locale;

/** What was being done when a string broke. */
public enum BreakActivity {
    PITCH_RAISE("pitch-raise", "during a pitch raise"),
    FITTING("fitting", "while fitting or bringing up a new string"),
    TUNING("tuning", "during a tuning"),
    PLAYING("playing", "while being played"),
    UNKNOWN("unknown", "at a time not recorded");

    private final String word;
    private final String phrase;

    BreakActivity(String word, String phrase) {
        this.word = word;
        this.phrase = phrase;
    }

    /** @return the word written in files and typed on the command line ({@code pitch-raise}) */
    public String word() {
        return word;
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
        String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
        return Arrays.stream(values()).filter(a -> a.word.equals(t)).findFirst()
                .orElseThrow(() -> new InvalidInput("what the string broke during must be one of "
                        + words() + ", was '" + text + "'"));
    }

    /** @return the accepted words, comma-separated */
    public static String words() {
        return String.join(", ", Arrays.stream(values()).map(BreakActivity::word).toList());
    }
}
