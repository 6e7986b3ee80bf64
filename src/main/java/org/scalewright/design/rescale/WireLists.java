package org.scalewright.design.rescale;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.scalewright.model.CoreWire;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.WireSize;
import org.scalewright.model.WireSizeTable;

/**
 * The one parser of the wire lists the planners take (plain wire, cores, wrap wire), for the
 * command line and the window alike. Items are separated by commas, semicolons or spaces; empty
 * items are passed over; a diameter listed twice, an unknown size or a value that is not a
 * diameter is refused with {@link InvalidInput} naming the list, the item and what is accepted.
 */
public final class WireLists {
    /** Name of the plain-wire list in messages. */
    public static final String PLAIN = "plain wire list";
    /** Name of the core list in messages. */
    public static final String CORES = "core list";
    /** Name of the wrap-wire list in messages. */
    public static final String WRAPS = "wrap wire list";

    private WireLists() {
    }

    /**
     * @param text   {@code music} (every size of {@code music}), {@code metric} (the diameters of
     *               {@code metric}), or a list of music-wire size numbers ({@code 14.5}) and
     *               diameters with a unit ({@code 0.825mm}, {@code 0.034in})
     * @param music  the music-wire size table
     * @param metric the metric plain wire, diameters in m
     * @return the wires, in the order given, each diameter once
     */
    public static List<CoreWire> plainWire(String text, WireSizeTable music, List<Double> metric) {
        String t = text == null ? "" : text.trim().toLowerCase(Locale.ROOT);
        if (t.equals("music")) {
            return PlainPlanOptions.sizesOf(music);
        }
        if (t.equals("metric")) {
            return PlainPlanOptions.diameters(metric);
        }
        List<CoreWire> list = new ArrayList<>();
        for (String item : items(PLAIN, t, "size numbers (14.5) or diameters with a unit (0.825mm, 0.034in)")) {
            Double metres = withUnit(PLAIN, item);
            if (metres != null) {
                list.add(CoreWire.ofDiameter(metres));
                continue;
            }
            double size;
            try {
                size = Double.parseDouble(item);
            } catch (NumberFormatException e) {
                throw new InvalidInput(PLAIN + ": '" + item + "' is neither a music-wire size number (e.g. 14.5) nor a "
                        + "diameter with a unit (e.g. 0.825mm or 0.034in)");
            }
            WireSize w = music.bySize(size).orElseThrow(() -> new InvalidInput(PLAIN + ": size " + item
                    + " is not in the music-wire size table (" + music.rangeText()
                    + " in half steps); give a diameter such as 0.825mm instead"));
            list.add(CoreWire.ofSize(w.size(), w.diameter()));
        }
        distinct(PLAIN, list.stream().map(CoreWire::diameter).toList());
        return List.copyOf(list);
    }

    /**
     * @param list {@link #CORES} or {@link #WRAPS}: the list's name in messages
     * @param text diameters in mm ({@code 1.10,1.15}); a unit {@code mm} or {@code in} may follow each
     * @return the diameters, m, in the order given, each once
     */
    public static List<Double> diameters(String list, String text) {
        List<Double> out = new ArrayList<>();
        for (String item : items(list, text == null ? "" : text.trim().toLowerCase(Locale.ROOT),
                "diameters in mm (1.05, 1.1)")) {
            Double metres = withUnit(list, item);
            if (metres == null) {
                try {
                    metres = positive(list, item, Double.parseDouble(item)) * 1e-3;
                } catch (NumberFormatException e) {
                    throw new InvalidInput(list + ": '" + item + "' is not a diameter in mm");
                }
            }
            out.add(metres);
        }
        distinct(list, out);
        return List.copyOf(out);
    }

    /**
     * Refuses a diameter given twice (closer than 1 nm).
     *
     * @param list      the list's name in messages
     * @param diameters m
     */
    public static void distinct(String list, List<Double> diameters) {
        List<Double> sorted = new ArrayList<>(diameters);
        sorted.sort(Comparator.naturalOrder());
        for (int i = 1; i < sorted.size(); i++) {
            if (Math.abs(sorted.get(i) - sorted.get(i - 1)) < 1e-9) {
                throw new InvalidInput(String.format(Locale.ROOT, "%s: diameter %.3f mm is listed twice", list,
                        sorted.get(i) * 1e3));
            }
        }
    }

    private static List<String> items(String list, String text, String expected) {
        List<String> items = new ArrayList<>();
        for (String s : text.split("[,;\\s]+")) {
            if (!s.isEmpty()) {
                items.add(s);
            }
        }
        if (items.isEmpty()) {
            throw new InvalidInput(list + " is empty: give " + expected + ", separated by commas");
        }
        return items;
    }

    /** @return the diameter in metres when the item carries a unit, else null */
    private static Double withUnit(String list, String item) {
        for (LengthUnit u : LengthUnit.values()) {
            if (item.endsWith(u.symbol())) {
                String num = item.substring(0, item.length() - u.symbol().length()).trim();
                try {
                    return u.toMetres(positive(list, item, Double.parseDouble(num)));
                } catch (NumberFormatException e) {
                    throw new InvalidInput(list + ": '" + item + "' is not a diameter (a number followed by mm or in)");
                }
            }
        }
        return null;
    }

    private static double positive(String list, String item, double v) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new InvalidInput(list + ": a diameter must be more than 0, was " + item);
        }
        return v;
    }
}
