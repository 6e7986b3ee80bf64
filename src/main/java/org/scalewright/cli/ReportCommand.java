package org.scalewright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.scalewright.design.orders.WireAllowances;
import org.scalewright.design.orders.WireOrder;
import org.scalewright.design.stretch.OctaveType;
import org.scalewright.design.stretch.StretchPoint;
import org.scalewright.io.OutputRefused;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.Scale;
import org.scalewright.model.SheetColumn;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;
import org.scalewright.report.ReportCharts;
import org.scalewright.report.ReportContent;
import org.scalewright.report.ReportFiles;
import org.scalewright.report.ReportPaper;
import org.scalewright.report.ReportUnits;
import org.scalewright.report.Reports;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code report}: the PDF report, charts and order sheets of an instrument, into one directory. */
@Command(name = "report", mixinStandardHelpOptions = true,
        description = {"Write a scale's report into a directory: a PDF for the bench and the string maker, the "
                + "curves as pictures, and the results, string schedule and orders as CSV files and one workbook.",
                "Writes report.pdf; the curves as PNG and SVG (tension, break-percent, inharmonicity, "
                        + "stretch); results.csv, schedule.csv, wound-order.csv, wire-order.csv and stretch.csv "
                        + "(stretch_cents for the --octave type; the PDF gives all three), and the same tables "
                        + "as one workbook, tables.xlsx, for spreadsheets. "
                        + "Nothing is written if any input is bad."})
public final class ReportCommand extends ScaleCommand {
    @Option(names = "--out", paramLabel = "DIR", required = true,
            description = "directory to write the report into: created if missing, replaced as a whole if it "
                    + "holds an earlier report (it may hold nothing else)")
    Path out;

    @Option(names = "--reference", paramLabel = "OTHER.csv",
            description = "a reference scale sheet (e.g. as measured) drawn beside the working scale")
    Path reference;

    @Option(names = "--units", paramLabel = "metric|imperial",
            description = "units of the tables and orders (default: those of the sheet's speaking lengths)")
    String units;

    @Option(names = "--paper", paramLabel = "a4|letter",
            description = "paper of the PDF (default: A4 for metric units, Letter for imperial)")
    String paper;

    /** The octave type of stretch_cents in stretch.csv; the PDF gives all three. */
    @Mixin
    OctaveOption octave;

    @Option(names = "--pin-allowance", paramLabel = "MM",
            description = "plain wire per string for the tuning-pin coil and hitch, mm (default: 150)")
    Double pinAllowanceMm;

    @Option(names = "--length-allowance", paramLabel = "MM",
            description = "front and back length added to the speaking length where the sheet gives no "
                    + "stretched length, mm (default: 150)")
    Double lengthAllowanceMm;

    @Option(names = "--single-tied", description = "count every plain string as its own piece of wire "
            + "(default: adjacent strings of a note looped round a hitch pin, one piece per pair)")
    boolean singleTied;

    @Spec
    CommandSpec spec;

    @Mixin
    DecimalCommaOption dialect;

    /** Draws the report's charts (tests put a failing one here). */
    Reports.ChartDrawer charts = ReportCharts::reportCharts;

    @Override
    public Integer call() throws Exception {
        String dirProblem = ReportFiles.problemWith(out);
        if (dirProblem != null) {
            throw new UserError("--out: " + dirProblem);
        }
        OctaveType type = octave.type();
        WireAllowances allowances = allowances();
        Scale scale = inputs.scale();
        AnalysisSettings settings = inputs.settings();
        ReportUnits u = reportUnits(scale);
        ReportPaper pp = paper();
        ScaleAnalysis a = ScaleAnalyzer.analyze(scale, settings);
        Optional<ReportContent.Reference> ref = Optional.empty();
        if (reference != null) {
            Scale r = ScaleSheetReader.standard().read(reference);
            if (inputs.a4 != null) {
                r = r.withPitch(inputs.pitch());
            }
            ref = Optional.of(new ReportContent.Reference(reference.getFileName().toString(),
                    ScaleAnalyzer.analyze(r, settings)));
        }
        ReportContent content = ReportContent.compute(inputs.scaleFile.getFileName().toString(), a, ref, u, type,
                allowances).withPaper(pp);
        ReportFiles files = Reports.make(content, charts, dialect.dialect());
        List<Path> written;
        try {
            written = files.writeTo(out);
        } catch (OutputRefused e) {
            throw new UserError("--out: cannot write the report into " + out + ": " + e.getMessage());
        } catch (IOException e) {
            throw new UserError("cannot write the report into " + out + ": " + Outputs.describe(e));
        }
        java.util.Map<String, Integer> sizes = new java.util.HashMap<>();
        for (String name : files.names()) {
            sizes.put(name, files.content(name).length);
        }
        print(content, written, sizes, spec.commandLine().getOut());
        return ExitStatus.OK;
    }

    private ReportUnits reportUnits(Scale scale) {
        if (units == null) {
            return ReportUnits.of(scale.layout().unitOf(SheetColumn.SPEAKING_LENGTH));
        }
        return OptionChecks.named("--units", () -> ReportUnits.parse(units));
    }

    /** @return the paper given, or null for the usual one of the units */
    private ReportPaper paper() {
        return paper == null ? null : OptionChecks.named("--paper", () -> ReportPaper.parse(paper));
    }

    private WireAllowances allowances() {
        WireAllowances d = WireAllowances.DEFAULT;
        double pin = pinAllowanceMm == null ? d.pinAllowance()
                : OptionChecks.named("--pin-allowance", () -> WireAllowances.pinAllowanceOf(pinAllowanceMm));
        double length = lengthAllowanceMm == null ? d.lengthAllowance()
                : OptionChecks.named("--length-allowance", () -> WireAllowances.lengthAllowanceOf(lengthAllowanceMm));
        return new WireAllowances(pin, length, !singleTied);
    }

    private static void print(ReportContent c, List<Path> written, java.util.Map<String, Integer> sizes,
                              PrintWriter w) {
        ScaleAnalysis a = c.analysis();
        w.println(c.title() + ": " + a.notes().size() + " notes, A4 = " + Formats.trim(a.scale().pitch().a4())
                + " Hz, strength table: " + a.settings().strength().name());
        w.println("Total tension " + Formats.kN(a.totalTension()) + "; " + a.flaggedNoteCount() + " notes flagged.");
        w.println("Wound strings to make: " + c.woundOrder().totalStrings() + " on " + c.woundOrder().rows().size()
                + " notes.");
        WireOrder wo = c.wireOrder();
        w.println(String.format(Locale.ROOT, "Plain wire to buy: %d sizes, %d strings in %d pieces, %.1f m, %.0f g.",
                wo.rows().size(), wo.totalStrings(), wo.totalPieces(), wo.totalLength(), wo.totalMass() * 1e3));
        List<StretchPoint> pts = c.chosenStretch().points();
        StretchPoint lo = pts.get(0);
        StretchPoint hi = pts.get(pts.size() - 1);
        if (lo.stretchCents().isPresent() && hi.stretchCents().isPresent()) {
            w.println(String.format(Locale.ROOT, "Stretch (%s octaves): %+.1f cents at %s, %+.1f cents at %s.",
                    c.chosenStretch().octave().label(), lo.stretchCents().getAsDouble(), lo.noteName(),
                    hi.stretchCents().getAsDouble(), hi.noteName()));
        }
        w.println();
        w.println("wrote " + written.size() + " files into " + written.get(0).getParent() + ":");
        TextTable t = new TextTable("file", ">bytes");
        for (Path p : written) {
            t.row(p.getFileName(), sizes.getOrDefault(p.getFileName().toString(), 0));
        }
        t.print(w);
    }
}
