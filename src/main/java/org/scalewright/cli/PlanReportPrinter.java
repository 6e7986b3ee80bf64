package org.scalewright.cli;

import java.io.PrintWriter;
import java.util.List;
import org.scalewright.design.rescale.KeyChange;
import org.scalewright.design.rescale.Proposal;
import org.scalewright.design.rescale.StepCheck;
import org.scalewright.io.BuiltInData;
import org.scalewright.physics.NoteResult;

/** Prints the summary shared by {@code plan-plain} and {@code plan-wound}: steps, maximum, limits, notes. */
final class PlanReportPrinter {
    private PlanReportPrinter() {
    }

    /** @return {@code +1.5} / {@code -0.3} */
    static String signed(double v, int decimals) {
        return org.scalewright.model.NumberText.signed(v, decimals);
    }

    /** @return a plain wire or core as a rebuilder writes it: {@code #14.5} or {@code 0.825 mm} */
    static String wireName(org.scalewright.model.CoreWire w) {
        return org.scalewright.model.WireNotation.of(w, org.scalewright.model.LengthUnit.MM);
    }

    static String arrow(String before, String after) {
        return before.equals(after) ? before : before + " → " + after;
    }

    static void summary(Proposal p, PrintWriter w) {
        w.println();
        w.println("Largest neighbour step in per-string tension, before → after (limit "
                + Formats.trim(p.before().settings().neighbourStepPct()) + " %):");
        TextTable t = new TextTable("where", "keys", ">before", "at", ">after", "at", "");
        for (StepCheck s : p.steps()) {
            String where = switch (s.kind()) {
                case INSIDE_SECTION -> "inside " + s.label();
                case ACROSS_BOUNDARY -> "across " + s.label();
                case AT_EDGE -> "edge " + s.label();
            };
            t.row(where, s.firstKey() + "-" + s.lastKey(), Formats.f(s.beforePct(), 1) + " %", s.beforeKey(),
                    Formats.f(s.afterPct(), 1) + " %", s.afterKey(), s.withinLimit() ? "ok" : "over");
        }
        t.print(w);
        w.println();
        NoteResult top = p.highestAfter().orElseThrow();
        w.println("All planned strings at or under " + Formats.trim(p.maxBreakPct()) + " % of breaking strength: "
                + (p.allUnderMax() ? "yes" : "NO") + " (highest " + Formats.f(top.breakPct(), 1) + " % at key "
                + top.key() + " " + top.noteName() + ")");
        w.println("Keys changed: " + p.changedCount() + " of " + p.changes().size() + "; wire changes along the "
                + "planned keys: " + changesAlong(p.changes(), true) + " before, " + changesAlong(p.changes(), false)
                + " after");
        if (!p.limits().isEmpty()) {
            w.println();
            w.println("Steps over the limit that remain, and why:");
            for (String l : p.limits()) {
                w.println("  - " + l);
            }
        }
        if (!p.notes().isEmpty()) {
            w.println();
            w.println("Notes:");
            for (String n : p.notes()) {
                w.println("  - " + n);
            }
        }
    }

    /** @return how often the wire (plain size, or core) changes from one planned key to the next */
    private static int changesAlong(List<KeyChange> changes, boolean before) {
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

    static void footer(Proposal p, java.nio.file.Path out, Inputs inputs, PrintWriter w) {
        w.println();
        w.println("wrote " + out + " (a complete scale sheet in the input's units; 'analyze " + out.getFileName()
                + "' with the same strength table shows the figures above; strength table: "
                + p.after().settings().strength().name() + ")");
        w.println();
        w.println("Caution: " + BuiltInData.cautions().get(0));
        if (BuiltInData.cautions().size() > 2) {
            w.println(BuiltInData.cautions().get(2));
        }
    }
}
