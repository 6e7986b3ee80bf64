package org.scalewright.model;

import java.util.OptionalDouble;
import java.util.function.DoubleFunction;

/**
 * How a string's winding and the bare core at its ends fit its speaking length (DESIGN §4): the
 * one rule the sheet reader, {@link Note} and the window's entries apply, each in its own words
 * for where the lengths came from. All lengths in metres.
 */
public enum WindingFit {
    /** nothing to object to */
    FITS,
    /** bare core at the ends of a string that has no winding */
    BARE_ON_PLAIN_WIRE,
    /** the bare core at the two ends is longer than the speaking length */
    BARE_LONGER_THAN_SPEAKING,
    /** one bare end given without the wound length: where the winding stops at the other is unknown */
    ONE_END_WITHOUT_WINDING,
    /** the wound length and the one bare end given are longer than the speaking length */
    WINDING_AND_END_TOO_LONG,
    /** wound length and both bare ends given, and they miss the speaking length by more than the tolerance */
    DO_NOT_ADD_UP;

    /**
     * @param wound    true for a wound string
     * @param speaking speaking length, m
     * @param winding  wound length inside the speaking length, m, or empty
     * @param front    bare core at the front end, m, or empty
     * @param back     bare core at the back end, m, or empty
     * @return the rule the lengths break, or {@link #FITS}
     */
    public static WindingFit of(boolean wound, double speaking, OptionalDouble winding, OptionalDouble front,
                                OptionalDouble back) {
        if (front.isEmpty() && back.isEmpty()) {
            return FITS;
        }
        if (!wound) {
            return BARE_ON_PLAIN_WIRE;
        }
        double bare = front.orElse(0) + back.orElse(0);
        if (bare > speaking) {
            return BARE_LONGER_THAN_SPEAKING;
        }
        if (front.isPresent() != back.isPresent()) {
            if (winding.isEmpty()) {
                return ONE_END_WITHOUT_WINDING;
            }
            return winding.getAsDouble() + bare > speaking + Note.WINDING_TOLERANCE ? WINDING_AND_END_TOO_LONG : FITS;
        }
        if (winding.isPresent() && Math.abs(winding.getAsDouble() + bare - speaking) > Note.WINDING_TOLERANCE) {
            return DO_NOT_ADD_UP;
        }
        return FITS;
    }

    /**
     * @param length how a length (m) is written with its unit: {@code 1470 mm}, {@code 57.87 in}
     * @return what is wrong, in words, with the lengths {@link #of} was given
     */
    public String words(double speaking, OptionalDouble winding, OptionalDouble front, OptionalDouble back,
                        DoubleFunction<String> length) {
        double bare = front.orElse(0) + back.orElse(0);
        return switch (this) {
            case FITS -> "";
            case BARE_ON_PLAIN_WIRE -> "bare core at the ends belongs to a wound string";
            case BARE_LONGER_THAN_SPEAKING -> "the bare core at the ends, " + length.apply(bare) + " together, is "
                    + "longer than the speaking length " + length.apply(speaking);
            case ONE_END_WITHOUT_WINDING -> "give both bare ends, or one of them with the wound length";
            case WINDING_AND_END_TOO_LONG -> "winding " + length.apply(winding.orElse(0)) + " and "
                    + length.apply(bare) + " of bare core at the " + (front.isPresent() ? "front" : "back")
                    + " are longer than the speaking length " + length.apply(speaking);
            case DO_NOT_ADD_UP -> "winding " + length.apply(winding.orElse(0)) + " + bare core "
                    + length.apply(front.orElse(0)) + " (front) + " + length.apply(back.orElse(0)) + " (back) = "
                    + length.apply(winding.orElse(0) + bare) + ", but the speaking length is " + length.apply(speaking)
                    + " (they must agree within " + length.apply(Note.WINDING_TOLERANCE) + ")";
        };
    }

}
