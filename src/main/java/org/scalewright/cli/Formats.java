package org.scalewright.cli;

import org.scalewright.model.Note;
import org.scalewright.model.NumberText;
import org.scalewright.model.UnitConversions;
import org.scalewright.model.WireNotation;

/** The terminal's short names for the number and wire texts of {@link NumberText} and {@link WireNotation}. */
final class Formats {
    private Formats() {
    }

    static String f(double v, int decimals) {
        return NumberText.fixed(v, decimals);
    }

    static String b(double v) {
        return NumberText.scientific(v, 2);
    }

    /** @return the wire in the program's one notation ({@link WireNotation}), diameters in mm */
    static String wire(Note n) {
        return WireNotation.of(n);
    }

    static String trim(double v) {
        return NumberText.plain(v);
    }

    static String kN(double newtons) {
        return f(newtons / 1000, 1) + " kN (" + NumberText.grouped(UnitConversions.newtonsToLbf(newtons)) + " lbf)";
    }
}
