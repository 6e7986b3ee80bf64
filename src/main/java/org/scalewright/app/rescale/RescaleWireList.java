package org.scalewright.app.rescale;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.scalewright.design.rescale.PlainPlanOptions;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.CoreWire;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.WireSize;

/** The plain wire the rescaling panel may choose from: music-wire sizes, metric wire, or the user's list. */
enum RescaleWireList {
    MUSIC("music wire 12–23"),
    METRIC("metric wire"),
    CUSTOM("my list");

    private final String label;

    RescaleWireList(String label) {
        this.label = label;
    }

    @Override
    public String toString() {
        return label;
    }

    /**
     * @param custom for {@link #CUSTOM}: size numbers ({@code 14.5}) and diameters with a unit
     *               ({@code 0.825mm}, {@code 0.034in}), separated by commas or spaces
     * @return the wires
     * @throws IllegalArgumentException naming the item that is not a size or a diameter
     */
    List<CoreWire> wires(String custom) {
        return switch (this) {
            case MUSIC -> PlainPlanOptions.sizesOf(BuiltInData.musicWireSizes());
            case METRIC -> PlainPlanOptions.diameters(BuiltInData.metricPlainWire());
            case CUSTOM -> parse(custom == null ? "" : custom);
        };
    }

    private static List<CoreWire> parse(String text) {
        List<CoreWire> list = new ArrayList<>();
        for (String item : text.trim().toLowerCase(Locale.ROOT).split("[,;\\s]+")) {
            if (item.isEmpty()) {
                continue;
            }
            list.add(wire(item));
        }
        if (list.isEmpty()) {
            throw new IllegalArgumentException("my wire list is empty: give size numbers (14.5) or diameters "
                    + "(0.825mm, 0.034in), separated by commas");
        }
        return list;
    }

    private static CoreWire wire(String item) {
        for (LengthUnit u : LengthUnit.values()) {
            if (item.endsWith(u.symbol())) {
                double v = number(item.substring(0, item.length() - u.symbol().length()), item);
                return CoreWire.ofDiameter(u.toMetres(v));
            }
        }
        double size = number(item, item);
        WireSize w = BuiltInData.musicWireSizes().bySize(size).orElseThrow(() -> new IllegalArgumentException(
                "wire list: size " + item + " is not in the music-wire size table ("
                        + BuiltInData.musicWireSizes().rangeText() + "); give a diameter such as 0.825mm instead"));
        return CoreWire.ofSize(w.size(), w.diameter());
    }

    private static double number(String text, String item) {
        try {
            double v = Double.parseDouble(text.trim());
            if (v > 0 && !Double.isInfinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // said below
        }
        throw new IllegalArgumentException("wire list: '" + item + "' is neither a size number (14.5) nor a "
                + "diameter with a unit (0.825mm, 0.034in)");
    }
}
