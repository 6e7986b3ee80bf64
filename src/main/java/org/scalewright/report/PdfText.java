package org.scalewright.report;

import java.util.HashMap;
import java.util.Map;
import org.apache.pdfbox.pdmodel.font.PDFont;

/**
 * Makes text safe for a PDF font: every character the font has a glyph for is kept as written
 * (with the bundled DejaVu Sans that is Latin with its accents, Greek, Cyrillic, and the
 * symbols of the report such as {@code ≤ − μ Δ √ ∞}); control characters become blanks and a
 * character the font has no glyph for becomes {@code ?}. Never throws for any input.
 */
final class PdfText {
    private final PDFont font;
    private final Map<Integer, Boolean> shown = new HashMap<>();

    PdfText(PDFont font) {
        this.font = font;
    }

    /** @return the text with every character the font can show, control characters blank, others {@code ?} */
    String safe(String text) {
        if (text == null || text.isEmpty()) {
            return "";
        }
        StringBuilder b = new StringBuilder(text.length());
        text.codePoints().forEach(c -> {
            if (Character.isISOControl(c)) {
                b.append(' ');
            } else if (canShow(c)) {
                b.appendCodePoint(c);
            } else {
                b.append('?');
            }
        });
        return b.toString();
    }

    /** @return true when the font has a glyph for the character (encoding fails for one it lacks) */
    private boolean canShow(int codePoint) {
        return shown.computeIfAbsent(codePoint, c -> {
            try {
                byte[] code = font.encode(new String(Character.toChars(c)));
                return code.length > 0;
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
