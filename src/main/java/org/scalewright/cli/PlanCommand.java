package org.scalewright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.scalewright.design.rescale.KeyChange;
import org.scalewright.design.rescale.PlainPlanner;
import org.scalewright.design.rescale.PlanChecks;
import org.scalewright.design.rescale.PlanNotPossible;
import org.scalewright.design.rescale.Proposal;
import org.scalewright.design.rescale.TargetCurve;
import org.scalewright.design.rescale.TargetQuantity;
import org.scalewright.design.rescale.TargetSpec;
import org.scalewright.design.rescale.WoundPlanner;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * What {@code plan-plain} and {@code plan-wound} share: the inputs, the target, the keys, the
 * maximum, the step cost and the output sheet, and the run from options to the written sheet.
 * A subclass checks its own options, plans, and lays out its change table.
 */
abstract class PlanCommand extends ScaleCommand {
    @Mixin
    PlanTargetOptions targetOptions;

    @Mixin
    KeysOption range;

    @Option(names = "--max-break", paramLabel = "PCT",
            description = "maximum percent of breaking strength for every planned string (default: the danger band, 70)")
    Double maxBreak;

    @Option(names = "--change-cost", paramLabel = "X", defaultValue = "0.002",
            description = "cost of each change of wire between neighbouring keys: of plain size, in squared fractions "
                    + "of the target (0.002 weighs as much as one key 4.5 %% off the target); of core when cores are "
                    + "chosen, in squared log-B units (default: ${DEFAULT-VALUE})")
    double changeCost;

    @Option(names = "--step-cost", paramLabel = "X", defaultValue = "1",
            description = "cost per unit fraction a neighbour step exceeds the step limit (1: 1 %% over weighs as "
                    + "much as one key 10 %% off the target; 0: steps only reported; default: ${DEFAULT-VALUE})")
    double stepCost;

    @Option(names = "--out", required = true, paramLabel = "NEW.csv", description = "the new scale sheet to write")
    Path out;

    @Spec
    CommandSpec spec;

    /** What the target gives; a command that offers a choice sets it in {@link #checkOwnOptions()}. */
    TargetQuantity quantity = TargetQuantity.TENSION;

    private final boolean wound;
    private final String strings;
    private final String otherKindAdvice;
    private final String planWords;

    /**
     * @param wound           true when the command plans wound strings, false for plain wire
     * @param strings         the strings it plans, in words: {@code plain-wire strings}
     * @param otherKindAdvice where the other kind is planned: {@code wound strings are planned with plan-wound}
     * @param planWords       what it makes: {@code plain-wire plan}
     */
    PlanCommand(boolean wound, String strings, String otherKindAdvice, String planWords) {
        this.wound = wound;
        this.strings = strings;
        this.otherKindAdvice = otherKindAdvice;
        this.planWords = planWords;
    }

    /** @return the keys asked for */
    final KeyRange keys() {
        return range.keys;
    }

    @Override
    public final Integer call() throws Exception {
        targetOptions.check();
        OptionChecks.named("--change-cost", () -> PlanChecks.changeCost(changeCost));
        OptionChecks.named("--step-cost", () -> PlanChecks.stepCost(stepCost));
        checkOwnOptions();
        Scale scale = inputs.scale();
        AnalysisSettings settings = inputs.settings();
        double max = OptionChecks.named("--max-break",
                () -> PlanChecks.maxBreakPct(maxBreak == null ? settings.bands().danger() : maxBreak));
        ScaleAnalysis present = ScaleAnalyzer.analyze(scale, settings);
        KeyRange keys = keys();
        List<NoteResult> planned = wound ? WoundPlanner.plannedKeys(present, keys) : PlainPlanner.plannedKeys(present, keys);
        if (planned.isEmpty()) {
            throw new UserError("keys " + keys + " hold no " + strings + " in " + inputs.scaleFile.getFileName()
                    + " (" + otherKindAdvice + ")");
        }
        TargetSpec recipe = targetOptions.spec(quantity, planned.get(0).key(), planned.get(planned.size() - 1).key());
        Proposal p;
        try {
            TargetCurve target = wound ? WoundPlanner.target(present, keys, recipe, quantity, targetOptions.perSection())
                    : PlainPlanner.target(present, keys, recipe, targetOptions.perSection());
            p = plan(present, target, max);
        } catch (PlanNotPossible e) {
            throw new UserError("no " + planWords + " for keys " + keys + " meets the constraints:\n"
                    + String.join("\n", e.reasons()));
        }
        PrintWriter w = spec.commandLine().getOut();
        Scale s = p.before().scale();
        w.println((s.title().isEmpty() ? "Scale" : s.title()) + ": " + planWords + " for keys " + keys + ", A4 = "
                + Formats.trim(s.pitch().a4()) + " Hz");
        w.println("target: " + p.target().description()
                + (p.quantity() == TargetQuantity.BREAK_PCT ? " (core percent of breaking strength)" : ""));
        printOptions(p, w);
        w.println();
        List<String> head = new ArrayList<>(List.of(">key", "note", "section", "wire", ">tension N"));
        head.addAll(changeColumns(p));
        TextTable t = new TextTable(head.toArray(String[]::new));
        for (KeyChange c : p.changes()) {
            NoteResult b = c.beforeResult();
            NoteResult a = c.afterResult();
            List<Object> row = new ArrayList<>(List.of(c.key(), a.noteName(), a.section(),
                    PlanReportPrinter.arrow(Formats.wire(c.before()), Formats.wire(c.after())),
                    Formats.f(b.tension(), 0) + " → " + Formats.f(a.tension(), 0)));
            row.addAll(changeCells(c, p));
            t.row(row.toArray());
        }
        t.print(w);
        PlanReportPrinter.summary(p, w);
        Outputs.sheet(out, p.proposedScale());
        PlanReportPrinter.footer(p, out, w);
        return ExitStatus.OK;
    }

    /** Checks the options of this command before any file is read; a bad value is an InvalidInput or UserError. */
    abstract void checkOwnOptions();

    /** @return the proposal for the planned keys of {@link #keys()} to the target */
    abstract Proposal plan(ScaleAnalysis present, TargetCurve target, double maxBreakPct);

    /** Prints the lines that echo this command's wire and cost options, after the target line. */
    abstract void printOptions(Proposal p, PrintWriter w);

    /** @return the change table's columns after key, note, section, wire and tension ({@code >} right-aligns) */
    abstract List<String> changeColumns(Proposal p);

    /** @return the cells of those columns for one planned key */
    abstract List<Object> changeCells(KeyChange c, Proposal p);
}
