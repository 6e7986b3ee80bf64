package org.scalewright.model;

import java.util.OptionalDouble;

/**
 * The plain wire of a note, or the core of a wound string.
 *
 * @param diameter      wire diameter, m, &gt; 0
 * @param musicWireSize the music-wire size number the sheet gave (e.g. 14.5), or empty when
 *                      the sheet gave a diameter
 */
public record CoreWire(double diameter, OptionalDouble musicWireSize) {

    public CoreWire {
        Checks.positive("wire diameter", diameter, "mm", 1e3);
        if (musicWireSize == null) {
            musicWireSize = OptionalDouble.empty();
        }
    }

    /** @return a wire given by its diameter in metres */
    public static CoreWire ofDiameter(double diameter) {
        return new CoreWire(diameter, OptionalDouble.empty());
    }

    /** @return a wire given by a size number with its diameter in metres */
    public static CoreWire ofSize(double size, double diameter) {
        return new CoreWire(diameter, OptionalDouble.of(size));
    }
}
