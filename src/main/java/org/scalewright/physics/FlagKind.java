package org.scalewright.physics;

/**
 * Why a note is flagged, and how seriously a rebuilder should take it. The severity is decided
 * here once; the terminal marks, the window's tints, status line and flags list and the report
 * all ask {@link #severity()}.
 */
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
    /**
     * a legal but implausible value: shown as danger ({@link #severity()}), because every other
     * figure of the note rests on it and a rebuilder must look at it before trusting any of them
     */
    IMPLAUSIBLE("implausible value"),
    /** the strength table had to be extrapolated for this diameter */
    OUTSIDE_STRENGTH_TABLE("outside strength table"),
    /**
     * a plain wire thicker than its bass-side plain neighbour in the same section: against how
     * plain sizes run (staying or stepping down toward the treble), and it carries a step in
     * tension with it; a caution, like the tension step
     */
    SIZE_GROWS("size grows toward the treble"),
    /**
     * a single plain wire of another size between two neighbours of one size (16, 17, 16): most
     * often a replacement of a near size; plain-wire stress hardly depends on the diameter, so a
     * notice, to restore the scale's size at the next restringing
     */
    ODD_SIZE("single odd size");

    /** How seriously a flag is to be taken, most serious first. */
    public enum Severity {
        /** look at this note before anything else: it may break, or its data is suspect */
        DANGER,
        /** worth a look: close to the limits, or out of line with its neighbour */
        CAUTION,
        /** for information */
        NOTICE
    }

    private final String word;

    FlagKind(String word) {
        this.word = word;
    }

    /** @return the flag in plain words */
    public String word() {
        return word;
    }

    /** @return how seriously the flag is to be taken */
    public Severity severity() {
        return switch (this) {
            case DANGER, OVER_STRENGTH, IMPLAUSIBLE -> Severity.DANGER;
            case CAUTION, NEIGHBOUR_STEP, SIZE_GROWS -> Severity.CAUTION;
            case LOW_STRESS, OUTSIDE_STRENGTH_TABLE, ODD_SIZE -> Severity.NOTICE;
        };
    }

    /** @return true when the flag is shown as danger */
    public boolean isDanger() {
        return severity() == Severity.DANGER;
    }
}
