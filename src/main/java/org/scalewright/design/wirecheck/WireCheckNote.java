package org.scalewright.design.wirecheck;

import org.scalewright.model.Note;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.Pitch;

/**
 * One note of a wire check. Percent of breaking strength {@code before} is the present wire and
 * table at the target pitch, {@code after} the replacement at the target pitch, {@code peak} the
 * replacement at the overpull peak.
 *
 * @param presentNote     the note with its present wire
 * @param replacementNote the note with the replacement wire
 * @param wireChange      what the size conversion did
 * @param centsFlat       how far flat of its target the note stands now, cents
 * @param flatSource      where that figure came from
 * @param present         present wire and table at the present pitch (target − centsFlat)
 * @param before          present wire and table at the target pitch
 * @param after           replacement wire and table at the target pitch
 * @param peak            replacement wire and table at the overpull peak
 * @param overDanger      true when the peak is at or above the danger band
 */
public record WireCheckNote(Note presentNote, Note replacementNote, WireChange wireChange, double centsFlat,
                            PitchState.Source flatSource, NoteResult present, NoteResult before, NoteResult after,
                            NoteResult peak, boolean overDanger) {

    /** @return key number */
    public int key() {
        return presentNote.key();
    }

    /** @return note name */
    public String noteName() {
        return before.noteName();
    }

    /** @return percent of breaking strength before, % */
    public double breakPctBefore() {
        return before.breakPct();
    }

    /** @return percent of breaking strength after, % */
    public double breakPctAfter() {
        return after.breakPct();
    }

    /** @return percent of breaking strength at the overpull peak, % */
    public double breakPctPeak() {
        return peak.breakPct();
    }

    /** @return cents above the target pitch at which the replacement reaches its strength */
    public double headroomCentsAfter() {
        return after.headroomCents();
    }

    /** @return the overpull peak above the target pitch, cents (0 when the note is not raised) */
    public double peakCentsAboveTarget() {
        return Math.max(0, Pitch.cents(after.frequency(), peak.frequency()));
    }
}
