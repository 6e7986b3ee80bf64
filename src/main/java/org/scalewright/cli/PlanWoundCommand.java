package org.scalewright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import org.scalewright.design.rescale.KeyChange;
import org.scalewright.design.rescale.PlanNotPossible;
import org.scalewright.design.rescale.Proposal;
import org.scalewright.design.rescale.TargetCurve;
import org.scalewright.design.rescale.TargetQuantity;
import org.scalewright.design.rescale.TargetSpec;
import org.scalewright.design.rescale.WoundPlanOptions;
import org.scalewright.design.rescale.WoundPlanner;
import org.scalewright.design.rescale.WrapWires;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code plan-wound}: design the wound strings of a range of keys to a target tension. */
@Command(name = "plan-wound", mixinStandardHelpOptions = true,
        description = "Design the wound strings of a range: with each core (kept, or chosen from --cores), the "
                    + "wrap diameter(s) the target tension needs (closed form, stiffness included), rounded to "
                    + "the wrap wire available; double-wound where a single wrap would pass --double-above. "
                    + "--join-break makes the strings either side of the bass/tenor break continuous in tension "
                    + "and as smooth in B as the cores allow. Plain keys in the range are skipped. Prints the "
                    + "changes and writes the new sheet.")
public final class PlanWoundCommand implements Callable<Integer> {
    @Mixin
    Inputs inputs;

    @Mixin
    PlanTargetOptions targetOptions;

    @Option(names = "--keys", required = true, paramLabel = "A-B", converter = KeyRangeConverter.class,
            description = "the keys to design: key numbers or note names, e.g. 1-28 or A0-C3")
    KeyRange keys;

    @Option(names = "--target-of", paramLabel = "tension|break-pct", defaultValue = "tension",
            description = "what the target gives: per-string tension (N) or core percent of breaking strength "
                    + "(default: ${DEFAULT-VALUE})")
    String targetOf;

    @Option(names = "--max-break", paramLabel = "PCT",
            description = "maximum core percent of breaking strength (default: the danger band, 70)")
    Double maxBreak;

    /** Either a step or a list of wrap wire. */
    static final class WrapChoice {
        @Option(names = "--wrap-step", paramLabel = "MM",
                description = "wrap wire available in steps of MM (default: 0.05)")
        Double step;

        @Option(names = "--wraps", paramLabel = "LIST",
                description = "wrap wire available, diameters in mm, e.g. 0.2,0.25,0.3")
        String list;
    }

    @ArgGroup(exclusive = true)
    WrapChoice wrapChoice;

    @Option(names = "--double-above", paramLabel = "MM",
            description = "double-wind a string whose single wrap would be thicker than MM, single-wind the others "
                    + "(default: every string keeps its present winding)")
    Double doubleAbove;

    @Option(names = "--double-ratio", paramLabel = "R", defaultValue = "1",
            description = "outer/inner wrap ratio for a string that becomes double-wound under --double-above (a "
                    + "present double wrap keeps its own ratio; default: ${DEFAULT-VALUE})")
    double doubleRatio;

    @Option(names = "--cores", paramLabel = "keep|LIST", defaultValue = "keep",
            description = "keep the present cores, or choose each from this list of diameters in mm (never growing "
                    + "toward the treble, B kept smooth), e.g. 1.0,1.05,1.1 (default: ${DEFAULT-VALUE})")
    String cores;

    @Option(names = "--change-cost", paramLabel = "X", defaultValue = "0.002",
            description = "cost of each change of core when cores are chosen, in squared log-B units (default: "
                    + "${DEFAULT-VALUE})")
    double changeCost;

    @Option(names = "--step-cost", paramLabel = "X", defaultValue = "1",
            description = "cost per unit fraction a neighbour step exceeds the step limit (1: 1 %% over weighs as "
                    + "much as one key 10 %% off the target; 0: steps only reported; default: ${DEFAULT-VALUE})")
    double stepCost;

    @Option(names = "--join-break", paramLabel = "N", defaultValue = "0",
            description = "join the break: the target runs on continuously through each change of section, and the "
                    + "cores of the N keys either side are chosen (0.025 mm steps, or --cores) for a smooth B "
                    + "(default: ${DEFAULT-VALUE} = off)")
    int joinBreak;

    @Option(names = "--out", required = true, paramLabel = "NEW.csv", description = "the new scale sheet to write")
    Path out;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        targetOptions.check();
        TargetQuantity quantity = switch (targetOf.trim().toLowerCase(Locale.ROOT)) {
            case "tension" -> TargetQuantity.TENSION;
            case "break-pct" -> TargetQuantity.BREAK_PCT;
            default -> throw new UserError("--target-of must be tension or break-pct, was '" + targetOf + "'");
        };
        WrapWires wraps = wraps();
        if (doubleAbove != null && !(doubleAbove > 0) || doubleAbove != null && doubleAbove.isInfinite()) {
            throw new UserError("--double-above must be a diameter > 0 mm, was " + Formats.trim(doubleAbove));
        }
        OptionChecks.positive("--double-ratio", doubleRatio, "");
        OptionChecks.nonNegative("--change-cost", changeCost);
        OptionChecks.nonNegative("--step-cost", stepCost);
        if (joinBreak < 0) {
            throw new UserError("--join-break must be 0 (off) or a number of keys, was " + joinBreak);
        }
        List<Double> coreList = cores.trim().equalsIgnoreCase("keep") ? List.of()
                : PlanWireLists.diametersMm("--cores", cores);
        Scale scale = inputs.scale();
        AnalysisSettings settings = inputs.settings();
        double max = OptionChecks.maxBreak(maxBreak, settings);
        ScaleAnalysis present = ScaleAnalyzer.analyze(scale, settings);
        List<NoteResult> planned = WoundPlanner.plannedKeys(present, keys);
        if (planned.isEmpty()) {
            throw new UserError("keys " + keys + " hold no wound strings in " + inputs.scaleFile.getFileName()
                    + " (plain wire is planned with plan-plain)");
        }
        TargetSpec recipe = targetOptions.spec(quantity, planned.get(0).key(), planned.get(planned.size() - 1).key());
        WoundPlanOptions options = new WoundPlanOptions(quantity, wraps,
                doubleAbove == null ? OptionalDouble.empty() : OptionalDouble.of(doubleAbove * 1e-3), doubleRatio,
                coreList, max, changeCost, stepCost, joinBreak);
        Proposal p;
        try {
            TargetCurve target = WoundPlanner.target(present, keys, recipe, quantity, targetOptions.perSection());
            p = WoundPlanner.plan(present, keys, target, options);
        } catch (PlanNotPossible e) {
            throw new UserError("no wound-string design for keys " + keys + " meets the constraints:\n"
                    + String.join("\n", e.reasons()));
        }
        PrintWriter w = spec.commandLine().getOut();
        print(p, options, w);
        Outputs.sheet(out, p.proposedScale());
        PlanReportPrinter.footer(p, out, inputs, w);
        return ExitStatus.OK;
    }

    private WrapWires wraps() {
        if (wrapChoice != null && wrapChoice.list != null) {
            return WrapWires.of(PlanWireLists.diametersMm("--wraps", wrapChoice.list));
        }
        double step = wrapChoice == null || wrapChoice.step == null ? 0.05 : wrapChoice.step;
        if (!(step > 0 && step <= 1)) {
            throw new UserError("--wrap-step must be > 0 and <= 1 mm, was " + Formats.trim(step));
        }
        return WrapWires.steps(step * 1e-3);
    }

    private void print(Proposal p, WoundPlanOptions o, PrintWriter w) {
        Scale s = p.before().scale();
        boolean pct = p.quantity() == TargetQuantity.BREAK_PCT;
        w.println((s.title().isEmpty() ? "Scale" : s.title()) + ": wound-string design for keys " + keys + ", A4 = "
                + Formats.trim(s.pitch().a4()) + " Hz");
        w.println("target: " + p.target().description() + (pct ? " (core percent of breaking strength)" : ""));
        w.println("wrap: " + o.wraps().description() + "; winding: " + (o.doubleAbove().isPresent()
                ? "double where a single wrap would pass " + Formats.f(o.doubleAbove().getAsDouble() * 1e3, 2) + " mm"
                : "as now") + "; cores: " + (o.cores().isEmpty() ? "kept" : "chosen from the list")
                + (o.joinBreakKeys() > 0 ? ", re-chosen for " + o.joinBreakKeys() + " keys either side of a break" : "")
                + "; maximum " + Formats.trim(p.maxBreakPct()) + " % of breaking strength");
        w.println(org.scalewright.model.WireNotation.LEGEND);
        w.println();
        TextTable t = new TextTable(">key", "note", "section", "wire", ">tension N", pct ? ">target %" : ">target N",
                ">err %", ">core % break", ">B");
        for (KeyChange c : p.changes()) {
            NoteResult b = c.beforeResult();
            NoteResult a = c.afterResult();
            t.row(c.key(), a.noteName(), a.section(), PlanReportPrinter.arrow(Formats.wire(c.before()),
                    Formats.wire(c.after())), Formats.f(b.tension(), 0) + " → " + Formats.f(a.tension(), 0),
                    Formats.f(c.target(), pct ? 1 : 0), PlanReportPrinter.signed(c.deviationPct(), 1),
                    Formats.f(b.breakPct(), 1) + " → " + Formats.f(a.breakPct(), 1),
                    Formats.b(b.inharmonicity()) + " → " + Formats.b(a.inharmonicity()));
        }
        t.print(w);
        PlanReportPrinter.summary(p, w);
    }
}
