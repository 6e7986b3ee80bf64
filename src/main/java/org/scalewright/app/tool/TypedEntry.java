package org.scalewright.app.tool;

import java.util.List;
import java.util.Locale;

/** Reads what a user typed into an entry field of the window. */
public final class TypedEntry {
    private TypedEntry() {
    }

    /** @return the number in {@code text} (a unit after it is allowed), or null with a problem added */
    public static Double number(String text, String what, String unit, List<String> bad) {
        String t = text == null ? "" : text.strip().replace(',', '.');
        if (t.toLowerCase(Locale.ROOT).endsWith(unit.toLowerCase(Locale.ROOT))) {
            t = t.substring(0, t.length() - unit.length()).strip();
        }
        try {
            double v = Double.parseDouble(t);
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // named below
        }
        bad.add(what + ": expected a number" + (unit.equals("c") ? " of cents" : " in " + unit) + ", was '"
                + (text == null ? "" : text.strip()) + "'");
        return null;
    }
}
