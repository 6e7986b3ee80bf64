package org.scalewright.cli;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.Writer;

/**
 * Keeps control characters from the terminal: whatever the command line prints — a title, a remark,
 * a file name, a message — passes through here, so an escape or bell character in a sheet cannot
 * move the cursor, recolour, retitle the window or ring. Left out: C0 controls other than tab and
 * line feed (a carriage return only where it ends a line), DEL, C1 controls (U+0080–U+009F), and the
 * bidirectional overrides and isolates (U+202A–U+202E, U+2066–U+2069) that reorder what is shown.
 */
final class TerminalText {
    private TerminalText() {
    }

    /** @return the text without the characters a terminal would act on (tab and line feed kept) */
    static String clean(String text) {
        StringBuilder b = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\r' && i + 1 < text.length() && text.charAt(i + 1) == '\n') {
                b.append(c);
            } else if (shown(c)) {
                b.append(c);
            }
        }
        return b.toString();
    }

    /** @return one line of text for a table cell: controls left out, tabs and line breaks as spaces */
    static String cell(String text) {
        return clean(text.replace("\r\n", " ").replace('\n', ' ').replace('\r', ' ').replace('\t', ' '));
    }

    private static boolean shown(char c) {
        if (c == '\t' || c == '\n') {
            return true;
        }
        if (c < 0x20 || c == 0x7f || (c >= 0x80 && c <= 0x9f)) {
            return false;
        }
        return !((c >= '\u202a' && c <= '\u202e') || (c >= '\u2066' && c <= '\u2069'));
    }

    /** @return a printer that passes everything printed through {@link #clean} */
    static PrintWriter printer(PrintWriter out) {
        return new PrintWriter(new Filter(out), true);
    }

    /** Drops controls as they stream by; a carriage return is held until the next character shows whether it ends a line. */
    private static final class Filter extends FilterWriter {
        private boolean pendingReturn;

        Filter(Writer out) {
            super(out);
        }

        @Override
        public void write(int c) throws IOException {
            char ch = (char) c;
            if (pendingReturn) {
                pendingReturn = false;
                if (ch == '\n') {
                    out.write('\r');
                }
            }
            if (ch == '\r') {
                pendingReturn = true;
            } else if (shown(ch)) {
                out.write(ch);
            }
        }

        @Override
        public void write(char[] buf, int off, int len) throws IOException {
            for (int i = off; i < off + len; i++) {
                write(buf[i]);
            }
        }

        @Override
        public void write(String str, int off, int len) throws IOException {
            for (int i = off; i < off + len; i++) {
                write(str.charAt(i));
            }
        }

        @Override
        public void flush() throws IOException {
            out.flush();
        }
    }
}
