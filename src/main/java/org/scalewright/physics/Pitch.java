package org.scalewright.physics;

import org.scalewright.model.Checks;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;

/** Pitch of a key in twelve-tone equal temperament, and cent arithmetic. */
public final class Pitch {
    /** Key number of A4, the reference of the pitch standard. */
    public static final int A4_KEY = 49;

    private Pitch() {
    }

    /**
     * @param key key number (A0 = 1, A4 = 49, C8 = 88; any integer)
     * @param a4  frequency of A4, Hz, &gt; 0
     * @return the equal-tempered frequency f = a4 · 2^((key − 49)/12), Hz
     */
    public static double equalTempered(int key, double a4) {
        Checks.positive("A4 frequency", a4, "Hz", 1);
        return a4 * Math.pow(2.0, (key - A4_KEY) / 12.0);
    }

    /** @return {@code f} raised by {@code cents} (negative lowers), Hz */
    public static double shiftedByCents(double f, double cents) {
        return f * Math.pow(2.0, cents / 1200.0);
    }

    /** @return the interval from {@code from} to {@code to} in cents (positive when {@code to} is higher) */
    public static double cents(double from, double to) {
        return 1200.0 * Math.log(to / from) / Math.log(2.0);
    }

    /**
     * The working pitch of a note: its explicit pitch where the sheet gives one, else the
     * equal-tempered pitch of its key under {@code standard}, shifted by its cents offset.
     *
     * @return frequency, Hz
     */
    public static double working(Note note, PitchStandard standard) {
        double base = note.pitchHz().isPresent() ? note.pitchHz().getAsDouble()
                : equalTempered(note.key(), standard.a4());
        return note.cents() == 0 ? base : shiftedByCents(base, note.cents());
    }
}
