package org.scalewright.design.stretch;

import java.util.Locale;
import org.scalewright.model.InvalidInput;

/**
 * The octave a tuner makes beatless when stretching: the lower note's partial 2m against the
 * upper note's partial m. 2:1 is m = 1 (the upper note's fundamental against the lower note's
 * second partial), 4:2 is m = 2, 6:3 is m = 3.
 */
public enum OctaveType {
    /** m = 1: upper fundamental against lower partial 2. */
    TWO_ONE(1),
    /** m = 2: upper partial 2 against lower partial 4. */
    FOUR_TWO(2),
    /** m = 3: upper partial 3 against lower partial 6. */
    SIX_THREE(3);

    private final int m;

    OctaveType(int m) {
        this.m = m;
    }

    /** @return m, the partial of the upper note that is matched (1, 2 or 3) */
    public int upperPartial() {
        return m;
    }

    /** @return 2m, the partial of the lower note that is matched (2, 4 or 6) */
    public int lowerPartial() {
        return 2 * m;
    }

    /** @return the octave type as written, {@code 2:1}, {@code 4:2} or {@code 6:3} */
    public String label() {
        return (2 * m) + ":" + m;
    }

    /** @return the label with the colon replaced, for column and file names ({@code 4_2}) */
    public String fileLabel() {
        return (2 * m) + "_" + m;
    }

    /**
     * @param text {@code 2:1}, {@code 4:2} or {@code 6:3} (blanks ignored)
     * @return the octave type
     * @throws IllegalArgumentException naming the text and the choices
     */
    public static OctaveType parse(String text) {
        String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
        for (OctaveType o : values()) {
            if (o.label().equals(t)) {
                return o;
            }
        }
        throw new InvalidInput("octave type must be 2:1, 4:2 or 6:3, was '" + text + "'");
    }

    @Override
    public String toString() {
        return label();
    }
}
