package org.scalewright.report;

import java.io.IOException;
import java.io.InputStream;
import org.apache.fontbox.ttf.TTFParser;
import org.apache.fontbox.ttf.TrueTypeFont;
import org.apache.pdfbox.io.RandomAccessReadBuffer;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.font.PDType0Font;

/**
 * The fonts of the PDF report: DejaVu Sans and DejaVu Sans Bold, bundled in the jar (their
 * licence, the Bitstream Vera licence, beside them as {@code LICENSE-DejaVu.txt}) and embedded
 * in each report as a subset of the glyphs it uses, so names and symbols print as written on
 * any machine, whatever fonts it has.
 */
final class PdfFonts {
    static final String REGULAR = "DejaVuSans.ttf";
    static final String BOLD = "DejaVuSans-Bold.ttf";
    private static final String FOLDER = "/org/scalewright/fonts/";

    private PdfFonts() {
    }

    /**
     * @param doc  the document the font is embedded in
     * @param file {@link #REGULAR} or {@link #BOLD}
     * @return the font, its used glyphs embedded when the document is saved
     * @throws IOException when the bundled font is missing or unreadable (a broken build)
     */
    static PDType0Font load(PDDocument doc, String file) throws IOException {
        try (InputStream in = PdfFonts.class.getResourceAsStream(FOLDER + file)) {
            if (in == null) {
                throw new IOException("the bundled font " + FOLDER + file + " is missing from the program");
            }
            TrueTypeFont ttf = new TTFParser().parse(new RandomAccessReadBuffer(in));
            // no glyph substitution: "fi" stays two letters, so text copied or searched in the PDF is as written
            ttf.setEnableGsub(false);
            return PDType0Font.load(doc, ttf, true);
        }
    }
}
