package org.scalewright.physics;

/** Why a note is flagged. */
public enum FlagKind {
    /** percent of breaking strength below the low band */
    LOW_STRESS("low stress"),
    /** in the caution band */
    CAUTION("caution band"),
    /** in the danger band */
    DANGER("danger band"),
    /** at or above 100 % of breaking strength: the string would break at pitch */
    OVER_STRENGTH("over breaking strength"),
    /** per-string tension steps from the next key by more than the neighbour step */
    NEIGHBOUR_STEP("tension step"),
    /** a legal but implausible value */
    IMPLAUSIBLE("implausible value"),
    /** the strength table had to be extrapolated for this diameter */
    OUTSIDE_STRENGTH_TABLE("outside strength table");

    private final String word;

    FlagKind(String word) {
        this.word = word;
    }

    /** @return the flag in plain words */
    public String word() {
        return word;
    }
}
