package org.scalewright.report;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.graphics.image.LosslessFactory;
import org.apache.pdfbox.pdmodel.graphics.image.PDImageXObject;

/**
 * Lays out a report page by page: headings, wrapped paragraphs, images and tables that carry
 * their header over to each new page; a footer with page numbers is added at the end.
 * The bundled DejaVu Sans fonts, embedded ({@link PdfFonts}), every text through {@link PdfText}.
 */
final class PdfPages implements AutoCloseable {
    static final float MARGIN = 40f;
    private static final float FOOTER = 22f;
    private static final float BODY = 9.5f;
    private static final float TABLE_MAX = 8.5f;
    private static final float TABLE_MIN = 6.0f;
    private static final float PAD = 2.6f;

    private final PDDocument doc = new PDDocument();
    private final PDRectangle size;
    private final PDFont regular;
    private final PDFont bold;
    private final PdfText regularText;
    private final PdfText boldText;
    private final String footer;
    private PDPageContentStream cs;
    private float y;

    PdfPages(PDRectangle size, String footer) throws IOException {
        this.size = size;
        this.footer = footer;
        try {
            this.regular = PdfFonts.load(doc, PdfFonts.REGULAR);
            this.bold = PdfFonts.load(doc, PdfFonts.BOLD);
        } catch (IOException | RuntimeException e) {
            doc.close();
            throw e;
        }
        this.regularText = new PdfText(regular);
        this.boldText = new PdfText(bold);
    }

    float width() {
        return size.getWidth() - 2 * MARGIN;
    }

    private float bottom() {
        return MARGIN + FOOTER;
    }

    /** Starts a new page. */
    void newPage() throws IOException {
        if (cs != null) {
            cs.close();
        }
        PDPage page = new PDPage(size);
        doc.addPage(page);
        cs = new PDPageContentStream(doc, page);
        y = size.getHeight() - MARGIN;
    }

    /** Starts a new page unless {@code height} points still fit on this one. */
    void ensure(float height) throws IOException {
        if (cs == null || y - height < bottom()) {
            newPage();
        }
    }

    /** @return the points left on the page */
    float left() {
        return cs == null ? 0 : y - bottom();
    }

    void space(float points) {
        y -= points;
    }

    /** A large title line. */
    void title(String text) throws IOException {
        ensure(40);
        for (String line : wrap(boldText, text, 18, width())) {
            line(bold, boldText, line, 18, MARGIN, Color.BLACK);
            y -= 23;
        }
        y -= 4;
    }

    /** A section heading, kept with at least {@code keepWith} points of what follows. */
    void heading(String text, float keepWith) throws IOException {
        ensure(30 + keepWith);
        y -= 6;
        line(bold, boldText, text, 13, MARGIN, new Color(0x1F3B5A));
        y -= 13 + 4;
        cs.setStrokingColor(new Color(0x1F3B5A));
        cs.setLineWidth(0.7f);
        cs.moveTo(MARGIN, y);
        cs.lineTo(MARGIN + width(), y);
        cs.stroke();
        y -= 9;
    }

    /** A bold line of body text. */
    void subheading(String text) throws IOException {
        ensure(30);
        y -= 3;
        line(bold, boldText, text, 10.5f, MARGIN, Color.BLACK);
        y -= 14;
    }

    /** A paragraph of body text, wrapped to the page width. */
    void paragraph(String text) throws IOException {
        paragraph(text, BODY, false, 0);
    }

    /** A paragraph with an optional bullet and indent. */
    void paragraph(String text, float fontSize, boolean bullet, float indent) throws IOException {
        float x = MARGIN + indent + (bullet ? 10 : 0);
        float lead = fontSize * 1.3f;
        List<String> lines = wrap(regularText, text, fontSize, MARGIN + width() - x);
        for (int i = 0; i < lines.size(); i++) {
            ensure(lead);
            if (bullet && i == 0) {
                line(regular, regularText, "-", fontSize, x - 9, Color.BLACK);
            }
            line(regular, regularText, lines.get(i), fontSize, x, Color.BLACK);
            y -= lead;
        }
        y -= fontSize * 0.35f;
    }

    /** A line "label: value" with the label in bold. */
    void field(String label, String value) throws IOException {
        String l = boldText.safe(label + ": ");
        float lw = boldText.width(l, BODY);
        List<String> lines = wrap(regularText, value, BODY, width() - lw);
        for (int i = 0; i < lines.size(); i++) {
            ensure(BODY * 1.35f);
            if (i == 0) {
                line(bold, boldText, label + ": ", BODY, MARGIN, Color.BLACK);
            }
            line(regular, regularText, lines.get(i), BODY, MARGIN + lw, Color.BLACK);
            y -= BODY * 1.35f;
        }
    }

    /** An image the full text width (or {@code maxHeight} high), with a caption under it. */
    void image(BufferedImage image, String caption, float maxHeight) throws IOException {
        float w = width();
        float h = w * image.getHeight() / image.getWidth();
        if (h > maxHeight) {
            h = maxHeight;
            w = h * image.getWidth() / image.getHeight();
        }
        float captionHeight = caption == null || caption.isEmpty() ? 0
                : wrap(regularText, caption, 8, width()).size() * 8 * 1.3f + 4;
        ensure(h + 10 + captionHeight); // the caption stays with its figure
        PDImageXObject x = LosslessFactory.createFromImage(doc, image);
        cs.drawImage(x, MARGIN + (width() - w) / 2, y - h, w, h);
        y -= h + 10;
        if (caption != null && !caption.isEmpty()) {
            paragraph(caption, 8, false, 0);
        }
        y -= 4;
    }

    /** A table: font sized to fit the width, rows split over pages with the header repeated. */
    void table(PdfTable t) throws IOException {
        int n = t.columns().size();
        float fs = TABLE_MAX;
        float[] w = null;
        while (fs >= TABLE_MIN) {
            w = columnWidths(t, fs);
            if (sum(w) <= width() + 0.01f) {
                break;
            }
            fs -= 0.5f;
        }
        if (fs < TABLE_MIN) {
            fs = TABLE_MIN;
            w = columnWidths(t, fs);
        }
        float lead = fs * 1.22f;
        List<List<String>> headerLines = new ArrayList<>();
        int headerHeightLines = 1;
        for (int c = 0; c < n; c++) {
            List<String> hl = wrap(boldText, t.columns().get(c).header(), fs, w[c] - 2 * PAD);
            headerLines.add(hl);
            headerHeightLines = Math.max(headerHeightLines, hl.size());
        }
        float headerHeight = headerHeightLines * lead + 2 * PAD;
        ensure(headerHeight + 3 * (lead + 2 * PAD));
        drawHeader(t, w, headerLines, headerHeight, fs, lead);
        for (int r = 0; r < t.rows().size(); r++) {
            List<String> row = t.rows().get(r);
            boolean total = t.totalRows().contains(r);
            PdfText text = total ? boldText : regularText;
            PDFont font = total ? bold : regular;
            List<List<String>> cells = new ArrayList<>(n);
            int lines = 1;
            for (int c = 0; c < n; c++) {
                List<String> cl = t.columns().get(c).wrap() ? wrap(text, row.get(c), fs, w[c] - 2 * PAD)
                        : List.of(text.safe(row.get(c)));
                cells.add(cl);
                lines = Math.max(lines, cl.size());
            }
            float h = lines * lead + 2 * PAD;
            if (y - h < bottom()) {
                newPage();
                drawHeader(t, w, headerLines, headerHeight, fs, lead);
            }
            if (total) {
                cs.setStrokingColor(Color.DARK_GRAY);
                cs.setLineWidth(0.8f);
                cs.moveTo(MARGIN, y);
                cs.lineTo(MARGIN + sum(w), y);
                cs.stroke();
            } else if (r % 2 == 1) {
                cs.setNonStrokingColor(new Color(0xF1F1EE));
                cs.addRect(MARGIN, y - h, sum(w), h);
                cs.fill();
            }
            drawCells(t, w, cells, font, text, fs, lead);
            y -= h;
        }
        cs.setStrokingColor(Color.GRAY);
        cs.setLineWidth(0.5f);
        cs.moveTo(MARGIN, y);
        cs.lineTo(MARGIN + sum(w), y);
        cs.stroke();
        y -= 10;
    }

    private void drawHeader(PdfTable t, float[] w, List<List<String>> headerLines, float h, float fs, float lead)
            throws IOException {
        cs.setNonStrokingColor(new Color(0xDCE3EA));
        cs.addRect(MARGIN, y - h, sum(w), h);
        cs.fill();
        drawCells(t, w, headerLines, bold, boldText, fs, lead);
        y -= h;
    }

    /** Draws one table row's cells, each a list of lines, from the current height; numbers right-aligned. */
    private void drawCells(PdfTable t, float[] w, List<List<String>> cells, PDFont f, PdfText measure, float fs,
                           float lead) throws IOException {
        float x = MARGIN;
        for (int c = 0; c < w.length; c++) {
            float ty = y - PAD - fs * 0.92f;
            for (String s : cells.get(c)) {
                float tx = t.columns().get(c).right() ? x + w[c] - PAD - measure.width(s, fs) : x + PAD;
                rawLine(f, s, fs, tx, ty, Color.BLACK);
                ty -= lead;
            }
            x += w[c];
        }
    }

    private float[] columnWidths(PdfTable t, float fs) {
        int n = t.columns().size();
        float[] w = new float[n];
        float wrapNatural = 0;
        for (int c = 0; c < n; c++) {
            PdfTable.Column col = t.columns().get(c);
            float m = 0;
            for (String word : boldText.safe(col.header()).split(" ")) {
                m = Math.max(m, boldText.width(word, fs));
            }
            float data = 0;
            for (int r = 0; r < t.rows().size(); r++) {
                PdfText text = t.totalRows().contains(r) ? boldText : regularText;
                data = Math.max(data, text.width(text.safe(t.rows().get(r).get(c)), fs));
            }
            // a little slack so that rounding never wraps a header word that was measured to fit
            w[c] = Math.max(m, col.wrap() ? Math.min(data, 60 * fs) : data) + 2 * PAD + 0.5f;
            if (col.wrap()) {
                wrapNatural += w[c];
            }
        }
        float total = sum(w);
        if (total > width() && wrapNatural > 0) {
            // squeeze the wrapping columns first, down to a readable minimum
            float fixed = total - wrapNatural;
            float room = Math.max(width() - fixed, 0);
            for (int c = 0; c < n; c++) {
                if (t.columns().get(c).wrap()) {
                    w[c] = Math.max(w[c] * room / wrapNatural, 14 * fs);
                }
            }
        }
        return w;
    }

    private static float sum(float[] w) {
        float s = 0;
        for (float v : w) {
            s += v;
        }
        return s;
    }

    private void line(PDFont font, PdfText text, String s, float fs, float x, Color colour) throws IOException {
        rawLine(font, text.safe(s), fs, x, y - fs, colour);
    }

    private void rawLine(PDFont font, String safe, float fs, float x, float baseline, Color colour)
            throws IOException {
        if (safe.isEmpty()) {
            return;
        }
        cs.beginText();
        cs.setNonStrokingColor(colour);
        cs.setFont(font, fs);
        cs.newLineAtOffset(x, baseline);
        cs.showText(safe);
        cs.endText();
    }

    /** @return the text wrapped into lines no wider than {@code maxWidth}, each made safe */
    static List<String> wrap(PdfText text, String s, float fs, float maxWidth) {
        List<String> out = new ArrayList<>();
        String safe = text.safe(s);
        if (safe.isEmpty()) {
            out.add("");
            return out;
        }
        StringBuilder cur = new StringBuilder();
        for (String word : safe.split(" ")) {
            String trial = cur.length() == 0 ? word : cur + " " + word;
            if (text.width(trial, fs) <= maxWidth || cur.length() == 0) {
                cur.setLength(0);
                cur.append(trial);
            } else {
                out.add(cur.toString());
                cur.setLength(0);
                cur.append(word);
            }
            // a single word wider than the line is cut
            while (text.width(cur.toString(), fs) > maxWidth && cur.length() > 1) {
                int cut = cur.length() - 1;
                while (cut > 1 && text.width(cur.substring(0, cut), fs) > maxWidth) {
                    cut--;
                }
                out.add(cur.substring(0, cut));
                cur.delete(0, cut);
            }
        }
        out.add(cur.toString());
        return out;
    }

    /** Adds the footers and returns the document's bytes. */
    byte[] finish() throws IOException {
        if (cs == null) {
            newPage();
        }
        cs.close();
        cs = null;
        int total = doc.getNumberOfPages();
        for (int i = 0; i < total; i++) {
            PDPage page = doc.getPage(i);
            try (PDPageContentStream f = new PDPageContentStream(doc, page, PDPageContentStream.AppendMode.APPEND,
                    true, true)) {
                String left = regularText.safe(footer);
                while (left.length() > 10 && regularText.width(left, 7.5f) > width() - 70) {
                    left = left.substring(0, left.length() - 4) + "...";
                }
                String right = "page " + (i + 1) + " of " + total;
                f.beginText();
                f.setNonStrokingColor(Color.DARK_GRAY);
                f.setFont(regular, 7.5f);
                f.newLineAtOffset(MARGIN, MARGIN - 4);
                f.showText(left);
                f.endText();
                f.beginText();
                f.setFont(regular, 7.5f);
                f.newLineAtOffset(MARGIN + width() - regularText.width(right, 7.5f), MARGIN - 4);
                f.showText(right);
                f.endText();
            }
        }
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        doc.save(out);
        return out.toByteArray();
    }

    /** Sets the document's title and author information. */
    void info(String title, String producer) {
        doc.getDocumentInformation().setTitle(title);
        doc.getDocumentInformation().setCreator(producer);
        doc.getDocumentInformation().setProducer(producer);
    }

    @Override
    public void close() throws IOException {
        if (cs != null) {
            cs.close();
        }
        doc.close();
    }
}
