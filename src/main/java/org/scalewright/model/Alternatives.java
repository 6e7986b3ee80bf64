package org.scalewright.model;

import java.util.List;

/** Choices written out for a message: {@code metric or imperial}, {@code a, b or c}. */
public final class Alternatives {
    private Alternatives() {
    }

    /**
     * @param choices one or more words, in the order to tell them
     * @return the words separated by commas, the last by {@code or}
     */
    public static String of(List<String> choices) {
        int n = choices.size();
        if (n <= 1) {
            return String.join("", choices);
        }
        return String.join(", ", choices.subList(0, n - 1)) + " or " + choices.get(n - 1);
    }
}
