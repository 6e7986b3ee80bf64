package org.scalewright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import org.scalewright.design.rescale.Proposal;
import org.scalewright.design.rescale.ProposalText;
import org.scalewright.design.rescale.StepCheck;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.CoreWire;

/**
 * Lays out the summary shared by {@code plan-plain} and {@code plan-wound} on the terminal:
 * the steps table, then the proposal's sentences from {@link ProposalText}, then the cautions.
 */
final class PlanReportPrinter {
    private PlanReportPrinter() {
    }

    /** @return {@code +1.5} / {@code -0.3} */
    static String signed(double v, int decimals) {
        return String.format(java.util.Locale.ROOT, "%+." + decimals + "f", v);
    }

    /** @return a plain wire or core as a rebuilder writes it: {@code #14.5} or {@code 0.825 mm} */
    static String wireName(CoreWire w) {
        return w.musicWireSize().isPresent() ? "#" + Formats.trim(w.musicWireSize().getAsDouble())
                : Formats.f(w.diameter() * 1e3, 3) + " mm";
    }

    static String arrow(String before, String after) {
        return before.equals(after) ? before : before + " → " + after;
    }

    static void summary(Proposal p, PrintWriter w) {
        w.println();
        w.println(ProposalText.stepTableHeading(p));
        TextTable t = new TextTable("where", "keys", ">before", "at", ">after", "at", "");
        for (StepCheck s : p.steps()) {
            t.row(ProposalText.where(s), s.firstKey() + "-" + s.lastKey(), Formats.f(s.beforePct(), 1) + " %",
                    s.beforeKey(), Formats.f(s.afterPct(), 1) + " %", s.afterKey(), s.withinLimit() ? "ok" : "over");
        }
        t.print(w);
        w.println();
        w.println(ProposalText.maximum(p));
        w.println(ProposalText.changed(p));
        list(ProposalText.limitsHeading(), p.limits(), w);
        list(ProposalText.notesHeading(), p.notes(), w);
    }

    private static void list(String heading, java.util.List<String> items, PrintWriter w) {
        if (!items.isEmpty()) {
            w.println();
            w.println(heading);
            for (String item : items) {
                w.println("  - " + item);
            }
        }
    }

    static void footer(Proposal p, Path out, PrintWriter w) {
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
