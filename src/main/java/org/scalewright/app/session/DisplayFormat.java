package org.scalewright.app.session;

import org.scalewright.model.DisplayUnits;
import org.scalewright.model.ForceUnit;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.NumberText;
import org.scalewright.model.UnitConversions;

/**
 * The window's numbers in the chosen display units, with the same decimals down a column
 * (lengths 0.1 mm or 0.01 in, diameters 0.001 mm or 0.0001 in, stress 1 MPa or 0.1 ksi);
 * the digits come from {@link NumberText}. Stress follows the force unit: ksi with pounds-force,
 * MPa otherwise.
 */
public final class DisplayFormat {
    private DisplayFormat() {
    }

    public static String fixed(double v, int decimals) {
        return NumberText.fixed(v, decimals);
    }

    /** @return {@code v} with at least {@code min} and at most {@code max} decimals, trailing zeros beyond min dropped */
    public static String decimals(double v, int min, int max) {
        return NumberText.upTo(v, min, max);
    }

    /** @return a speaking length (m) in the display length unit: {@code 1480.0} mm or {@code 58.27} in */
    public static String length(double metres, DisplayUnits u) {
        return fixed(u.length().fromMetres(metres), lengthDecimals(u));
    }

    /** @return the decimals a length is shown with: 1 in mm (0.1 mm), 2 in inches (0.01 in) */
    public static int lengthDecimals(DisplayUnits u) {
        return u.length() == LengthUnit.MM ? 1 : 2;
    }

    /** @return a wire diameter (m) in the display length unit: {@code 1.100} mm or {@code 0.0433} in */
    public static String diameter(double metres, DisplayUnits u) {
        double v = u.length().fromMetres(metres);
        return u.length() == LengthUnit.MM ? fixed(v, 3) : fixed(v, 4);
    }

    /** @return the unit stress is shown in: {@code ksi} with pounds-force, else {@code MPa} */
    public static String stressUnit(DisplayUnits u) {
        return u.force() == ForceUnit.LBF ? "ksi" : "MPa";
    }

    /** @return a stress (Pa) in {@link #stressUnit}: {@code 1452} MPa or {@code 210.6} ksi */
    public static String stress(double pascals, DisplayUnits u) {
        return u.force() == ForceUnit.LBF ? fixed(pascals / UnitConversions.PASCALS_PER_KSI, 1) : fixed(pascals / 1e6, 0);
    }

    /** @return a music-wire size number: {@code 17} or {@code 14.5} */
    public static String size(double size) {
        return NumberText.plain(size);
    }

    /** @return a force (N) in the display force unit: {@code 1446} N, {@code 325.0} lbf */
    public static String force(double newtons, DisplayUnits u) {
        double v = u.force().fromNewtons(newtons);
        return u.force() == ForceUnit.N ? fixed(v, 0) : fixed(v, 1);
    }

    /** @return a signed force difference (N) in the display force unit */
    public static String forceDifference(double newtons, DisplayUnits u) {
        double v = u.force().fromNewtons(newtons);
        return NumberText.signed(v, u.force() == ForceUnit.N ? 0 : 1);
    }

    /** @return a whole-instrument or section total (N) as {@code 182.3 kN} or {@code 40,990 lbf} */
    public static String total(double newtons, DisplayUnits u) {
        return switch (u.force()) {
            case N -> fixed(newtons / 1000, 1) + " kN";
            case LBF -> NumberText.grouped(UnitConversions.newtonsToLbf(newtons)) + " lbf";
            case KGF -> NumberText.grouped(UnitConversions.newtonsToKgf(newtons)) + " kgf";
        };
    }

    public static String scientific(double v) {
        return NumberText.scientific(v, 2);
    }
}
