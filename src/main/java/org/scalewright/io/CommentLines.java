package org.scalewright.io;

/**
 * The {@code #} comment lines of the CSV files the program writes, and how a reader takes their text
 * back. A comment is written so that a spreadsheet never runs it and every tool that skips lines
 * beginning with {@code #} still skips it: its text is one line without control characters; a text
 * that begins with {@code =}, {@code +}, {@code -} or {@code @} gets a leading apostrophe, as a data
 * cell does ({@link CsvCells#safeText}); and a text holding a comma, a semicolon, a tab or a quote is
 * written after {@code #,} as one quoted cell ({@code #,"title: Grand, 1907"}), so those characters
 * cannot split it into cells of which one might be a formula. A text without them is written as it
 * was ({@code # a4_hz: 440}).
 */
public final class CommentLines {
    private CommentLines() {
    }

    /**
     * @param text the comment's text, without the {@code #}
     * @return the line to write, without its line break
     */
    public static String line(String text) {
        String t = oneLine(text);
        if (!t.isEmpty() && "=+-@".indexOf(t.charAt(0)) >= 0) {
            t = "'" + t;
        }
        if (t.indexOf(',') >= 0 || t.indexOf(';') >= 0 || t.indexOf('\t') >= 0 || t.indexOf('"') >= 0) {
            return "#,\"" + t.replace("\"", "\"\"") + "\"";
        }
        return "# " + t;
    }

    /**
     * Reads a line back as a comment: a line whose first non-blank character is {@code #}; when
     * {@code #,} is followed by one quoted cell, as {@link #line} writes it, the comment is that cell.
     *
     * @param line a line of a CSV file
     * @return the comment's text without the {@code #}, surrounding blanks and a disarming apostrophe;
     *         null when the line is not a comment
     */
    public static String textOf(String line) {
        String s = line.strip();
        if (!s.startsWith("#")) {
            return null;
        }
        String body = s.substring(1);
        if (body.length() >= 3 && body.startsWith(",\"") && body.endsWith("\"") && isOneQuotedCell(body.substring(1))) {
            body = body.substring(2, body.length() - 1).replace("\"\"", "\"");
        }
        body = body.strip();
        if (body.length() > 1 && body.charAt(0) == '\'' && "=+-@".indexOf(body.charAt(1)) >= 0) {
            body = body.substring(1);
        }
        return body;
    }

    /** @return true when every quote between the outer two is doubled */
    private static boolean isOneQuotedCell(String s) {
        for (int i = 1; i < s.length() - 1; i++) {
            if (s.charAt(i) == '"') {
                if (i + 1 < s.length() - 1 && s.charAt(i + 1) == '"') {
                    i++;
                } else {
                    return false;
                }
            }
        }
        return true;
    }

    /** Line breaks become spaces; other control characters (tab aside) are left out. */
    private static String oneLine(String text) {
        StringBuilder b = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n' || c == '\r') {
                if (!(c == '\n' && i > 0 && text.charAt(i - 1) == '\r')) {
                    b.append(' ');
                }
            } else if (c == '\t' || !(c < 0x20 || c == 0x7f || (c >= 0x80 && c <= 0x9f))) {
                b.append(c);
            }
        }
        return b.toString();
    }
}
