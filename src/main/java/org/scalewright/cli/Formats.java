package org.scalewright.cli;

import java.util.Locale;
import org.scalewright.model.Note;
import org.scalewright.model.UnitConversions;

/** Number and wire formatting for the terminal. */
final class Formats {
    private Formats() {
    }

    static String f(double v, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }

    static String b(double v) {
        return String.format(Locale.ROOT, "%.2e", v);
    }

    /** @return the wire as a rebuilder writes it: {@code 14.5} or {@code 1.100 mm}; wound: core + wraps */
    static String wire(Note n) {
        String core = n.wire().musicWireSize().isPresent()
                ? "#" + trim(n.wire().musicWireSize().getAsDouble())
                : f(n.wire().diameter() * 1e3, 3);
        if (!n.isWound()) {
            return core;
        }
        String w = core + "/" + f(n.wrap().inner() * 1e3, 2);
        if (n.wrap().isDouble()) {
            w += "+" + f(n.wrap().outer() * 1e3, 2);
        }
        return w + " " + n.wrap().metal().sheetName().substring(0, 2);
    }

    static String trim(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }

    static String kN(double newtons) {
        return f(newtons / 1000, 1) + " kN (" + String.format(Locale.ROOT, "%,.0f",
                UnitConversions.newtonsToLbf(newtons)) + " lbf)";
    }
}
