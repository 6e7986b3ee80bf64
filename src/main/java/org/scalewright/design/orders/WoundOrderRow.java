package org.scalewright.design.orders;

import java.util.OptionalDouble;
import org.scalewright.model.WrapMetal;

/**
 * One wound string to be made, {@code count} times (once per string of its note). SI throughout.
 *
 * @param key             key number
 * @param noteName        note name, sharps
 * @param section         section label ("" when none)
 * @param frequency       working pitch, Hz
 * @param count           how many of this string to make: the note's strings per note
 * @param coreDiameter    core diameter, m
 * @param coreSize        the core's music-wire size number, when the sheet gave one
 * @param wrapInner       first (inner) wrap wire diameter, m
 * @param wrapOuter       second (outer) wrap wire diameter, m; 0 for a single-wound string
 * @param metal           wrap metal
 * @param stretchedLength stretched length hitch pin to tuning pin, m, where the sheet gives it
 * @param woundLength     wound length, m, where the sheet gives it
 * @param speakingLength  speaking length, m
 * @param tension         tension per string at the working pitch, N
 * @param massPerLength   μ of the wound string, kg/m
 */
public record WoundOrderRow(int key, String noteName, String section, double frequency, int count,
                            double coreDiameter, OptionalDouble coreSize, double wrapInner, double wrapOuter,
                            WrapMetal metal, OptionalDouble stretchedLength, OptionalDouble woundLength,
                            double speakingLength, double tension, double massPerLength) {

    public WoundOrderRow {
        coreSize = coreSize == null ? OptionalDouble.empty() : coreSize;
        stretchedLength = stretchedLength == null ? OptionalDouble.empty() : stretchedLength;
        woundLength = woundLength == null ? OptionalDouble.empty() : woundLength;
        if (count < 1) {
            throw new IllegalArgumentException("count of strings to make must be >= 1, was " + count);
        }
    }

    /** @return true for a double-wound string */
    public boolean doubleWound() {
        return wrapOuter > 0;
    }
}
