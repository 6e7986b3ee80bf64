package org.scalewright.app.session;

import org.scalewright.model.DisplayUnits;
import org.scalewright.model.ForceUnit;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.NumberText;
import org.scalewright.model.UnitConversions;

/** The window's numbers in the chosen display units; the digits come from {@link NumberText}. */
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
        double v = u.length().fromMetres(metres);
        return u.length() == LengthUnit.MM ? decimals(v, 1, 2) : decimals(v, 2, 3);
    }

    /** @return a wire diameter (m) in the display length unit: {@code 1.100} mm or {@code 0.0433} in */
    public static String diameter(double metres, DisplayUnits u) {
        double v = u.length().fromMetres(metres);
        return u.length() == LengthUnit.MM ? decimals(v, 2, 3) : decimals(v, 4, 5);
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
