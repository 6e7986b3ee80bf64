package org.scalewright.design.rescale;

import java.util.List;

/**
 * No plan meets the constraints asked for (every string under the maximum percent of breaking
 * strength, wire that never grows toward the treble, wire that exists in the list given). Each
 * reason says what limits the plan, in plain words with the figures. Its own exception, not an
 * {@link IllegalArgumentException} (a broken engine precondition, a program error) nor an
 * {@link org.scalewright.model.InvalidInput} (each value given was acceptable; together they
 * allow no plan): the command line answers it with exit status 2, the window with its reasons.
 */
public final class PlanNotPossible extends RuntimeException {
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
