package org.scalewright.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.scalewright.design.rescale.KeyChange;
import org.scalewright.design.rescale.PlanChecks;
import org.scalewright.design.rescale.Proposal;
import org.scalewright.design.rescale.TargetCurve;
import org.scalewright.design.rescale.TargetQuantity;
import org.scalewright.design.rescale.WireLists;
import org.scalewright.design.rescale.WoundPlanOptions;
import org.scalewright.design.rescale.WoundPlanner;
import org.scalewright.design.rescale.WrapWires;
import org.scalewright.io.BadInputException;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.WrapCatalogueReader;
import org.scalewright.model.WireNotation;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code plan-wound}: design the wound strings of a range of keys to a target tension. */
@Command(name = "plan-wound", mixinStandardHelpOptions = true,
        description = "Design the wound strings of a range: core and wrap chosen together (cores from the present "
                    + "ones and the music-wire sizes between them, or --cores), the wrap diameter(s) the target "
                    + "tension needs (stiffness included), rounded to the wrap wire available (a built-in catalogue "
                    + "in 0.01 mm steps, --wrap-catalogue, --wraps or --wrap-step); double-wound where a single "
                    + "wrap would pass --double-above. Never rougher than the present strings: where a designed "
                    + "string would leave the keys rougher, the present one is kept. "
                    + "--join-break makes the strings either side of the bass/tenor break continuous in tension "
                    + "and as smooth in B as the cores allow. Plain keys in the range are skipped. Prints the "
                    + "changes and writes the new sheet.")
public final class PlanWoundCommand extends PlanCommand {
    @Option(names = "--target-of", paramLabel = "tension|break-pct", defaultValue = "tension",
            description = "what the target gives: per-string tension (N) or core percent of breaking strength "
                    + "(default: ${DEFAULT-VALUE})")
    String targetOf;

    /** Either a step or a list of wrap wire. */
    static final class WrapChoice {
        @Option(names = "--wrap-step", paramLabel = "MM",
                description = "wrap wire available in steps of MM (default: the built-in catalogue, copper and "
                        + "iron 0.10-2.00 mm in 0.01 mm steps)")
        Double step;

        @Option(names = "--wrap-catalogue", paramLabel = "FILE.csv",
                description = "wrap wire available, from a catalogue: columns metal (copper, iron, steel) and "
                        + "diameter_mm or diameter_in, its source in the comment lines")
        java.nio.file.Path catalogue;

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

    @Option(names = "--cores", paramLabel = "present|keep|LIST", defaultValue = "present",
            description = "choose each core with its wrap from the present cores of the range and the music-wire "
                    + "sizes between them (present), keep every present core (keep), or choose from this list of "
                    + "diameters in mm, e.g. 1.0,1.05,1.1; chosen cores never grow toward the treble and keep B "
                    + "smooth (default: ${DEFAULT-VALUE})")
    String cores;

    @Option(names = "--join-break", paramLabel = "N", defaultValue = "0",
            description = "join the break: the target runs on continuously through each change of section, and the "
                    + "cores of the N keys either side are chosen (0.025 mm steps, or --cores) for a smooth B "
                    + "(default: ${DEFAULT-VALUE} = off, at most " + PlanChecks.MAX_JOIN_KEYS + ")")
    int joinBreak;

    private WrapWires wraps;
    private List<Double> coreList;
    private boolean presentCores;

    public PlanWoundCommand() {
        super(true, "wound strings", "plain wire is planned with plan-plain", "wound-string design");
    }

    @Override
    void checkOwnOptions() {
        quantity = switch (targetOf.trim().toLowerCase(Locale.ROOT)) {
            case "tension" -> TargetQuantity.TENSION;
            case "break-pct" -> TargetQuantity.BREAK_PCT;
            default -> throw new UserError("--target-of must be tension or break-pct, was '" + targetOf + "'");
        };
        if (wrapChoice != null && wrapChoice.list != null) {
            wraps = OptionChecks.named("--wraps", () -> WrapWires.of(WireLists.diameters(WireLists.WRAPS,
                    wrapChoice.list)));
        } else if (wrapChoice != null && wrapChoice.step != null) {
            wraps = OptionChecks.named("--wrap-step", () -> WrapWires.steps(wrapChoice.step * 1e-3));
        } else if (wrapChoice != null && wrapChoice.catalogue != null) {
            try {
                wraps = WrapCatalogueReader.read(wrapChoice.catalogue);
            } catch (BadInputException e) {
                throw new UserError("--wrap-catalogue: " + e.getMessage());
            }
        } else {
            wraps = BuiltInData.wrapWire();
        }
        if (doubleAbove != null) {
            OptionChecks.named("--double-above", () -> PlanChecks.doubleAbove(doubleAbove * 1e-3));
        }
        OptionChecks.named("--double-ratio", () -> PlanChecks.doubleRatio(doubleRatio));
        OptionChecks.named("--join-break", () -> PlanChecks.joinBreakKeys(joinBreak));
        String c = cores.trim().toLowerCase(Locale.ROOT);
        presentCores = c.equals("present");
        coreList = c.equals("keep") || presentCores ? List.of()
                : OptionChecks.named("--cores", () -> WireLists.diameters(WireLists.CORES, cores));
    }

    @Override
    Proposal plan(ScaleAnalysis present, TargetCurve target, double maxBreakPct) {
        if (presentCores) {
            coreList = WoundPlanner.presentCores(present, keys(), BuiltInData.musicWireSizes().diameters());
        }
        return WoundPlanner.plan(present, keys(), target, options(maxBreakPct));
    }

    private WoundPlanOptions options(double maxBreakPct) {
        return new WoundPlanOptions(quantity, wraps,
                doubleAbove == null ? OptionalDouble.empty() : OptionalDouble.of(doubleAbove * 1e-3), doubleRatio,
                coreList, maxBreakPct, changeCost, stepCost, joinBreak);
    }

    @Override
    void printOptions(Proposal p, PrintWriter w) {
        WoundPlanOptions o = options(p.maxBreakPct());
        w.println("wrap: " + o.wraps().description() + "; winding: " + (o.doubleAbove().isPresent()
                ? "double where a single wrap would pass " + Formats.f(o.doubleAbove().getAsDouble() * 1e3, 2) + " mm"
                : "as now") + "; cores: " + (o.cores().isEmpty() ? "kept" : presentCores ? "chosen with the wraps from the present "
                + "cores and the music-wire sizes between them" : "chosen from the list")
                + (o.joinBreakKeys() > 0 ? ", re-chosen for " + o.joinBreakKeys() + " keys either side of a break" : "")
                + "; maximum " + Formats.trim(p.maxBreakPct()) + " % of breaking strength");
        w.println(WireNotation.LEGEND);
    }

    @Override
    List<String> changeColumns(Proposal p) {
        return List.of(p.quantity() == TargetQuantity.BREAK_PCT ? ">target %" : ">target N", ">err %",
                ">core % break", ">B");
    }

    @Override
    List<Object> changeCells(KeyChange c, Proposal p) {
        NoteResult b = c.beforeResult();
        NoteResult a = c.afterResult();
        return List.of(Formats.f(c.target(), p.quantity() == TargetQuantity.BREAK_PCT ? 1 : 0),
                PlanReportPrinter.signed(c.deviationPct(), 1), Formats.f(b.breakPct(), 1) + " → "
                        + Formats.f(a.breakPct(), 1), Formats.b(b.inharmonicity()) + " → " + Formats.b(a.inharmonicity()));
    }
}
