package org.scalewright.model;

/**
 * The quantities a scale sheet can hold, each one column. Length columns carry a unit suffix
 * ({@code _mm} or {@code _in}); {@link #WIRE_SIZE} is a music-wire size number.
 */
public enum SheetColumn {
    KEY("key", false),
    STRINGS("strings", false),
    SPEAKING_LENGTH("length", true),
    WIRE_SIZE("wire", false),
    WIRE_DIAMETER("wire", true),
    WRAP1("wrap1", true),
    WRAP2("wrap2", true),
    /** Outside diameter of a wound string as measured; instead of the wraps. */
    OD("od", true),
    /** Diameter over the first layer of a double-wound string as measured; with {@link #OD}. */
    OD1("od1", true),
    WRAP_METAL("wrap_metal", false),
    PITCH_HZ("pitch_hz", false),
    CENTS("cents", false),
    STRIKE("strike", true),
    TOTAL_LENGTH("total", true),
    WINDING_LENGTH("winding", true),
    /** Bare core at the front end inside the speaking length. */
    BARE_FRONT("bare_front", true),
    /** Bare core at the back end inside the speaking length. */
    BARE_BACK("bare_back", true),
    /** Back length, bridge pin to hitch pin: where the winding starts, measured from the hitch. */
    BACK_LENGTH("back", true),
    SECTION("section", false),
    REMARK("remark", false);

    private final String stem;
    private final boolean length;

    SheetColumn(String stem, boolean length) {
        this.stem = stem;
        this.length = length;
    }

    /**
     * @return true for the columns a sheet holds only where its notes need them (another form of
     *         entry, or a detail): left out of the layout of a scale that has none yet
     */
    public boolean onlyWhereNeeded() {
        return this == OD || this == OD1 || this == BARE_FRONT || this == BARE_BACK || this == BACK_LENGTH;
    }

    /** @return the column name without unit suffix */
    public String stem() {
        return stem;
    }

    /** @return true for a length column, written with a unit suffix */
    public boolean isLength() {
        return length;
    }

    /** @return the header name in the given unit ({@code length_mm}); the stem for non-length columns */
    public String header(LengthUnit unit) {
        return length ? stem + "_" + unit.symbol() : stem;
    }
}
