package org.scalewright.app.rescale;

import java.util.List;
import org.scalewright.design.rescale.WireLists;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.CoreWire;
import org.scalewright.model.InvalidInput;

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
     *               ({@code 0.825mm}, {@code 0.034in}), separated by commas, semicolons or spaces
     * @return the wires
     * @throws InvalidInput naming the item that is not a size or a diameter (the one message of
     *         {@link WireLists}, also shown by the command line)
     */
    List<CoreWire> wires(String custom) {
        return WireLists.plainWire(switch (this) {
            case MUSIC -> "music";
            case METRIC -> "metric";
            case CUSTOM -> custom == null ? "" : custom;
        }, BuiltInData.musicWireSizes(), BuiltInData.metricPlainWire());
    }
}
