package org.scalewright.report;

import java.util.Locale;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.scalewright.model.InvalidInput;

/**
 * The paper the PDF report is laid out on, chosen apart from the units; by default A4 for
 * metric units and US Letter for imperial ({@link #of(ReportUnits)}).
 */
public enum ReportPaper {
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
        String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
        return switch (t) {
            case "a4" -> A4;
            case "letter" -> LETTER;
            default -> throw new InvalidInput("paper must be a4 or letter, was '" + text + "'");
        };
    }

    /** @return {@code a4} or {@code letter} */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** @return the name shown in the window: {@code A4} or {@code Letter} */
    @Override
    public String toString() {
        return this == A4 ? "A4" : "Letter";
    }
}
