package org.scalewright.physics;

/** Where a string's percent of breaking strength lies among the {@link StressBands}. */
public enum StressBand {
    LOW("low"), NORMAL("normal"), CAUTION("caution"), DANGER("danger");

    private final String word;

    StressBand(String word) {
        this.word = word;
    }

    /** @return the band in plain words */
    public String word() {
        return word;
    }
}
