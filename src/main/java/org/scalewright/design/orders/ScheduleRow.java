package org.scalewright.design.orders;

import java.util.OptionalDouble;
import org.scalewright.model.Wrap;

/**
 * One key of the string schedule, SI throughout.
 *
 * @param key             key number
 * @param noteName        note name, sharps
 * @param section         section label ("" when none)
 * @param strings         strings per note
 * @param frequency       working pitch, Hz
 * @param plainSize       the music-wire size number of the plain wire or core, when the sheet gave one
 * @param coreDiameter    plain wire or core diameter, m
 * @param wrap            the winding of a wound string, or null for plain wire
 * @param speakingLength  speaking length, m
 * @param stretchedLength stretched length hitch pin to tuning pin, m, where the sheet gives it
 * @param tension         tension per string, N
 * @param breakPct        percent of breaking strength, %
 * @param flagged         true when the analysis raised a flag on the note
 */
public record ScheduleRow(int key, String noteName, String section, int strings, double frequency,
                          OptionalDouble plainSize, double coreDiameter, Wrap wrap, double speakingLength,
                          OptionalDouble stretchedLength, double tension, double breakPct, boolean flagged) {

    public ScheduleRow {
        plainSize = plainSize == null ? OptionalDouble.empty() : plainSize;
        stretchedLength = stretchedLength == null ? OptionalDouble.empty() : stretchedLength;
        section = section == null ? "" : section;
    }

    /** @return true for a wound string */
    public boolean wound() {
        return wrap != null;
    }
}
