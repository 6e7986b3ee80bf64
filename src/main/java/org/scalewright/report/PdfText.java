package org.scalewright.report;

import java.util.HashMap;
import java.util.Map;
import org.apache.pdfbox.pdmodel.font.PDFont;

/**
 * Makes text safe for a standard-14 PDF font, which can only show the WinAnsi characters:
 * common symbols are spelt in ASCII ({@code −} → {@code -}, {@code ≤} → {@code <=}, Greek
 * {@code μ} → micro sign {@code µ}), control characters become blanks and anything else the
 * font cannot show becomes {@code ?}. Never throws for any input.
 */
final class PdfText {
    private static final Map<Character, String> SPELLED = new HashMap<>();

    static {
        SPELLED.put('\u2212', "-");      // minus sign
        SPELLED.put('\u2010', "-");      // hyphen
        SPELLED.put('\u2011', "-");      // non-breaking hyphen
        SPELLED.put('\u2264', "<=");
        SPELLED.put('\u2265', ">=");
        SPELLED.put('\u2260', "!=");
        SPELLED.put('\u2248', "~");
        SPELLED.put('\u2192', "->");
        SPELLED.put('\u2190', "<-");
        SPELLED.put('\u2194', "<->");
        SPELLED.put('\u03bc', "\u00b5"); // Greek mu to the micro sign
        SPELLED.put('\u03c3', "sigma");
        SPELLED.put('\u03c1', "rho");
        SPELLED.put('\u0394', "delta ");
        SPELLED.put('\u03c0', "pi");
        SPELLED.put('\u221a', "sqrt");
        SPELLED.put('\u221e', "inf");
        SPELLED.put('\u2009', " ");      // thin space
        SPELLED.put('\u202f', " ");      // narrow no-break space
        SPELLED.put('\u2032', "'");
        SPELLED.put('\u2033', "\"");
        SPELLED.put('\u2074', "^4");
        SPELLED.put('\u2070', "^0");
        SPELLED.put('\u2080', "0");
        SPELLED.put('\u2081', "1");
        SPELLED.put('\u2082', "2");
    }

    private final PDFont font;
    private final Map<Character, Boolean> shown = new HashMap<>();

    PdfText(PDFont font) {
        this.font = font;
    }

    /** @return the text with every character the font can show, others spelt or replaced */
    String safe(String text) {
        if (text == null || text.isEmpty()) {
            return "";
        }
        StringBuilder b = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (Character.isISOControl(c)) {
                b.append(' ');
                continue;
            }
            if (Character.isHighSurrogate(c) && i + 1 < text.length()) {
                i++; // a character outside the basic plane: no standard-14 font has it
                b.append('?');
                continue;
            }
            String spelled = SPELLED.get(c);
            if (spelled != null) {
                for (char s : spelled.toCharArray()) {
                    b.append(canShow(s) ? s : '?');
                }
            } else {
                b.append(canShow(c) ? c : '?');
            }
        }
        return b.toString();
    }

    private boolean canShow(char c) {
        return shown.computeIfAbsent(c, ch -> {
            try {
                font.encode(String.valueOf(ch));
                return true;
            } catch (IllegalArgumentException | java.io.IOException e) {
                return false;
            }
        });
    }

    /** @return the width of the (safe) text at {@code size} points, pt */
    float width(String safeText, float size) {
        try {
            return font.getStringWidth(safeText) / 1000f * size;
        } catch (IllegalArgumentException | java.io.IOException e) {
            return safeText.length() * size * 0.6f;
        }
    }
}
