package org.scalewright.report;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.pdfbox.cos.COSString;
import org.apache.pdfbox.pdfparser.PDFStreamParser;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

class PdfTextTest {
    private PDDocument doc;
    private PDType0Font dejaVu;
    private PdfText text;

    @BeforeEach
    void load() throws Exception {
        doc = new PDDocument();
        dejaVu = PdfFonts.load(doc, PdfFonts.REGULAR);
        text = new PdfText(dejaVu);
    }

    @AfterEach
    void close() throws Exception {
        doc.close();
    }

    @Test
    void namesAndSymbolsTheFontHasArePrintedAsWritten() {
        String s = "Łódź – ≤ 70 % μ Δ −5 ≥ 2 ≈ 3 → σ √ ∞ µ ² ° × é ü « » Ω";
        assertEquals(s, text.safe(s));
    }

    @Test
    void charactersWithoutAGlyphBecomeAQuestionMarkAndAlwaysEncode() {
        // DejaVu Sans has no CJK ideographs and no musical symbols such as the G clef (a character outside the basic plane)
        String nasty = "Flügel 𝄞 日本 \u0007 tab\there";
        String safe = text.safe(nasty);
        assertEquals("Flügel ? ??   tab here", safe); // control characters become blanks
        assertDoesNotThrow(() -> dejaVu.encode(safe));
        assertEquals("", text.safe(null));
    }

    @Test
    void lettersAreNotJoinedIntoLigaturesSoCopiedTextIsAsWritten() throws Exception {
        PDPage page = new PDPage();
        doc.addPage(page);
        try (PDPageContentStream cs = new PDPageContentStream(doc, page)) {
            cs.beginText();
            cs.setFont(dejaVu, 10);
            cs.showText("fi");
            cs.endText();
        }
        PDFStreamParser parser = new PDFStreamParser(page);
        byte[] shown = null;
        for (Object token = parser.parseNextToken(); token != null; token = parser.parseNextToken()) {
            if (token instanceof COSString str) {
                shown = str.getBytes();
            }
        }
        assertEquals(4, shown.length, "two glyphs of two bytes each, not the fi ligature");
        assertEquals(dejaVu.encode("f").length + dejaVu.encode("i").length, shown.length);
    }

    @Test
    void widthsComeFromTheFont() {
        assertTrue(text.width("WWWW", 10) > text.width("iiii", 10));
        assertEquals(2 * text.width("Łódź", 9), text.width("ŁódźŁódź", 9), 1e-3);
    }
}
