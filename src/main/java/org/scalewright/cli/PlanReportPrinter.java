package org.scalewright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import org.scalewright.design.rescale.Proposal;
import org.scalewright.design.rescale.ProposalText;
import org.scalewright.design.rescale.StepCheck;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.CoreWire;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.WireNotation;

/**
 * Lays out the summary shared by {@code plan-plain} and {@code plan-wound} on the terminal:
 * the steps table, then the proposal's sentences from {@link ProposalText}, then the cautions.
 */
final class PlanReportPrinter {
    private PlanReportPrinter() {
    }

    /** @return {@code +1.5} / {@code -0.3} */
    static String signed(double v, int decimals) {
        return org.scalewright.model.NumberText.signed(v, decimals);
    }

    /** @return a plain wire or core as a rebuilder writes it: {@code #14.5} or {@code 0.825 mm} */
    static String wireName(CoreWire w) {
        return WireNotation.of(w, LengthUnit.MM);
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
