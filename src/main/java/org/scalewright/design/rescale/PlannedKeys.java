package org.scalewright.design.rescale;

import java.util.ArrayList;
import java.util.List;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Note;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;

/**
 * What both planners start from: the keys of a range strung with the kind they plan (plain
 * wire or wound strings), the keys of the other kind they skip, and the target over them.
 *
 * @param index   positions in the scale's note list of the planned keys, bass to treble, at least one
 * @param skipped key numbers in the range strung with the other kind
 */
record PlannedKeys(List<Integer> index, List<Integer> skipped) {

    /** @return the present results of the keys of the range with that kind, bass to treble */
    static List<NoteResult> results(ScaleAnalysis present, KeyRange range, boolean wound) {
        return present.notes().stream().filter(r -> range.contains(r.key()) && r.wound() == wound).toList();
    }

    /**
     * @param quantity   what the target gives
     * @param perSection one smooth trend per section, joined continuously (needs a {@link TargetSpec.Loess})
     * @return the target over the keys of the range with that kind, from their present values
     * @throws PlanNotPossible when the range holds no such key, or a key whose tension is not positive
     */
    static TargetCurve target(ScaleAnalysis present, KeyRange range, TargetSpec spec, TargetQuantity quantity,
                              boolean perSection, boolean wound) {
        refuseImpossible(present, range);
        List<NoteResult> planned = results(present, range, wound);
        if (planned.isEmpty()) {
            throw none(range, wound);
        }
        return perSection ? Targets.buildPerSection(planned, quantity, spec, Targets.DEFAULT_BLEND_KEYS)
                : Targets.build(planned, quantity, spec);
    }

    /**
     * @return the planned and skipped keys of the range
     * @throws PlanNotPossible when the range holds no key of that kind, or a key whose tension is not
     *         positive (its figures describe no string that can exist, so it can be neither a start
     *         nor a neighbour of a plan)
     * @throws IllegalArgumentException when the target does not cover a planned key (a caller's error:
     *         the target is made for the planned keys)
     */
    static PlannedKeys select(ScaleAnalysis present, KeyRange range, boolean wound, TargetCurve target) {
        refuseImpossible(present, range);
        List<Note> notes = present.scale().notes();
        List<Integer> idx = new ArrayList<>();
        List<Integer> skipped = new ArrayList<>();
        for (int i = 0; i < notes.size(); i++) {
            Note n = notes.get(i);
            if (range.contains(n.key())) {
                (n.isWound() == wound ? idx : skipped).add(n.isWound() == wound ? i : n.key());
            }
        }
        if (idx.isEmpty()) {
            throw none(range, wound);
        }
        for (int i : idx) {
            if (!target.covers(notes.get(i).key())) {
                throw new IllegalArgumentException("the target (" + target.description() + ") covers keys "
                        + target.firstKey() + "-" + target.lastKey() + " but " + (wound ? "wound" : "plain") + " key "
                        + notes.get(i).key() + " is to be planned");
            }
        }
        return new PlannedKeys(List.copyOf(idx), List.copyOf(skipped));
    }

    /**
     * Refuses a range holding a note with no positive tension (a short speaking length with a low
     * pitch, DESIGN §3): one reason per such key, and what to do about it.
     */
    private static void refuseImpossible(ScaleAnalysis present, KeyRange range) {
        List<String> impossible = present.impossibleIn(range);
        if (impossible.isEmpty()) {
            return;
        }
        List<String> reasons = new ArrayList<>(impossible);
        reasons.add("keys " + range + " are not planned: correct the speaking length or wire of "
                + (impossible.size() == 1 ? "that key" : "those keys") + " in the sheet, or plan a range without "
                + (impossible.size() == 1 ? "it" : "them"));
        throw new PlanNotPossible(reasons);
    }

    private static PlanNotPossible none(KeyRange range, boolean wound) {
        return new PlanNotPossible(List.of("keys " + range + " hold no " + (wound ? "wound strings" : "plain-wire strings")
                + " to plan"));
    }
}
