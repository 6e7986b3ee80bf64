package org.scalewright.design.rescale;

import java.util.ArrayList;
import java.util.List;
import org.scalewright.physics.NoteResult;

/**
 * Builds the target curve for a set of planned keys from their present results: one curve over
 * all of them, or one per section with each joined to the next continuously.
 */
public final class Targets {
    /** Default number of keys either side of a join over which the curves may bend. */
    public static final int DEFAULT_BLEND_KEYS = 4;

    private Targets() {
    }

    /**
     * @param planned    the present results of the planned keys, bass to treble, at least one
     * @param quantity   what the target gives a value of
     * @param spec       how to make the curve
     * @return one curve through all the planned keys
     */
    public static TargetCurve build(List<NoteResult> planned, TargetQuantity quantity, TargetSpec spec) {
        if (planned.isEmpty()) {
            throw new IllegalArgumentException("a target needs at least one planned key");
        }
        int[] keys = planned.stream().mapToInt(NoteResult::key).toArray();
        double[] present = planned.stream().mapToDouble(quantity::of).toArray();
        return spec.build(keys, present);
    }

    /**
     * One curve per run of planned keys with the same section label, each joined to the next
     * so the target runs on continuously across the section boundary (both curves bend
     * half-way, {@link TargetCurve#join}).
     *
     * @param spec      a {@link TargetSpec.Loess} (each section gets its own smooth trend)
     * @param blendKeys keys next to each join over which the curves may bend, &ge; 1
     */
    public static TargetCurve buildPerSection(List<NoteResult> planned, TargetQuantity quantity, TargetSpec spec,
                                              int blendKeys) {
        if (planned.isEmpty()) {
            throw new IllegalArgumentException("a target needs at least one planned key");
        }
        if (!(spec instanceof TargetSpec.Loess)) {
            throw new IllegalArgumentException("a target per section is made from the smooth trend of each section; "
                    + "a line, spline or given curve already spans the sections");
        }
        List<List<NoteResult>> runs = new ArrayList<>();
        List<NoteResult> run = new ArrayList<>();
        for (NoteResult r : planned) {
            if (!run.isEmpty() && !run.get(run.size() - 1).section().equals(r.section())) {
                runs.add(run);
                run = new ArrayList<>();
            }
            run.add(r);
        }
        runs.add(run);
        TargetCurve joined = null;
        for (List<NoteResult> part : runs) {
            TargetCurve c = build(part, quantity, spec);
            c = c.describedAs(c.description() + " per section");
            joined = joined == null ? c : TargetCurve.join(joined, c, blendKeys, 0.5);
        }
        return joined;
    }
}
