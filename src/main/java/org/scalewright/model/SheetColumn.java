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
    WRAP_METAL("wrap_metal", false),
    PITCH_HZ("pitch_hz", false),
    CENTS("cents", false),
    STRIKE("strike", true),
    TOTAL_LENGTH("total", true),
    WINDING_LENGTH("winding", true),
    SECTION("section", false),
    REMARK("remark", false);

    private final String stem;
    private final boolean length;

    SheetColumn(String stem, boolean length) {
        this.stem = stem;
        this.length = length;
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
