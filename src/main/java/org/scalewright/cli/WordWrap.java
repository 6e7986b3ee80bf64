package org.scalewright.cli;

import java.io.PrintWriter;

/** Prints a paragraph wrapped at word boundaries for the terminal. */
final class WordWrap {
    /** Line width for wrapped text. */
    static final int WIDTH = 100;

    private WordWrap() {
    }

    /**
     * @param w       where to print
     * @param first   prefix of the first line (e.g. {@code "  1. "})
     * @param text    the paragraph
     */
    static void print(PrintWriter w, String first, String text) {
        String indent = " ".repeat(first.length());
        StringBuilder line = new StringBuilder(first);
        boolean empty = true;
        for (String word : text.split(" ")) {
            if (word.isEmpty()) {
                continue;
            }
            if (!empty && line.length() + 1 + word.length() > WIDTH) {
                w.println(line);
                line = new StringBuilder(indent);
                empty = true;
            }
            if (!empty) {
                line.append(' ');
            }
            line.append(word);
            empty = false;
        }
        w.println(line);
    }
}
