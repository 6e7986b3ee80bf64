package org.scalewright.report;

import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.WordChoice;

/**
 * The paper the PDF report is laid out on, chosen apart from the units; by default A4 for
 * metric units and US Letter for imperial ({@link #of(ReportUnits)}).
 */
public enum ReportPaper implements WordChoice {
    /** ISO A4, 210 × 297 mm. */
    A4(PDRectangle.A4),
    /** US Letter, 8.5 × 11 in. */
    LETTER(PDRectangle.LETTER);

    private final PDRectangle size;

    ReportPaper(PDRectangle size) {
        this.size = size;
    }

    PDRectangle size() {
        return size;
    }

    /** @return the usual paper for the units: A4 for metric, Letter for imperial */
    public static ReportPaper of(ReportUnits units) {
        return units == ReportUnits.IMPERIAL ? LETTER : A4;
    }

    /**
     * @param text {@code a4} or {@code letter} (case ignored)
     * @throws InvalidInput naming the text and the choices
     */
    public static ReportPaper parse(String text) {
        return WordChoice.of(ReportPaper.class, text, "paper");
    }

    /** @return the name shown in the window: {@code A4} or {@code Letter} */
    @Override
    public String toString() {
        return this == A4 ? "A4" : "Letter";
    }
}
