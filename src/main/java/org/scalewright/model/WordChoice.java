package org.scalewright.model;

import java.util.Arrays;
import java.util.Locale;

/**
 * A choice among the constants of an enum, written in files and typed on the command line as a
 * word: the constant's name in lower case with hyphens ({@code PITCH_RAISE} is {@code pitch-raise}).
 */
public interface WordChoice {
    /** @return the constant's name (an enum's own) */
    String name();

    /** @return the word written in files and typed on the command line */
    default String word() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /**
     * @param type the enum
     * @param text one of its words; case and blanks around it do not matter
     * @param what what is chosen, for the message: {@code where the string broke}
     * @return the constant whose word it is
     * @throws InvalidInput naming the accepted words: {@code units must be metric or imperial, was 'x'}
     */
    static <E extends Enum<E> & WordChoice> E of(Class<E> type, String text, String what) {
        String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
        return Arrays.stream(type.getEnumConstants()).filter(c -> c.word().equals(t)).findFirst()
                .orElseThrow(() -> new InvalidInput(what + " must be " + Alternatives.of(wordList(type)) + ", was '" + text
                        + "'"));
    }

    /** @param type the enum @return its words, comma-separated */
    static <E extends Enum<E> & WordChoice> String words(Class<E> type) {
        return String.join(", ", wordList(type));
    }

    private static <E extends Enum<E> & WordChoice> java.util.List<String> wordList(Class<E> type) {
        return Arrays.stream(type.getEnumConstants()).map(WordChoice::word).toList();
    }
}
