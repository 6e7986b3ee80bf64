package org.scalewright.design.wirecheck;

import java.util.List;

/**
 * Whether to raise the pitch in stages, why, and a plan that keeps every pass inside the limits.
 *
 * @param advised         true when staging is advised (some peak passes the danger band, or the
 *                        total tension changes by more than the stage limit in one pass)
 * @param reasons         why, in plain words (empty when not advised)
 * @param stages          the passes of the plan (one pass when staging is not needed); empty
 *                        when no plan up to {@link #MAX_STAGES} passes keeps inside the limits
 * @param dangerAtTarget  keys whose replacement is in the danger band at the target pitch
 *                        itself: staging cannot help them
 * @param limitNewtons    the stage limit used, N
 */
public record StageAdvice(boolean advised, List<String> reasons, List<RaiseStage> stages,
                          List<Integer> dangerAtTarget, double limitNewtons) {
    /** The most passes a plan is searched for. */
    public static final int MAX_STAGES = 12;

    public StageAdvice {
        reasons = List.copyOf(reasons);
        stages = List.copyOf(stages);
        dangerAtTarget = List.copyOf(dangerAtTarget);
    }

    /** @return true when a plan within {@link #MAX_STAGES} passes was found */
    public boolean hasPlan() {
        return !stages.isEmpty();
    }
}
