package org.scalewright.design.orders;

import java.util.List;
import java.util.OptionalDouble;
import org.scalewright.model.WrapMetal;

/**
 * One wound-string design to be made {@code count} times: the strings of one note, or of several
 * notes whose strings are identical to the precision printed (same core, wraps, metal and
 * lengths). SI throughout.
 *
 * @param keys             the keys strung with it, bass to treble
 * @param noteNames        their note names, sharps, in the same order
 * @param count            how many of this string to make: the strings per note summed over the keys
 * @param coreDiameter     core diameter, m
 * @param coreSize         the core's music-wire size number, when the sheet gave one
 * @param wrapInner        first (inner) wrap wire diameter, m
 * @param wrapOuter        second (outer) wrap wire diameter, m; 0 for a single-wound string
 * @param metal            wrap metal
 * @param outsideDiameter  outside diameter over the winding, m: as the sheet gave it, else core + 2 w1 + 2 w2
 * @param speakingLength   speaking length, m
 * @param woundLength      wound length inside the speaking length, m: given, or the speaking length less
 *                         the bare ends
 * @param bareFront        bare core at the front (tuning-pin) end inside the speaking length, m
 * @param bareBack         bare core at the back (bridge, hitch-pin) end inside the speaking length, m
 * @param bareEnds         how the bare ends were found
 * @param stretchedLength  stretched length hitch pin to tuning pin, m, where the sheet gives it
 * @param windingStart     where the winding starts measured from the hitch pin, m: back length + bare
 *                         back, where the back length or the stretched length is known (see
 *                         {@link WoundOrder#windingStart})
 * @param windingStartFrom how the winding start was found
 */
public record WoundOrderRow(List<Integer> keys, List<String> noteNames, int count,
                            double coreDiameter, OptionalDouble coreSize, double wrapInner, double wrapOuter,
                            WrapMetal metal, double outsideDiameter, double speakingLength, double woundLength,
                            double bareFront, double bareBack, BareEndsFrom bareEnds,
                            OptionalDouble stretchedLength, OptionalDouble windingStart,
                            WindingStartFrom windingStartFrom) {

    /** How a row's winding start was found. */
    public enum WindingStartFrom {
        /** from the back length the sheet gives and the bare core at the back as given */
        BACK_LENGTH("back length"),
        /**
         * the back length taken as half of stretched less speaking length, or the bare core at the
         * back taken as half of what the winding leaves: to be checked
         */
        ESTIMATE("estimate"),
        /** neither back nor stretched length given: no winding start */
        UNKNOWN("");

        private final String word;

        WindingStartFrom(String word) {
            this.word = word;
        }

        /** @return the word written in the order; blank where there is no winding start */
        public String word() {
            return word;
        }
    }

    /** Where a row's bare ends come from. */
    public enum BareEndsFrom {
        /** both given by the sheet, or one given and the other what the winding leaves */
        GIVEN("given"),
        /** only the wound length given: the bare core split equally between the two ends */
        SPLIT("split equally"),
        /** neither wound length nor bare ends given: the winding fills the speaking length */
        NONE("none given");

        private final String word;

        BareEndsFrom(String word) {
            this.word = word;
        }

        /** @return the word written in the order */
        public String word() {
            return word;
        }
    }

    public WoundOrderRow {
        keys = List.copyOf(keys);
        noteNames = List.copyOf(noteNames);
        coreSize = coreSize == null ? OptionalDouble.empty() : coreSize;
        stretchedLength = stretchedLength == null ? OptionalDouble.empty() : stretchedLength;
        windingStart = windingStart == null ? OptionalDouble.empty() : windingStart;
        windingStartFrom = windingStart.isEmpty() ? WindingStartFrom.UNKNOWN
                : windingStartFrom == null || windingStartFrom == WindingStartFrom.UNKNOWN ? WindingStartFrom.ESTIMATE
                : windingStartFrom;
        if (keys.isEmpty() || keys.size() != noteNames.size()) {
            throw new IllegalArgumentException("a wound-order row needs one note name per key, keys " + keys);
        }
        if (count < keys.size()) {
            throw new IllegalArgumentException("count of strings to make must be at least one per key, was " + count);
        }
    }

    /** @return the first (lowest) key of the row */
    public int key() {
        return keys.get(0);
    }

    /** @return true for a double-wound string */
    public boolean doubleWound() {
        return wrapOuter > 0;
    }
}
