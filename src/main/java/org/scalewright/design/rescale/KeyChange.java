package org.scalewright.design.rescale;

import org.scalewright.model.Note;
import org.scalewright.physics.NoteResult;

/**
 * One planned key of a proposal: the note before and after, their computed results, and the
 * target it was planned to.
 *
 * @param before       the note as it is
 * @param after        the note as proposed (equal to {@code before} when nothing changes)
 * @param beforeResult the present note's result at its working pitch
 * @param afterResult  the proposed note's result at its working pitch
 * @param target       the target value at this key, in the proposal's {@link TargetQuantity}
 * @param deviationPct how far the proposed value lies from the target, % of the target
 *                     (positive: above the target)
 */
public record KeyChange(Note before, Note after, NoteResult beforeResult, NoteResult afterResult, double target,
                        double deviationPct) {

    /** @return the key number */
    public int key() {
        return before.key();
    }

    /** @return true when the proposal changes the wire or the wrap of this key */
    public boolean changed() {
        return !before.equals(after);
    }
}
