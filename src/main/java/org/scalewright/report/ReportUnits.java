package org.scalewright.report;

import org.scalewright.model.LengthUnit;
import org.scalewright.model.UnitConversions;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.WordChoice;

/**
 * The units a report shows lengths and forces in. Metric: millimetres and newtons. Imperial:
 * inches and pounds-force, with millimetres and newtons beside them.
 */
public enum ReportUnits implements WordChoice {
    /** Millimetres, newtons, metres of wire. */
    METRIC(LengthUnit.MM),
    /** Inches (with mm beside), pounds-force (with N beside), feet of wire (with m beside). */
    IMPERIAL(LengthUnit.IN);

    /** Metres per foot, 0.3048 m exactly (NIST SP 811, B.8). */
    public static final double METRES_PER_FOOT = 12 * UnitConversions.METRES_PER_INCH;

    private final LengthUnit length;

    ReportUnits(LengthUnit length) {
        this.length = length;
    }

    /** @return the unit lengths are shown in */
    public LengthUnit length() {
        return length;
    }

    /** @return the units of a scale sheet whose speaking lengths are in {@code unit} */
    public static ReportUnits of(LengthUnit unit) {
        return unit == LengthUnit.IN ? IMPERIAL : METRIC;
    }

    /**
     * @param text {@code metric} or {@code imperial} (case ignored)
     * @throws InvalidInput naming the text and the choices
     */
    public static ReportUnits parse(String text) {
        return WordChoice.of(ReportUnits.class, text, "units");
    }
}
