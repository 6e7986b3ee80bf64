package org.scalewright.design.rescale;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.scalewright.physics.NoteResult;

/**
 * The words of a rescaling proposal, composed once for the command line and the window: what
 * was planned to what target, how many keys change, the largest neighbour step before and
 * after, whether every planned string stays under the maximum, the steps that remain over the
 * limit and why, and the planner's notes (skipped keys, strings left in the caution band and
 * why, wire that could not be met). The front ends only lay these lines out.
 */
public final class ProposalText {
    private ProposalText() {
    }

    /** @return {@code Plain wire for keys 40-60, target: smooth trend …} */
    public static String headline(Proposal p) {
        return capitalised(p.action()) + " for keys " + p.range() + ", target: " + p.target().description()
                + (p.quantity() == TargetQuantity.BREAK_PCT ? " (core percent of breaking strength)" : "");
    }

    /** @return {@code Keys changed: 12 of 21; wire changes along the planned keys: 5 before, 3 after} */
    public static String changed(Proposal p) {
        return "Keys changed: " + p.changedCount() + " of " + p.changes().size() + "; wire changes along the planned "
                + "keys: " + changesAlong(p.changes(), true) + " before, " + changesAlong(p.changes(), false) + " after";
    }

    /**
     * @return {@code Largest neighbour step in per-string tension: 9.1 % → 6.0 % (limit 8 %), all steps
     *         within it}, or empty when no step was checked
     */
    public static String largestStep(Proposal p) {
        StepCheck worst = null;
        for (StepCheck s : p.steps()) {
            if (worst == null || Math.abs(s.beforePct()) > Math.abs(worst.beforePct())) {
                worst = s;
            }
        }
        if (worst == null) {
            return "";
        }
        double after = p.steps().stream().mapToDouble(s -> Math.abs(s.afterPct())).max().orElse(0);
        return String.format(Locale.ROOT, "Largest neighbour step in per-string tension: %.1f %% → %.1f %% (limit %s %%)%s",
                Math.abs(worst.beforePct()), after, upToOneDecimal(worst.limitPct()),
                p.stepsWithinLimit() ? ", all steps within it" : ", some steps remain over it");
    }

    /** @return the heading of the per-step table: {@code Largest neighbour step …, before → after (limit 8 %):} */
    public static String stepTableHeading(Proposal p) {
        return "Largest neighbour step in per-string tension, before → after (limit "
                + upToOneDecimal(p.before().settings().neighbourStepPct()) + " %):";
    }

    /** @return where a step was checked, short: {@code inside capo}, {@code across capo/tenor}, {@code edge …} */
    public static String where(StepCheck s) {
        return switch (s.kind()) {
            case INSIDE_SECTION -> "inside " + s.label();
            case ACROSS_BOUNDARY -> "across " + s.label();
            case AT_EDGE -> "edge " + s.label();
        };
    }

    /**
     * @return {@code All planned strings at or under 70 % of breaking strength: yes (highest 65.2 % at
     *         key 60 G#4)}
     */
    public static String maximum(Proposal p) {
        NoteResult top = p.highestAfter().orElseThrow();
        return "All planned strings at or under " + upToOneDecimal(p.maxBreakPct()) + " % of breaking strength: "
                + (p.allUnderMax() ? "yes" : "NO") + String.format(Locale.ROOT, " (highest %.1f %% at key %d %s)",
                top.breakPct(), top.key(), top.noteName());
    }

    /** @return the heading over {@link Proposal#limits()} */
    public static String limitsHeading() {
        return "Steps over the limit that remain, and why:";
    }

    /** @return the heading over {@link Proposal#notes()} */
    public static String notesHeading() {
        return "Notes:";
    }

    /**
     * The whole summary as sentences, for a panel: headline, keys changed, largest step,
     * maximum, then each remaining step's reason and each note.
     *
     * @return lines, none empty
     */
    public static List<String> summary(Proposal p) {
        List<String> lines = new ArrayList<>();
        lines.add(headline(p) + ".");
        lines.add(changed(p) + ".");
        String step = largestStep(p);
        if (!step.isEmpty()) {
            lines.add(step + ".");
        }
        lines.add(maximum(p) + ".");
        for (String l : p.limits()) {
            lines.add("Limit: " + l);
        }
        for (String n : p.notes()) {
            lines.add("Note: " + n);
        }
        return lines;
    }

    /** @return a plan that could not be made, in one paragraph: {@code No proposal: reason reason} */
    public static String noProposal(List<String> reasons) {
        return "No proposal: " + String.join(" ", reasons);
    }

    /** @return how often the wire (plain size, or core) changes from one planned key to the next */
    static int changesAlong(List<KeyChange> changes, boolean before) {
        int count = 0;
        for (int i = 1; i < changes.size(); i++) {
            double a = (before ? changes.get(i - 1).before() : changes.get(i - 1).after()).wire().diameter();
            double b = (before ? changes.get(i).before() : changes.get(i).after()).wire().diameter();
            if (Math.abs(a - b) > 1e-9) {
                count++;
            }
        }
        return count;
    }

    /** @return {@code 70}, {@code 72.5}: a percent with at most one decimal */
    static String upToOneDecimal(double v) {
        String s = String.format(Locale.ROOT, "%.1f", v);
        return s.endsWith(".0") ? s.substring(0, s.length() - 2) : s;
    }

    private static String capitalised(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
