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
import org.scalewright.design.wirecheck.StageLimit;
import org.scalewright.design.wirecheck.StageWords;
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
import org.scalewright.model.InvalidInput;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.StrengthTable;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

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

    @Option(names = "--stage-above", paramLabel = "AMOUNT",
            description = "advise raising in stages when the total tension changes by more than this in one "
                    + "pass: 10kN, 2200lbf or 5%% (default: 5%% of the present total, a rule of thumb, common "
                    + "practice, no source); a decimal comma is taken too (7,5kN)")
    String stageAbove;

    @Mixin
    CsvOutput out;

    @Override
    public Integer call() throws Exception {
        WireCheckRequest request = request();
        WireCheckReport report = WireCheck.run(request);
        return out.writeThenPrint(WireCheckCsv.comments(report), WireCheckCsv.HEADER, WireCheckCsv.rows(report),
                w -> print(report, w));
    }

    private WireCheckRequest request() throws BadInputException {
        List<String> problems = new ArrayList<>();
        PitchState uniform = check(problems, () -> flatness != null && flatness.cents != null
                ? PitchState.flatBy(flatness.cents) : null);
        check(problems, () -> WireCheckRequest.overpull(overpull));
        PitchStandard a4Target = check(problems, () -> a4 == null ? null : PitchStandard.of(a4));
        StageLimit limit = check(problems, () -> stageAbove == null ? StageLimit.DEFAULT : StageLimit.parse(stageAbove));
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
        if (uniform != null) {
            state = uniform;
        } else if (flatness != null && flatness.file != null) {
            state = PitchStateReader.read(flatness.file, scale);
        }
        PitchStandard target = a4Target == null ? scale.pitch() : a4Target;
        return new WireCheckRequest(scale, settings, replacement, c, target, state, overpull,
                limit);
    }

    /** @return what {@code value} gives, or null with its refusal added to {@code problems} */
    private static <T> T check(List<String> problems, java.util.function.Supplier<T> value) {
        try {
            return value.get();
        } catch (InvalidInput e) {
            problems.add(e.getMessage());
            return null;
        }
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
        w.println("  present state: " + q.flat().describe() + "; overpull " + Formats.trim(q.overpullPct())
                + " % of how flat each note is");
        for (WireCheckNote n : r.conversionWarnings()) {
            w.println("  note: key " + n.key() + " " + n.noteName() + ": " + n.wireChange().remark());
        }
        w.println();
        List<WireCheckNote> risk = r.atRisk();
        if (risk.isEmpty()) {
            w.println(r.riskSummary());
        } else {
            w.println("Notes at risk: " + r.riskSummary());
            table(risk, q).print(w);
        }
        w.println();
        w.println(risk.isEmpty() ? "All notes:" : "Other notes:");
        table(r.notes().stream().filter(n -> !n.overDanger()).toList(), q).print(w);
        w.println("mark: ! at or above the danger band at the peak, ^ in the caution band at the peak");
        w.println();
        if (!r.tablesSummary().isEmpty()) {
            WordWrap.print(w, "", r.tablesSummary());
            w.println();
        }
        w.println("Total tension on the plate:");
        TextTable tt = new TextTable("state", ">kN", ">lbf", ">change kN", ">change lbf", ">change %");
        for (TensionTotals.State st : r.totals().states()) {
            boolean present = !Double.isFinite(st.change());
            tt.row(st.name(), Formats.f(st.total() / 1e3, 1), lbf(st.total()), present ? "" : signedKn(st.change()),
                    present ? "" : signedLbf(st.change()), present ? "" : Formats.f(st.changePct(), 1));
        }
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
        StageWords words = r.stageWords();
        w.println(words.headline());
        for (String reason : words.reasons()) {
            WordWrap.print(w, "  - ", reason);
        }
        if (!words.plan().isEmpty()) {
            WordWrap.print(w, "  ", words.plan());
        }
        if (words.passes().isEmpty()) {
            return;
        }
        TextTable t = new TextTable(">pass", ">raised to %", ">total at start kN", ">total at peak kN", ">change kN",
                ">highest % at peak", ">at key");
        for (RaiseStage st : r.stages().stages()) {
            t.row(st.number(), Formats.f(100 * st.endFraction(), 0), Formats.f(st.totalAtStart() / 1e3, 1),
                    Formats.f(st.totalAtPeak() / 1e3, 1), signedKn(st.change()), Formats.f(st.maxPeakPct(), 1),
                    st.maxPeakKey());
        }
        t.print(w);
        WordWrap.print(w, "  ", words.closing());
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
