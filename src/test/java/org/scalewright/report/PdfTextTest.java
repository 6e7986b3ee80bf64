package org.scalewright.report;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;
import org.junit.jupiter.api.Test;

class PdfTextTest {
    private final PDType1Font helvetica = new PDType1Font(Standard14Fonts.FontName.HELVETICA);
    private final PdfText text = new PdfText(helvetica);

    @Test
    void symbolsOutsideWinAnsiAreSpeltInAscii() {
        assertEquals("-5 <= x >= 2 ~ 3 -> y", text.safe("−5 ≤ x ≥ 2 ≈ 3 → y"));
        assertEquals("\u00b5 = 7 g/m", text.safe("μ = 7 g/m")); // Greek mu to the micro sign
    }

    @Test
    void winAnsiCharactersAreKept() {
        String s = "µ ² ³ ° × – é ü « »";
        assertEquals(s, text.safe(s));
    }

    @Test
    void anythingElseBecomesAQuestionMarkAndAlwaysEncodes() {
        String nasty = "Flügel 😀 日本 \u0007 tab\there σ √ ∞";
        String safe = text.safe(nasty);
        assertEquals("Flügel ? ??   tab here sigma sqrt inf", safe); // control characters become blanks
        assertDoesNotThrow(() -> helvetica.encode(safe));
        assertEquals("", text.safe(null));
    }
}
