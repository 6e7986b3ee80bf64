package org.scalewright.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.scalewright.design.rescale.PlainPlanOptions;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.CoreWire;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.WireSize;

/** Reads the wire lists of the planning commands: {@code --sizes}, {@code --cores}, {@code --wraps}. */
final class PlanWireLists {
    private PlanWireLists() {
    }

    /**
     * @param text {@code music} (sizes 12–23 in half steps), {@code metric} (0.025 mm steps), or a
     *             comma list of music-wire size numbers ({@code 14.5}) and diameters with a unit
     *             ({@code 0.825mm}, {@code 0.034in})
     * @return the wires
     */
    static List<CoreWire> sizes(String option, String text) {
        String t = text.trim().toLowerCase(Locale.ROOT);
        if (t.equals("music")) {
            return PlainPlanOptions.sizesOf(BuiltInData.musicWireSizes());
        }
        if (t.equals("metric")) {
            return PlainPlanOptions.diameters(BuiltInData.metricPlainWire());
        }
        List<CoreWire> list = new ArrayList<>();
        for (String item : t.split(",")) {
            String s = item.trim();
            if (s.isEmpty()) {
                throw new UserError(option + ": an empty item in the list '" + text + "'");
            }
            Double metres = diameter(option, s);
            if (metres != null) {
                list.add(CoreWire.ofDiameter(metres));
                continue;
            }
            double size;
            try {
                size = Double.parseDouble(s);
            } catch (NumberFormatException e) {
                throw new UserError(option + ": '" + s + "' is neither a music-wire size number (e.g. 14.5) nor a "
                        + "diameter with a unit (e.g. 0.825mm or 0.034in)");
            }
            WireSize w = BuiltInData.musicWireSizes().bySize(size).orElseThrow(() -> new UserError(option + ": size "
                    + s + " is not in the music-wire size table (" + BuiltInData.musicWireSizes().rangeText()
                    + " in half steps); give a diameter such as 0.825mm instead"));
            list.add(CoreWire.ofSize(w.size(), w.diameter()));
        }
        return distinct(option, list);
    }

    /**
     * @param text a comma list of diameters in mm ({@code 1.10,1.15}); a unit suffix {@code mm} or {@code in} may be given
     * @return diameters, m
     */
    static List<Double> diametersMm(String option, String text) {
        List<Double> list = new ArrayList<>();
        for (String item : text.split(",")) {
            String s = item.trim().toLowerCase(Locale.ROOT);
            if (s.isEmpty()) {
                throw new UserError(option + ": an empty item in the list '" + text + "'");
            }
            Double metres = diameter(option, s);
            if (metres == null) {
                try {
                    metres = positive(option, s) * 1e-3;
                } catch (NumberFormatException e) {
                    throw new UserError(option + ": '" + s + "' is not a diameter in mm");
                }
            }
            list.add(metres);
        }
        return list;
    }

    private static List<CoreWire> distinct(String option, List<CoreWire> list) {
        for (int i = 0; i < list.size(); i++) {
            for (int j = i + 1; j < list.size(); j++) {
                if (Math.abs(list.get(i).diameter() - list.get(j).diameter()) < 1e-9) {
                    throw new UserError(String.format(Locale.ROOT, "%s: diameter %.4f mm is listed twice", option,
                            list.get(i).diameter() * 1e3));
                }
            }
        }
        return list;
    }

    /** @return the diameter in metres when the item carries a unit suffix, else null */
    private static Double diameter(String option, String s) {
        for (LengthUnit u : LengthUnit.values()) {
            if (s.endsWith(u.symbol())) {
                String num = s.substring(0, s.length() - u.symbol().length()).trim();
                try {
                    return u.toMetres(positive(option, num));
                } catch (NumberFormatException e) {
                    throw new UserError(option + ": '" + s + "' is not a diameter (a number followed by mm or in)");
                }
            }
        }
        return null;
    }

    private static double positive(String option, String num) {
        double v = Double.parseDouble(num);
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new UserError(option + ": a diameter must be > 0, was " + num);
        }
        return v;
    }
}
