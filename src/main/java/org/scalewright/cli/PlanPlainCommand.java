package org.scalewright.cli;

import java.io.PrintWriter;
import java.util.List;
import org.scalewright.design.rescale.KeyChange;
import org.scalewright.design.rescale.PlainPlanOptions;
import org.scalewright.design.rescale.PlainPlanner;
import org.scalewright.design.rescale.Proposal;
import org.scalewright.design.rescale.TargetCurve;
import org.scalewright.design.rescale.WireLists;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.CoreWire;
import org.scalewright.physics.ScaleAnalysis;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code plan-plain}: choose plain-wire sizes for a range of keys so tension follows a target. */
@Command(name = "plan-plain", mixinStandardHelpOptions = true,
        description = "Plan plain-wire sizes for the plain keys of a range: tension follows a target, sizes "
                    + "never grow toward the treble, every string stays at or under the maximum percent of "
                    + "breaking strength, and sizes change seldom (exact dynamic programme). Wound keys in the "
                    + "range are skipped. Prints the changes and writes the complete new scale sheet.")
public final class PlanPlainCommand extends PlanCommand {
    @Option(names = "--sizes", paramLabel = "LIST", defaultValue = "music",
            description = "available wire: music (sizes 12-23 in half steps), metric (0.025 mm steps), or a list of "
                    + "size numbers and diameters, e.g. 13,13.5,14 or 0.8mm,0.825mm (default: ${DEFAULT-VALUE})")
    String sizes;

    private List<CoreWire> wires;

    public PlanPlainCommand() {
        super(false, "plain-wire strings", "wound strings are planned with plan-wound", "plain-wire plan");
    }

    @Override
    void checkOwnOptions() {
        wires = OptionChecks.named("--sizes",
                () -> WireLists.plainWire(sizes, BuiltInData.musicWireSizes(), BuiltInData.metricPlainWire()));
    }

    @Override
    Proposal plan(ScaleAnalysis present, TargetCurve target, double maxBreakPct) {
        return PlainPlanner.plan(present, keys(), target, new PlainPlanOptions(wires, maxBreakPct, changeCost, stepCost));
    }

    @Override
    void printOptions(Proposal p, PrintWriter w) {
        w.println("wire: " + wires.size() + " sizes, " + PlanReportPrinter.wireName(wires.get(wires.size() - 1))
                + " to " + PlanReportPrinter.wireName(wires.get(0)) + "; maximum " + Formats.trim(p.maxBreakPct())
                + " % of breaking strength; change cost " + Formats.trim(changeCost) + ", step cost "
                + Formats.trim(stepCost));
    }

    @Override
    List<String> changeColumns(Proposal p) {
        return List.of(">% break", ">target N", ">dev %");
    }

    @Override
    List<Object> changeCells(KeyChange c, Proposal p) {
        return List.of(Formats.f(c.beforeResult().breakPct(), 1) + " → " + Formats.f(c.afterResult().breakPct(), 1),
                Formats.f(c.target(), 0), PlanReportPrinter.signed(c.deviationPct(), 1));
    }
}
