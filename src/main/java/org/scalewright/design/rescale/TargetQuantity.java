package org.scalewright.design.rescale;

import org.scalewright.physics.NoteResult;

/** What a target curve gives a value of. */
public enum TargetQuantity {
    /** per-string tension, N */
    TENSION("tension", "N"),
    /** percent of the (core) wire's breaking strength, % */
    BREAK_PCT("percent of breaking strength", "%");

    private final String words;
    private final String unit;

    TargetQuantity(String words, String unit) {
        this.words = words;
        this.unit = unit;
    }

    /** @return the quantity's value in a note's result (N or %) */
    public double of(NoteResult r) {
        return this == TENSION ? r.tension() : r.breakPct();
    }

    /** @return the quantity in plain words */
    public String words() {
        return words;
    }

    /** @return the unit symbol of the quantity */
    public String unit() {
        return unit;
    }
}
