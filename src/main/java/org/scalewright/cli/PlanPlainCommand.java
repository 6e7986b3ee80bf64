package org.scalewright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.scalewright.design.rescale.KeyChange;
import org.scalewright.design.rescale.PlainPlanOptions;
import org.scalewright.design.rescale.PlainPlanner;
import org.scalewright.design.rescale.PlanNotPossible;
import org.scalewright.design.rescale.Proposal;
import org.scalewright.design.rescale.TargetCurve;
import org.scalewright.design.rescale.TargetQuantity;
import org.scalewright.design.rescale.TargetSpec;
import org.scalewright.model.CoreWire;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code plan-plain}: choose plain-wire sizes for a range of keys so tension follows a target. */
@Command(name = "plan-plain", mixinStandardHelpOptions = true,
        description = "Plan plain-wire sizes for the plain keys of a range: tension follows a target, sizes "
                    + "never grow toward the treble, every string stays at or under the maximum percent of "
                    + "breaking strength, and sizes change seldom (exact dynamic programme). Wound keys in the "
                    + "range are skipped. Prints the changes and writes the complete new scale sheet.")
public final class PlanPlainCommand implements Callable<Integer> {
    @Mixin
    Inputs inputs;

    @Mixin
    PlanTargetOptions targetOptions;

    @Option(names = "--keys", required = true, paramLabel = "A-B", converter = KeyRangeConverter.class,
            description = "the keys to plan: key numbers or note names, e.g. 29-88 or C#3-C8")
    KeyRange keys;

    @Option(names = "--max-break", paramLabel = "PCT",
            description = "maximum percent of breaking strength for every planned string (default: the danger band, 70)")
    Double maxBreak;

    @Option(names = "--sizes", paramLabel = "LIST", defaultValue = "music",
            description = "available wire: music (sizes 12-23 in half steps), metric (0.025 mm steps), or a list of "
                    + "size numbers and diameters, e.g. 13,13.5,14 or 0.8mm,0.825mm (default: ${DEFAULT-VALUE})")
    String sizes;

    @Option(names = "--change-cost", paramLabel = "X", defaultValue = "0.002",
            description = "cost of each change of size, in squared fractions of the target (0.002 weighs as much as "
                    + "one key 4.5 %% off the target; default: ${DEFAULT-VALUE})")
    double changeCost;

    @Option(names = "--step-cost", paramLabel = "X", defaultValue = "1",
            description = "cost per unit fraction a neighbour step exceeds the step limit (1: 1 %% over weighs as "
                    + "much as one key 10 %% off the target; 0: steps only reported; default: ${DEFAULT-VALUE})")
    double stepCost;

    @Option(names = "--out", required = true, paramLabel = "NEW.csv", description = "the new scale sheet to write")
    Path out;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        targetOptions.check();
        OptionChecks.nonNegative("--change-cost", changeCost);
        OptionChecks.nonNegative("--step-cost", stepCost);
        Scale scale = inputs.scale();
        AnalysisSettings settings = inputs.settings();
        double max = OptionChecks.maxBreak(maxBreak, settings);
        List<CoreWire> wires = PlanWireLists.sizes("--sizes", sizes);
        ScaleAnalysis present = ScaleAnalyzer.analyze(scale, settings);
        List<NoteResult> planned = PlainPlanner.plannedKeys(present, keys);
        if (planned.isEmpty()) {
            throw new UserError("keys " + keys + " hold no plain-wire strings in " + inputs.scaleFile.getFileName()
                    + " (wound strings are planned with plan-wound)");
        }
        TargetSpec recipe = targetOptions.spec(TargetQuantity.TENSION, planned.get(0).key(),
                planned.get(planned.size() - 1).key());
        Proposal p;
        try {
            TargetCurve target = PlainPlanner.target(present, keys, recipe, targetOptions.perSection());
            p = PlainPlanner.plan(present, keys, target, new PlainPlanOptions(wires, max, changeCost, stepCost));
        } catch (PlanNotPossible e) {
            throw new UserError("no plain-wire plan for keys " + keys + " meets the constraints:\n"
                    + String.join("\n", e.reasons()));
        }
        PrintWriter w = spec.commandLine().getOut();
        print(p, wires, w);
        Outputs.sheet(out, p.proposedScale());
        PlanReportPrinter.footer(p, out, inputs, w);
        return ExitStatus.OK;
    }

    private void print(Proposal p, List<CoreWire> wires, PrintWriter w) {
        Scale s = p.before().scale();
        w.println((s.title().isEmpty() ? "Scale" : s.title()) + ": plain-wire plan for keys " + keys + ", A4 = "
                + Formats.trim(s.pitch().a4()) + " Hz");
        w.println("target: " + p.target().description());
        w.println("wire: " + wires.size() + " sizes, " + PlanReportPrinter.wireName(wires.get(wires.size() - 1)) + " to "
                + PlanReportPrinter.wireName(wires.get(0)) + "; maximum " + Formats.trim(p.maxBreakPct())
                + " % of breaking strength; change cost " + Formats.trim(changeCost) + ", step cost "
                + Formats.trim(stepCost));
        w.println();
        TextTable t = new TextTable(">key", "note", "section", "wire", ">tension N", ">% break", ">target N", ">dev %");
        for (KeyChange c : p.changes()) {
            NoteResult b = c.beforeResult();
            NoteResult a = c.afterResult();
            t.row(c.key(), a.noteName(), a.section(), PlanReportPrinter.arrow(Formats.wire(c.before()),
                    Formats.wire(c.after())), Formats.f(b.tension(), 0) + " → " + Formats.f(a.tension(), 0),
                    Formats.f(b.breakPct(), 1) + " → " + Formats.f(a.breakPct(), 1), Formats.f(c.target(), 0),
                    PlanReportPrinter.signed(c.deviationPct(), 1));
        }
        t.print(w);
        PlanReportPrinter.summary(p, w);
    }
}
