package org.scalewright.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.scalewright.design.orders.TestScales;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.Scale;

class PdfReportWriterTest {

    private static byte[] pdf(ReportContent c) {
        return ReportPackage.files(c, ReportFixtures.charts()).content(ReportPackage.PDF);
    }

    private static String pageText(PDDocument doc, int page) throws Exception {
        PDFTextStripper s = new PDFTextStripper();
        s.setStartPage(page);
        s.setEndPage(page);
        return s.getText(doc);
    }

    @Test
    void theReportHasEverySectionInOrderWithTheCautionsAndSources() throws Exception {
        byte[] bytes = pdf(ReportFixtures.content(ReportUnits.METRIC));
        try (PDDocument doc = Loader.loadPDF(bytes)) {
            assertTrue(doc.getNumberOfPages() >= 8, "pages: " + doc.getNumberOfPages());
            assertEquals(PDRectangle.A4.getWidth(), doc.getPage(0).getMediaBox().getWidth(), 0.01);
            String all = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            List<String> order = List.of("Test scale (generated)", "Pitch standard: A4 = 440 Hz",
                    "Strength table: ASTM A228/A228M minimum tensile strength", "Total tension by section",
                    "Curves over the keyboard", "Flagged notes", "String schedule", "Wound-string order",
                    "Plain-wire order", "Tuning stretch from inharmonicity", "Cautions", "Sources of the figures");
            int at = -1;
            for (String s : order) {
                int i = all.indexOf(s, at + 1);
                assertTrue(i > at, "'" + s + "' missing or out of order");
                at = i;
            }
            for (String caution : BuiltInData.cautions()) {
                assertTrue(all.contains(caution.substring(0, 40)), "caution missing: " + caution);
            }
            assertTrue(all.contains("Fletcher 1964"));
            assertTrue(all.contains("CRC Handbook of Chemistry and Physics (pure copper), from memory"));
            assertTrue(all.contains("page 1 of " + doc.getNumberOfPages()));
        }
    }

    @Test
    void theFlagSummaryCountsTheWireOrderFlags() throws Exception {
        // the demo grand with key 50 given a single odd size, one half size thicker than keys 49 and 51 (#16)
        Scale s = org.scalewright.io.ScaleSheetReader.standard().read(
                java.nio.file.Path.of("demo-instruments", "grand-190", "grand-190.csv"));
        org.scalewright.model.Note n49 = s.note(49).orElseThrow();
        org.scalewright.model.Note n51 = s.note(51).orElseThrow();
        assertEquals(n49.wire(), n51.wire(), "the demo's keys 49 and 51 share a size");
        double thicker = n49.wire().diameter() + 0.0005 * 0.0254;
        s = s.withNote(s.note(50).orElseThrow().withWire(org.scalewright.model.CoreWire.ofDiameter(thicker)));
        try (PDDocument doc = Loader.loadPDF(pdf(ReportFixtures.content(s, ReportUnits.METRIC)))) {
            String all = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertTrue(all.contains("1 single odd size"), all);
        }
    }

    @Test
    void aTableRunningOverPagesRepeatsItsHeader() throws Exception {
        try (PDDocument doc = Loader.loadPDF(pdf(ReportFixtures.content(ReportUnits.METRIC)))) {
            int schedulePages = 0;
            for (int p = 1; p <= doc.getNumberOfPages(); p++) {
                String t = pageText(doc, p);
                if (t.contains("C8") && t.contains("stretched") && t.contains("breaking")) {
                    schedulePages++;
                }
                if (t.contains("String schedule")) {
                    String next = pageText(doc, p + 1);
                    assertTrue(next.contains("speaking") && next.contains("stretched"),
                            "the schedule's header is repeated on the next page");
                }
            }
            assertTrue(schedulePages >= 1);
        }
    }

    @Test
    void imperialReportsAreOnLetterPagesWithInchesAndMillimetres() throws Exception {
        try (PDDocument doc = Loader.loadPDF(pdf(ReportFixtures.content(ReportUnits.IMPERIAL)))) {
            assertEquals(PDRectangle.LETTER.getHeight(), doc.getPage(0).getMediaBox().getHeight(), 0.01);
            String all = new PDFTextStripper().getText(doc);
            // key 1's core of 1.500 mm is 0.0591 in: the wound order in inches with mm beside (to 0.001 mm)
            assertTrue(all.contains("0.0591 (1.500)"), "wound order in inches with mm beside");
            assertTrue(all.replaceAll("\\s+", " ").contains("length to buy ft"));
        }
    }

    @Test
    void namesAndSymbolsPrintAsWrittenInTheEmbeddedFont() throws Exception {
        Scale s = TestScales.generated().withTitle("Łódź – ≤ 70 % μ Δ");
        try (PDDocument doc = Loader.loadPDF(pdf(ReportFixtures.content(s, ReportUnits.METRIC)))) {
            String first = pageText(doc, 1);
            assertTrue(first.contains("Łódź – ≤ 70 % μ Δ"), first.substring(0, 80));
            int fonts = 0;
            for (COSName name : doc.getPage(0).getResources().getFontNames()) {
                PDFont f = doc.getPage(0).getResources().getFont(name);
                assertTrue(f.isEmbedded(), f.getName() + " is embedded");
                assertTrue(f.getName().contains("DejaVuSans"), f.getName());
                fonts++;
            }
            assertTrue(fonts >= 2, "regular and bold on the title page");
        }
    }

    @Test
    void textTheFontCannotShowIsReplacedNotFatal() throws Exception {
        Scale s = TestScales.generated().withTitle("Flügel μ−≤² 日本 𝄞");
        s = s.withNote(s.note(40).orElseThrow().withSection("σ√∞"));
        try (PDDocument doc = Loader.loadPDF(pdf(ReportFixtures.content(s, ReportUnits.METRIC)))) {
            String first = pageText(doc, 1);
            assertTrue(first.contains("Flügel μ−≤² ?? ?"), first.substring(0, 80));
            assertTrue(new PDFTextStripper().getText(doc).contains("σ√∞"), "the section name as written");
        }
    }
}
