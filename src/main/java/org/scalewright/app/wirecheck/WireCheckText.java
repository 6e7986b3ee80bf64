package org.scalewright.app.wirecheck;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.scalewright.design.wirecheck.RaiseStage;
import org.scalewright.design.wirecheck.StageAdvice;
import org.scalewright.design.wirecheck.WireCheckReport;
import org.scalewright.model.KeyNames;
import org.scalewright.model.Note;
import org.scalewright.model.WireNotation;

/** The words of a wire check shown in the panel: the wire of a note and the advice on stages. */
final class WireCheckText {
    private WireCheckText() {
    }

    /** @return the wire in the program's one notation ({@link WireNotation}), diameters in mm */
    static String wire(Note n) {
        return WireNotation.of(n);
    }

    /** @return the advice on raising in stages, with the reasons and the plan, one item a line */
    static String stages(WireCheckReport r) {
        StageAdvice a = r.stages();
        List<String> lines = new ArrayList<>();
        if (!a.advised()) {
            lines.add("Raise in stages: not needed by these figures (no peak in the danger band; the total "
                    + "tension changes by less than " + r.request().stageLimit().describe() + ").");
            return String.join("\n", lines);
        }
        lines.add("Raise in stages: advised, because");
        for (String reason : a.reasons()) {
            lines.add("  • " + reason);
        }
        if (!a.dangerAtTarget().isEmpty()) {
            lines.add("  • " + keys(a.dangerAtTarget()) + " in the danger band at the target pitch itself with the "
                    + "replacement: staging cannot help there; change the wire or the pitch standard.");
        }
        if (!a.hasPlan()) {
            lines.add(String.format(Locale.ROOT, "No plan of up to %d passes keeps every pass within the limits; "
                    + "consider a lower target pitch or a stronger wire.", StageAdvice.MAX_STAGES));
            return String.join("\n", lines);
        }
        lines.add(String.format(Locale.ROOT, "Plan: %d passes, each raising every note by 1/%d of how flat it is:",
                a.stages().size(), a.stages().size()));
        for (RaiseStage st : a.stages()) {
            lines.add(String.format(Locale.ROOT, "  pass %d: to %.0f %% of the raise; total %.1f → %.1f kN at its "
                            + "peak (%+.1f kN); highest %.1f %% of breaking strength, key %d %s", st.number(),
                    100 * st.endFraction(), st.totalAtStart() / 1e3, st.totalAtPeak() / 1e3, st.change() / 1e3,
                    st.maxPeakPct(), st.maxPeakKey(), KeyNames.name(st.maxPeakKey())));
        }
        lines.add(String.format(Locale.ROOT, "Each pass stays within the stage limit (%s, %.1f kN) and under the "
                + "danger band at its peak.", r.request().stageLimit().describe(), a.limitNewtons() / 1e3));
        return String.join("\n", lines);
    }

    private static String keys(List<Integer> keys) {
        StringBuilder b = new StringBuilder(keys.size() == 1 ? "key " : "keys ");
        for (int i = 0; i < keys.size(); i++) {
            b.append(i == 0 ? "" : ", ").append(keys.get(i)).append(' ').append(KeyNames.name(keys.get(i)));
        }
        return b.append(keys.size() == 1 ? " is" : " are").toString();
    }
}
