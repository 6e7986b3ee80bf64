package org.scalewright.design.rescale;

import java.util.List;

/**
 * No plan meets the constraints asked for (every string under the maximum percent of breaking
 * strength, wire that never grows toward the treble, wire that exists in the list given). Each
 * reason says what limits the plan, in plain words with the figures.
 */
public final class PlanNotPossible extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;
    private final List<String> reasons;

    /** @param reasons one or more reasons, each a sentence */
    public PlanNotPossible(List<String> reasons) {
        super(String.join("\n", reasons));
        if (reasons.isEmpty()) {
            throw new IllegalArgumentException("a plan that is not possible needs a reason");
        }
        this.reasons = List.copyOf(reasons);
    }

    /** @return the reasons, one sentence each */
    public List<String> reasons() {
        return reasons;
    }
}
