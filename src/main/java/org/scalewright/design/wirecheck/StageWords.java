package org.scalewright.design.wirecheck;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.scalewright.model.Checks;
import org.scalewright.model.KeyNames;
import org.scalewright.model.NumberText;

/**
 * The advice on raising in stages in words, the one wording the command line and the window
 * lay out: a headline, the reasons (one item each), the plan's first line, one line per pass and
 * a closing line.
 *
 * @param headline  {@code Raise in stages: advised, because} or why it is not needed
 * @param reasons   why staging is advised, one item each, keys at the target itself last (empty
 *                  when not advised)
 * @param plan      the plan's first line, or that no plan was found ("" when not advised)
 * @param passes    one line per pass of the plan (empty without a plan)
 * @param closing   what every pass keeps to, as far as it was checked, and the notes over the
 *                  danger band named ("" without a plan)
 */
public record StageWords(String headline, List<String> reasons, String plan, List<String> passes, String closing) {

    public StageWords {
        reasons = List.copyOf(reasons);
        passes = List.copyOf(passes);
    }

    /** @return the advice of a wire check in words */
    static StageWords of(WireCheckReport r) {
        StageAdvice a = r.stages();
        WireCheckRequest q = r.request();
        String limit = q.stageLimit().describe();
        if (!a.advised()) {
            return new StageWords("Raise in stages: not needed by these figures (no peak in the danger band; total "
                    + "tension change within " + limit + ").", List.of(), "", List.of(), "");
        }
        List<String> reasons = new ArrayList<>(a.reasons());
        List<Integer> stuck = a.dangerAtTarget();
        if (!stuck.isEmpty()) {
            boolean one = stuck.size() == 1;
            StringBuilder b = new StringBuilder(one ? "key " : "keys ");
            for (int i = 0; i < stuck.size(); i++) {
                int key = stuck.get(i);
                b.append(i == 0 ? "" : ", ").append(key).append(' ').append(KeyNames.name(key)).append(" (")
                        .append(pct(afterPct(r, key))).append(" % at the target)");
            }
            reasons.add(b + (one ? " is" : " are") + " in the danger band at the target pitch itself "
                    + "with the replacement: staging cannot help " + (one ? "it" : "them")
                    + "; change the wire or the pitch standard");
        }
        String headline = "Raise in stages: advised, because";
        if (!a.hasPlan()) {
            return new StageWords(headline, reasons, String.format(Locale.ROOT, "No plan of up to %d passes keeps "
                    + "every pass within the limits; consider a lower target pitch or a stronger wire.",
                    StageAdvice.MAX_STAGES), List.of(), "");
        }
        int n = a.stages().size();
        String plan = String.format(Locale.ROOT, "Plan: %d passes, each raising every note by 1/%d of how flat it "
                + "is, tuned %s %% sharp of that step:", n, n, Checks.format(q.overpullPct()));
        double danger = q.settings().bands().danger();
        List<String> passes = new ArrayList<>();
        for (RaiseStage st : a.stages()) {
            passes.add(String.format(Locale.ROOT, "pass %d: to %.0f %% of the raise; total %.1f → %.1f kN at its "
                            + "peak (%+.1f kN); highest %s %% of breaking strength, key %d %s%s", st.number(),
                    100 * st.endFraction(), st.totalAtStart() / 1e3, st.totalAtPeak() / 1e3, st.change() / 1e3,
                    pct(st.maxPeakPct()), st.maxPeakKey(), KeyNames.name(st.maxPeakKey()),
                    st.maxPeakPct() >= danger ? ", in the danger band" : ""));
        }
        return new StageWords(headline, reasons, plan, passes, closing(r, danger));
    }

    /**
     * What every pass keeps to, said only as far as it was checked: the stage limit (a plan is
     * only accepted within it) and the danger band for every note at every pass's peak; a note
     * that is over the band at some pass's peak (only one already over it at the target can be) is
     * named with its percent at the target and its highest percent at a pass's peak.
     */
    private static String closing(WireCheckReport r, double danger) {
        StageAdvice a = r.stages();
        String limit = "Each pass stays within the stage limit of " + r.request().stageLimit().describe(a.limitNewtons());
        String band = "the danger band (" + NumberText.rounded(danger, 1) + " %)";
        Map<Integer, Double> highest = new TreeMap<>();
        for (RaiseStage st : a.stages()) {
            for (RaiseStage.Over o : st.inDanger()) {
                highest.merge(o.key(), o.pct(), Math::max);
            }
        }
        if (highest.isEmpty()) {
            return limit + ", and every note stays under " + band + " at every pass's peak.";
        }
        List<Integer> keys = new ArrayList<>(highest.keySet());
        StringBuilder b = new StringBuilder(limit).append(". Every note but ").append(keyList(keys))
                .append(" stays under ").append(band).append(" at every pass's peak");
        for (int key : keys) {
            b.append("; key ").append(key).append(' ').append(KeyNames.name(key)).append(" is at ")
                    .append(pct(afterPct(r, key))).append(" % at the target itself and reaches ")
                    .append(pct(highest.get(key))).append(" % at a pass's peak");
        }
        return b.append('.').toString();
    }

    private static double afterPct(WireCheckReport r, int key) {
        return r.note(key).orElseThrow().breakPctAfter();
    }

    private static String pct(double v) {
        return NumberText.fixed(v, 1);
    }

    /**
     * @param keys key numbers, at least one
     * @return {@code key 52 C#5} or {@code keys 52 C#5, 53 D5}
     */
    public static String keyList(List<Integer> keys) {
        StringBuilder b = new StringBuilder(keys.size() == 1 ? "key " : "keys ");
        for (int i = 0; i < keys.size(); i++) {
            b.append(i == 0 ? "" : ", ").append(keys.get(i)).append(' ').append(KeyNames.name(keys.get(i)));
        }
        return b.toString();
    }
}
