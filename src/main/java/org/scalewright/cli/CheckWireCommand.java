package org.scalewright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.scalewright.design.wirecheck.PitchState;
import org.scalewright.design.wirecheck.RaiseStage;
import org.scalewright.design.wirecheck.SizeRounding;
import org.scalewright.design.wirecheck.StageAdvice;
import org.scalewright.design.wirecheck.StageLimit;
import org.scalewright.design.wirecheck.StrengthComparison;
import org.scalewright.design.wirecheck.TensionTotals;
import org.scalewright.design.wirecheck.WireCheck;
import org.scalewright.design.wirecheck.WireCheckNote;
import org.scalewright.design.wirecheck.WireCheckReport;
import org.scalewright.design.wirecheck.WireCheckRequest;
import org.scalewright.design.wirecheck.WireConversion;
import org.scalewright.io.BadInputException;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.PitchStateReader;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.io.StrengthTableReader;
import org.scalewright.io.WireCheckCsv;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.StrengthTable;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code check-wire}: what replacement wire, a pitch standard and a pitch raise do to every string. */
@Command(name = "check-wire", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Check replacement wire, a target pitch standard and a pitch raise against every string: "
                + "percent of breaking strength before (present wire at the target pitch), after (replacement at "
                + "the target pitch) and at the peak of the overpull (a note C cents flat is first tuned sharp by "
                + "PCT %% of C). Notes over the danger band at the peak are listed first; the total tension on the "
                + "plate is given in kN and lbf, with advice on raising in stages."},
        footer = {"", "The present wire is judged by the ASTM A228 minimum tensile strength unless "
                + "--present-strength is given; --strength is the replacement maker's table. Plain wire is "
                + "converted with --to-metric or --to-inch; wound strings keep their cores but are judged by the "
                + "replacement table.",
                "", "Figures are estimates from nominal data: confirm with the maker's certified strength data. "
                + "Wear eye protection when raising pitch, and raise a piano that stands far flat in stages."})
public final class CheckWireCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "SCALE.csv", description = "the scale sheet with the present wire")
    Path scaleFile;

    @Option(names = "--strength", paramLabel = "MAKER.csv",
            description = "the replacement wire maker's strength table (default: the present table)")
    Path replacementFile;

    @Option(names = "--present-strength", paramLabel = "TABLE.csv",
            description = "strength table of the present wire (default: ASTM A228 minimum tensile strength)")
    Path presentFile;

    @ArgGroup(exclusive = true, multiplicity = "0..1")
    Conversion conversion;

    static final class Conversion {
        @Option(names = "--to-metric", paramLabel = "nearest|up|down", converter = SizeRoundingConverter.class,
                description = "convert plain wire to the nearest, next larger or next smaller metric diameter")
        SizeRounding toMetric;

        @Option(names = "--to-inch", paramLabel = "nearest|up|down", converter = SizeRoundingConverter.class,
                description = "convert plain wire to the nearest, next larger or next smaller music-wire size")
        SizeRounding toInch;
    }

    @Option(names = "--a4", paramLabel = "HZ",
            description = "target pitch standard: A4 in Hz (default: the sheet's '# a4_hz:' or 440)")
    Double a4;

    @ArgGroup(exclusive = true, multiplicity = "0..1")
    Flatness flatness;

    static final class Flatness {
        @Option(names = "--flat-cents", paramLabel = "C",
                description = "every note stands C cents flat of the target now (negative: sharp)")
        Double cents;

        @Option(names = "--flat", paramLabel = "FILE.csv",
                description = "cents flat per note now: a CSV with key,cents_flat (keys between the measured "
                        + "ones are interpolated)")
        Path file;
    }

    @Option(names = "--overpull", paramLabel = "PCT", defaultValue = "0",
            description = "tune each note sharp by PCT %% of how flat it is, 0-100 (default: ${DEFAULT-VALUE}, "
                    + "no overpull)")
    double overpull;

    @Option(names = "--stage-above", paramLabel = "AMOUNT", converter = StageLimitConverter.class,
            description = "advise raising in stages when the total tension changes by more than this in one "
                    + "pass: 10kN, 2200lbf or 5%% (default: 5%% of the present total, a rule of thumb, common "
                    + "practice, no source)")
    StageLimit stageAbove;

    @Option(names = "--out", paramLabel = "FILE.csv", description = "write the per-note results as CSV (SI units)")
    Path out;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        WireCheckRequest request = request();
        WireCheckReport report = WireCheck.run(request);
        PrintWriter w = spec.commandLine().getOut();
        String closing = Outputs.csvIfAsked(out, WireCheckCsv.comments(report), WireCheckCsv.HEADER, WireCheckCsv.rows(report));
        print(report, w);
        Outputs.printClosing(w, closing);
        return ExitStatus.OK;
    }

    private WireCheckRequest request() throws BadInputException {
        List<String> problems = new ArrayList<>();
        if (flatness != null && flatness.cents != null && !(Math.abs(flatness.cents) <= PitchStateReader.MAX_CENTS)) {
            problems.add("--flat-cents must be between -1200 and 1200 cents, was " + Formats.trim(flatness.cents));
        }
        if (!(overpull >= 0 && overpull <= 100)) {
            problems.add("--overpull must be 0 to 100 %, was " + Formats.trim(overpull));
        }
        if (a4 != null && !(a4 > 0 && a4 < 1000)) {
            problems.add("--a4 must be a frequency in Hz between 0 and 1000, was " + Formats.trim(a4));
        }
        if (!problems.isEmpty()) {
            throw new UserError(String.join("\n", problems));
        }
        Scale scale = ScaleSheetReader.standard().read(scaleFile);
        StrengthTable present = presentFile == null ? BuiltInData.astmMinimum() : StrengthTableReader.read(presentFile);
        StrengthTable replacement = replacementFile == null ? present : StrengthTableReader.read(replacementFile);
        AnalysisSettings settings = BuiltInData.defaultSettings().withStrength(present);
        WireConversion c = WireConversion.keep();
        if (conversion != null && conversion.toMetric != null) {
            c = WireConversion.toMetric(conversion.toMetric, BuiltInData.metricPlainWire());
        } else if (conversion != null && conversion.toInch != null) {
            c = WireConversion.toInch(conversion.toInch, BuiltInData.musicWireSizes());
        }
        PitchState state = PitchState.atPitch();
        if (flatness != null && flatness.cents != null) {
            state = PitchState.uniform(flatness.cents);
        } else if (flatness != null && flatness.file != null) {
            state = PitchStateReader.read(flatness.file, scale);
        }
        PitchStandard target = a4 == null ? scale.pitch() : new PitchStandard(a4);
        return new WireCheckRequest(scale, settings, replacement, c, target, state, overpull,
                stageAbove == null ? StageLimit.DEFAULT : stageAbove);
    }

    static void print(WireCheckReport r, PrintWriter w) {
        WireCheckRequest q = r.request();
        Scale s = q.scale();
        w.println("Wire check: " + (s.title().isEmpty() ? "scale" : s.title()) + ", " + s.notes().size() + " notes");
        w.println("  pitch: sheet A4 = " + Formats.trim(s.pitch().a4()) + " Hz, target A4 = "
                + Formats.trim(q.target().a4()) + " Hz");
        w.println("  present wire judged by: " + q.settings().strength().name());
        w.println("  replacement judged by:  " + q.replacement().name());
        w.println("  wire: " + q.conversion().describe() + (r.converted().isEmpty() ? ""
                : " (" + r.converted().size() + " notes change diameter)"));
        w.println("  present state: " + flatWords(q) + "; overpull " + Formats.trim(q.overpullPct())
                + " % of how flat each note is");
        for (WireCheckNote n : r.conversionWarnings()) {
            w.println("  note: key " + n.key() + " " + n.noteName() + ": " + n.wireChange().remark());
        }
        w.println();
        double danger = q.settings().bands().danger();
        List<WireCheckNote> risk = r.atRisk();
        if (risk.isEmpty()) {
            w.println(String.format(Locale.ROOT, "No note reaches the danger band (%.0f %%) at the peak.", danger));
        } else {
            w.println(String.format(Locale.ROOT, "Notes at risk: %d at or above the danger band (%.0f %%) at the "
                    + "peak, highest first", risk.size(), danger));
            table(risk, q).print(w);
        }
        w.println();
        w.println(risk.isEmpty() ? "All notes:" : "Other notes:");
        table(r.notes().stream().filter(n -> !n.overDanger()).toList(), q).print(w);
        w.println("mark: ! at or above the danger band at the peak, ^ in the caution band at the peak");
        w.println();
        StrengthComparison c = r.tables();
        if (!c.first().name().equals(c.second().name())) {
            WordWrap.print(w, "", String.format(Locale.ROOT, "Strength tables compared on the replacement wire: the "
                            + "replacement table is %+.1f to %+.1f %% stronger than the present one over these "
                            + "diameters.", c.minSecondStrongerPct(), c.maxSecondStrongerPct()));
            w.println();
        }
        TensionTotals t = r.totals();
        w.println("Total tension on the plate:");
        TextTable tt = new TextTable("state", ">kN", ">lbf", ">change kN", ">change lbf", ">change %");
        tt.row("present (present wire, present pitch)", Formats.f(t.present() / 1e3, 1), lbf(t.present()), "", "", "");
        tt.row("present wire at target", Formats.f(t.beforeAtTarget() / 1e3, 1), lbf(t.beforeAtTarget()),
                signedKn(t.beforeAtTarget() - t.present()), signedLbf(t.beforeAtTarget() - t.present()),
                Formats.f(100 * (t.beforeAtTarget() / t.present() - 1), 1));
        tt.row("replacement at target", Formats.f(t.afterAtTarget() / 1e3, 1), lbf(t.afterAtTarget()),
                signedKn(t.changeToTarget()), signedLbf(t.changeToTarget()), Formats.f(t.changeToTargetPct(), 1));
        tt.row("replacement at the overpull peak", Formats.f(t.peak() / 1e3, 1), lbf(t.peak()),
                signedKn(t.changeToPeak()), signedLbf(t.changeToPeak()), Formats.f(t.changeToPeakPct(), 1));
        tt.print(w);
        w.println();
        printStages(r, w);
        if (q.isPitchRaise()) {
            w.println();
            w.println("Cautions:");
            for (String caution : BuiltInData.cautions()) {
                WordWrap.print(w, "  - ", caution);
            }
        }
    }

    private static void printStages(WireCheckReport r, PrintWriter w) {
        StageAdvice a = r.stages();
        WireCheckRequest q = r.request();
        if (!a.advised()) {
            w.println("Raise in stages: not needed by these figures (no peak in the danger band; total tension "
                    + "change within " + q.stageLimit().describe() + ").");
            return;
        }
        w.println("Raise in stages: advised, because");
        for (String reason : a.reasons()) {
            WordWrap.print(w, "  - ", reason);
        }
        if (!a.dangerAtTarget().isEmpty()) {
            WordWrap.print(w, "  - ", keyList(a.dangerAtTarget()) + (a.dangerAtTarget().size() == 1 ? " is" : " are")
                    + " in the danger band at the target pitch itself with the replacement: staging cannot help"
                    + (a.dangerAtTarget().size() == 1 ? " it" : " them") + "; change the wire or the pitch standard");
        }
        if (!a.hasPlan()) {
            w.println(String.format(Locale.ROOT, "  No plan of up to %d passes keeps every pass within the limits; "
                    + "consider a lower target pitch or a stronger wire.", StageAdvice.MAX_STAGES));
            return;
        }
        double overpull = q.overpullPct();
        w.println(String.format(Locale.ROOT, "  Plan: %d passes, each raising every note by 1/%d of how flat it is, "
                + "tuned %s %% sharp of that step:", a.stages().size(), a.stages().size(), Formats.trim(overpull)));
        TextTable t = new TextTable(">pass", ">raised to %", ">total at start kN", ">total at peak kN", ">change kN",
                ">highest % at peak", ">at key");
        for (RaiseStage st : a.stages()) {
            t.row(st.number(), Formats.f(100 * st.endFraction(), 0), Formats.f(st.totalAtStart() / 1e3, 1),
                    Formats.f(st.totalAtPeak() / 1e3, 1), signedKn(st.change()), Formats.f(st.maxPeakPct(), 1),
                    st.maxPeakKey());
        }
        t.print(w);
        w.println("  Each pass stays within the stage limit (" + q.stageLimit().describe() + ", "
                + Formats.f(a.limitNewtons() / 1e3, 1) + " kN) and under the danger band at its peak.");
    }

    private static TextTable table(List<WireCheckNote> notes, WireCheckRequest q) {
        TextTable t = new TextTable(">key", "note", "wire before", "wire after", ">flat c", ">target Hz", ">peak Hz",
                ">% before", ">% after", ">% peak", ">headroom c", "mark");
        double danger = q.settings().bands().danger();
        double caution = q.settings().bands().caution();
        for (WireCheckNote n : notes) {
            t.row(n.key(), n.noteName(), Formats.wire(n.presentNote()), Formats.wire(n.replacementNote()),
                    Formats.f(n.centsFlat(), 1), Formats.f(n.after().frequency(), 2),
                    Formats.f(n.peak().frequency(), 2), Formats.f(n.breakPctBefore(), 1),
                    Formats.f(n.breakPctAfter(), 1), Formats.f(n.breakPctPeak(), 1),
                    Formats.f(n.headroomCentsAfter(), 0),
                    n.breakPctPeak() >= danger ? "!" : n.breakPctPeak() >= caution ? "^" : "");
        }
        return t;
    }

    private static String keyList(List<Integer> keys) {
        StringBuilder b = new StringBuilder(keys.size() == 1 ? "key " : "keys ");
        for (int i = 0; i < keys.size(); i++) {
            b.append(i == 0 ? "" : ", ").append(keys.get(i)).append(' ')
                    .append(org.scalewright.model.KeyNames.name(keys.get(i)));
        }
        return b.toString();
    }

    private static String flatWords(WireCheckRequest q) {
        PitchState f = q.flat();
        if (f.isPerNote()) {
            return "cents flat measured on " + f.measured().size() + " keys (" + Formats.f(
                    f.measured().values().stream().mapToDouble(Double::doubleValue).min().orElse(0), 1) + " to "
                    + Formats.f(f.measured().values().stream().mapToDouble(Double::doubleValue).max().orElse(0), 1)
                    + "), interpolated between them";
        }
        return Formats.trim(f.uniformCents()) + " cents flat on every note";
    }

    private static String lbf(double n) {
        return String.format(Locale.ROOT, "%,.0f", org.scalewright.model.UnitConversions.newtonsToLbf(n));
    }

    private static String signedKn(double n) {
        return String.format(Locale.ROOT, "%+.1f", n / 1e3);
    }

    private static String signedLbf(double n) {
        return String.format(Locale.ROOT, "%+,.0f", org.scalewright.model.UnitConversions.newtonsToLbf(n));
    }
}
