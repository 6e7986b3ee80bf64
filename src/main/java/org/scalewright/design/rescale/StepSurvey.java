package org.scalewright.design.rescale;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;

/** Finds the largest neighbour steps in per-string tension around the planned keys, before and after. */
final class StepSurvey {
    private StepSurvey() {
    }

    /** @return 100 · (T_upper / T_lower − 1), % */
    static double stepPct(NoteResult lower, NoteResult upper) {
        return 100.0 * (upper.tension() / lower.tension() - 1.0);
    }

    /**
     * @param before  the present analysis
     * @param after   the proposed analysis (same keys)
     * @param planned the planned keys
     * @param limit   the neighbour-step limit, %
     * @return checks inside each run of planned keys of one section, across the boundaries
     *         between such runs, and at the edges of the planned keys
     */
    static List<StepCheck> survey(ScaleAnalysis before, ScaleAnalysis after, Set<Integer> planned, double limit) {
        List<NoteResult> b = before.notes();
        List<NoteResult> a = after.notes();
        int n = b.size();
        boolean[] in = new boolean[n];
        for (int i = 0; i < n; i++) {
            in[i] = planned.contains(b.get(i).key());
        }
        List<StepCheck> out = new ArrayList<>();
        int i = 0;
        while (i < n) {
            if (!in[i]) {
                i++;
                continue;
            }
            int blockStart = i;
            while (i + 1 < n && in[i + 1]) {
                i++;
            }
            int blockEnd = i;
            if (blockStart > 0) {
                out.add(pair(StepCheck.Kind.AT_EDGE, b, a, blockStart, limit));
            }
            int runStart = blockStart;
            for (int j = blockStart; j <= blockEnd; j++) {
                boolean endOfRun = j == blockEnd || !b.get(j + 1).section().equals(b.get(j).section());
                if (endOfRun) {
                    if (j > runStart) {
                        out.add(inside(b, a, runStart, j, limit));
                    }
                    if (j < blockEnd) {
                        out.add(pair(StepCheck.Kind.ACROSS_BOUNDARY, b, a, j + 1, limit));
                    }
                    runStart = j + 1;
                }
            }
            if (blockEnd < n - 1) {
                out.add(pair(StepCheck.Kind.AT_EDGE, b, a, blockEnd + 1, limit));
            }
            i++;
        }
        return out;
    }

    private static StepCheck inside(List<NoteResult> b, List<NoteResult> a, int from, int to, double limit) {
        int bAt = from + 1;
        int aAt = from + 1;
        for (int j = from + 1; j <= to; j++) {
            if (Math.abs(stepPct(b.get(j - 1), b.get(j))) > Math.abs(stepPct(b.get(bAt - 1), b.get(bAt)))) {
                bAt = j;
            }
            if (Math.abs(stepPct(a.get(j - 1), a.get(j))) > Math.abs(stepPct(a.get(aAt - 1), a.get(aAt)))) {
                aAt = j;
            }
        }
        return new StepCheck(StepCheck.Kind.INSIDE_SECTION, label(b.get(from).section()), b.get(from).key(),
                b.get(to).key(), stepPct(b.get(bAt - 1), b.get(bAt)), b.get(bAt).key(),
                stepPct(a.get(aAt - 1), a.get(aAt)), a.get(aAt).key(), limit);
    }

    /** The step from index {@code upper − 1} to {@code upper}. */
    private static StepCheck pair(StepCheck.Kind kind, List<NoteResult> b, List<NoteResult> a, int upper, double limit) {
        NoteResult lo = b.get(upper - 1);
        NoteResult hi = b.get(upper);
        String label = lo.section().equals(hi.section()) ? label(lo.section())
                : label(lo.section()) + "/" + label(hi.section());
        return new StepCheck(kind, label, lo.key(), hi.key(), stepPct(lo, hi), hi.key(),
                stepPct(a.get(upper - 1), a.get(upper)), hi.key(), limit);
    }

    private static String label(String section) {
        return section.isEmpty() ? "(no section)" : section;
    }
}
