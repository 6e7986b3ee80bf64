package org.scalewright.design.orders;

import java.util.OptionalDouble;

/**
 * One plain-wire size to buy. SI throughout.
 *
 * @param diameter         wire diameter, m
 * @param musicWireSize    its music-wire size number, when the sheet named the size
 * @param keys             the keys strung with it, as ranges ({@code 29-30, 41})
 * @param notes            number of notes strung with it
 * @param strings          number of strings
 * @param pieces           pieces of wire to cut (a looped pair is one piece)
 * @param estimatedStrings strings whose length was estimated from the speaking length (the
 *                         sheet gave no stretched length)
 * @param length           total length to buy, m: per string its stretched length (or speaking
 *                         length plus the length allowance) plus the pin allowance
 * @param massPerLength    μ of the wire, kg/m
 * @param mass             μ × length, kg
 */
public record WireOrderRow(double diameter, OptionalDouble musicWireSize, String keys, int notes, int strings,
                           int pieces, int estimatedStrings, double length, double massPerLength, double mass) {

    public WireOrderRow {
        musicWireSize = musicWireSize == null ? OptionalDouble.empty() : musicWireSize;
    }
}
