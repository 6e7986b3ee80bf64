package org.scalewright.design.rescale;

import java.util.List;
import java.util.Optional;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Scale;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;

/**
 * A proposed rescaling of some keys: the new scale (immutable; the present scale is not
 * touched) and a report of what changes. A window shows {@link #after()} as a third curve and
 * {@link #changes()} as a table, and applies it by taking {@code after().scale()} as the new
 * working scale in one undoable step.
 *
 * @param action      what was planned, in plain words ("plain wire" or "wound strings")
 * @param range       the key range asked for
 * @param before      the analysis of the present scale
 * @param after       the analysis of the proposed scale (same settings)
 * @param quantity    what the target gives a value of
 * @param target      the target curve the keys were planned to
 * @param changes     one entry per planned key, bass to treble
 * @param steps       largest neighbour steps inside each planned section, across section
 *                    boundaries and at the edges, before and after
 * @param maxBreakPct the maximum percent of breaking strength every planned string stays at or under, %
 * @param notes       things the user should know (skipped keys, strings still in the caution band)
 * @param limits      why a neighbour step over the limit remains and what limits it
 */
public record Proposal(String action, KeyRange range, ScaleAnalysis before, ScaleAnalysis after,
                       TargetQuantity quantity, TargetCurve target, List<KeyChange> changes, List<StepCheck> steps,
                       double maxBreakPct, List<String> notes, List<String> limits) {

    public Proposal {
        changes = List.copyOf(changes);
        steps = List.copyOf(steps);
        notes = List.copyOf(notes);
        limits = List.copyOf(limits);
    }

    /** @return the proposed scale */
    public Scale proposedScale() {
        return after.scale();
    }

    /** @return the number of keys whose wire or wrap changes */
    public long changedCount() {
        return changes.stream().filter(KeyChange::changed).count();
    }

    /** @return the planned string with the highest percent of breaking strength after the proposal */
    public Optional<NoteResult> highestAfter() {
        return changes.stream().map(KeyChange::afterResult)
                .max((a, b) -> Double.compare(a.breakPct(), b.breakPct()));
    }

    /** @return true when every planned string is at or under {@link #maxBreakPct()} */
    public boolean allUnderMax() {
        return changes.stream().allMatch(c -> c.afterResult().breakPct() <= maxBreakPct);
    }

    /** @return true when every neighbour step checked is within the limit after the proposal */
    public boolean stepsWithinLimit() {
        return steps.stream().allMatch(StepCheck::withinLimit);
    }
}
