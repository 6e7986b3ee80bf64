package org.scalewright.model;

import java.time.LocalDate;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * One broken string as a rebuilder records it.
 *
 * @param date      the day it broke
 * @param key       key number of the note (DESIGN §2)
 * @param string    which string of the unison, 1 to 3 counted from the left, or empty when not recorded
 * @param breakHz   the pitch at which it broke, Hz (read off a tuning device), or empty when not known
 * @param during    what was being done
 * @param place     where along the string it broke
 * @param wireBatch the wire's batch or coil (free text, "" when not known)
 * @param remark    free text
 */
public record StringBreak(LocalDate date, int key, OptionalInt string, OptionalDouble breakHz, BreakActivity during,
                          BreakPlace place, String wireBatch, String remark) {
    /** The highest pitch accepted for a break, Hz: the highest accepted in a scale sheet. */
    public static final double HIGHEST_HZ = 20_000;

    /**
     * @throws InvalidInput when the key is outside the accepted keys, the string is not 1 to 3 or
     *                      the pitch is not above 0 and at most {@link #HIGHEST_HZ}
     */
    public StringBreak {
        if (date == null || during == null || place == null) {
            throw new IllegalArgumentException("a break needs a date, an activity and a place");
        }
        if (!KeyNames.accepted(key)) {
            throw new InvalidInput(KeyNames.outOfRange(Integer.toString(key)));
        }
        string = string == null ? OptionalInt.empty() : string;
        if (string.isPresent() && (string.getAsInt() < 1 || string.getAsInt() > 3)) {
            throw new InvalidInput("which string of the unison must be 1, 2 or 3, was " + string.getAsInt());
        }
        breakHz = breakHz == null ? OptionalDouble.empty() : breakHz;
        if (breakHz.isPresent() && !(breakHz.getAsDouble() > 0 && breakHz.getAsDouble() <= HIGHEST_HZ)) {
            throw new InvalidInput("pitch at break must be more than 0 and at most " + NumberText.plain(HIGHEST_HZ)
                    + " Hz, was " + NumberText.plain(breakHz.getAsDouble()));
        }
        wireBatch = wireBatch == null ? "" : wireBatch.strip();
        remark = remark == null ? "" : remark.strip();
    }
}
