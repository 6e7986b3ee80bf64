package org.scalewright.app.wirecheck;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.function.Supplier;
import java.util.stream.Collectors;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.scalewright.app.curves.CurvesViewModel;
import org.scalewright.app.session.Choice;
import org.scalewright.app.session.DisplayFormat;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.TypedEntry;
import org.scalewright.app.session.UserPrompts;
import org.scalewright.app.tool.ToolResult;
import org.scalewright.chart.CurveOverlay;
import org.scalewright.design.wirecheck.PitchState;
import org.scalewright.design.wirecheck.SizeRounding;
import org.scalewright.design.wirecheck.StageLimit;
import org.scalewright.design.wirecheck.TensionTotals;
import org.scalewright.design.wirecheck.WireCheck;
import org.scalewright.design.wirecheck.WireCheckNote;
import org.scalewright.design.wirecheck.WireCheckReport;
import org.scalewright.design.wirecheck.WireCheckRequest;
import org.scalewright.design.wirecheck.WireConversion;
import org.scalewright.io.BadInputException;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.PitchStateReader;
import org.scalewright.io.SheetProblem;
import org.scalewright.io.StrengthTableReader;
import org.scalewright.io.WireCheckCsv;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.PitchStandard;
import org.scalewright.physics.StrengthTable;

/**
 * The wire check tool: what a replacement wire (another maker's table and/or plain sizes
 * converted to the other size system), a target pitch standard and a pitch raise with overpull
 * do to every string of the working scale. The results are the engine's
 * ({@link WireCheck#run}); this model reads the entries, shows the report in rows and lines,
 * draws after and peak over the percent-of-breaking-strength curve and writes the CSV.
 */
public final class WireCheckViewModel {
    /** The overlay names on the percent chart. */
    public static final String AFTER = "after: replacement at target";
    public static final String PEAK = "peak of the overpull";

    /** How plain wire sizes are converted. */
    static final class Conversion {
        static final Choice<WireConversion> KEEP = new Choice<>("keep the sizes", WireConversion.keep());
        static final Choice<WireConversion> METRIC_NEAREST = metric("to metric, nearest", SizeRounding.NEAREST);
        static final Choice<WireConversion> METRIC_UP = metric("to metric, next larger", SizeRounding.UP);
        static final Choice<WireConversion> METRIC_DOWN = metric("to metric, next smaller", SizeRounding.DOWN);
        static final Choice<WireConversion> INCH_NEAREST = inch("to inch sizes, nearest", SizeRounding.NEAREST);
        static final Choice<WireConversion> INCH_UP = inch("to inch sizes, next larger", SizeRounding.UP);
        static final Choice<WireConversion> INCH_DOWN = inch("to inch sizes, next smaller", SizeRounding.DOWN);

        private Conversion() {
        }

        static List<Choice<WireConversion>> values() {
            return List.of(KEEP, METRIC_NEAREST, METRIC_UP, METRIC_DOWN, INCH_NEAREST, INCH_UP, INCH_DOWN);
        }

        private static Choice<WireConversion> metric(String label, SizeRounding r) {
            return new Choice<>(label, WireConversion.toMetric(r, BuiltInData.metricPlainWire()));
        }

        private static Choice<WireConversion> inch(String label, SizeRounding r) {
            return new Choice<>(label, WireConversion.toInch(r, BuiltInData.musicWireSizes()));
        }
    }

    /** One row of the results: percent of breaking strength before, after and at the peak. */
    public record Row(int key, String note, String wireBefore, String wireAfter, double centsFlat, double pctBefore,
               double pctAfter, double pctPeak, double headroomAfter, boolean overDanger, boolean cautionAtPeak) {
    }

    private final ScaleSession session;
    private final UserPrompts prompts;
    private final ReadOnlyObjectWrapper<StrengthTable> replacement = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyStringWrapper replacementName = new ReadOnlyStringWrapper();
    private final ObjectProperty<Choice<WireConversion>> conversion = new SimpleObjectProperty<>(Conversion.KEEP);
    private final StringProperty targetA4 = new SimpleStringProperty("");
    private final StringProperty centsFlat = new SimpleStringProperty("0");
    private final ReadOnlyObjectWrapper<PitchState> measuredFlat = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyStringWrapper flatFileName = new ReadOnlyStringWrapper("");
    private final StringProperty overpull = new SimpleStringProperty("0");
    private final StringProperty stageLimit = new SimpleStringProperty("5 %");
    private final ObservableList<Row> rows = FXCollections.observableArrayList();
    private final ToolResult<WireCheckReport> result;
    private final ReadOnlyStringWrapper summary = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper totals = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper stages = new ReadOnlyStringWrapper("");
    private final ObservableList<String> cautions = FXCollections.observableArrayList();

    public WireCheckViewModel(ScaleSession session, UserPrompts prompts, CurvesViewModel curves) {
        this.session = session;
        this.prompts = prompts;
        this.result = new ToolResult<>(session, prompts, curves, "wire check");
        // the wires follow the display units, as in the note table
        session.unitsProperty().addListener((o, a, b) -> {
            WireCheckReport shown = result.reportProperty().get();
            if (shown != null) {
                rows.setAll(rowsOf(shown));
            }
        });
        replacementName.set(presentTableWords());
        targetA4.set(a4Text(session.scale().pitch().a4()));
        session.scaleProperty().addListener((o, a, b) -> {
            if (a == null || b == null || a.pitch().a4() != b.pitch().a4()
                    && targetA4.get().equals(a4Text(a.pitch().a4()))) {
                targetA4.set(a4Text(b.pitch().a4()));
            }
        });
        session.strengthProperty().addListener((o, a, b) -> {
            if (replacement.get() == null) {
                replacementName.set(presentTableWords());
            }
        });
    }

    // ---- entries ----

    ReadOnlyObjectProperty<StrengthTable> replacementProperty() {
        return replacement.getReadOnlyProperty();
    }

    ReadOnlyStringProperty replacementNameProperty() {
        return replacementName.getReadOnlyProperty();
    }

    /** Reads a maker's table as the replacement; a bad file shows its problems and changes nothing. */
    boolean loadReplacement() {
        Optional<Path> file = prompts.chooseStrengthTable();
        if (file.isEmpty()) {
            return false;
        }
        try {
            StrengthTable t = StrengthTableReader.read(file.get());
            replacement.set(t);
            replacementName.set(t.name() + " (" + file.get().getFileName() + ")");
            session.inform("replacement wire: " + t.name());
            return true;
        } catch (BadInputException e) {
            prompts.showProblems("Strength table not read", file.get()
                    + " could not be read; the replacement is unchanged.", problems(e));
            session.complain("could not read " + file.get().getFileName() + ": " + e.problems().size() + " problem"
                    + (e.problems().size() == 1 ? "" : "s"));
            return false;
        }
    }

    /** The replacement is the present wire's table again. */
    void clearReplacement() {
        replacement.set(null);
        replacementName.set(presentTableWords());
    }

    ObjectProperty<Choice<WireConversion>> conversionProperty() {
        return conversion;
    }

    StringProperty targetA4Property() {
        return targetA4;
    }

    StringProperty centsFlatProperty() {
        return centsFlat;
    }

    StringProperty overpullProperty() {
        return overpull;
    }

    StringProperty stageLimitProperty() {
        return stageLimit;
    }

    ReadOnlyStringProperty flatFileNameProperty() {
        return flatFileName.getReadOnlyProperty();
    }

    /** Reads how flat each note stands from a file; a bad file shows its problems and changes nothing. */
    boolean loadFlatFile() {
        Optional<Path> file = prompts.choosePitchStateFile();
        if (file.isEmpty()) {
            return false;
        }
        try {
            PitchState state = PitchStateReader.read(file.get(), session.scale());
            measuredFlat.set(state);
            flatFileName.set(file.get().getFileName() + " (" + state.measured().size() + " keys)");
            session.inform("cents flat per note read from " + file.get().getFileName());
            return true;
        } catch (BadInputException e) {
            prompts.showProblems("Cents flat not read", file.get()
                    + " could not be read; the pitch raise is unchanged.", problems(e));
            return false;
        }
    }

    /** Back to one figure of cents flat for every note. */
    void clearFlatFile() {
        measuredFlat.set(null);
        flatFileName.set("");
    }

    // ---- the check ----

    /**
     * Runs the check with the entries; entries that cannot be read are named in
     * {@link #problemProperty()} and nothing changes.
     *
     * @return true when the check ran
     */
    boolean check() {
        List<String> bad = new ArrayList<>();
        if (session.scale().notes().isEmpty()) {
            bad.add("open a scale sheet first");
        }
        Double a4 = TypedEntry.number(targetA4.get(), "target A4", "Hz", bad);
        PitchStandard target = a4 == null ? null : refused(bad, () -> PitchStandard.of(a4));
        PitchState state = measuredFlat.get();
        if (state == null) {
            Double flat = TypedEntry.number(centsFlat.get(), "cents flat", "c", bad);
            state = flat == null ? null : refused(bad, () -> PitchState.flatBy(flat));
        }
        Double typedPull = TypedEntry.number(overpull.get(), "overpull", "%", bad);
        Double pull = typedPull == null ? null : refused(bad, () -> WireCheckRequest.overpull(typedPull));
        StageLimit limit = refused(bad, () -> StageLimit.parse(stageLimit.get()));
        if (!bad.isEmpty()) {
            return result.refuse(bad);
        }
        var settings = session.settingsProperty().get();
        WireCheckRequest request = new WireCheckRequest(session.scale(), settings, replacement.get(),
                conversion.get().value(), target, state, pull, limit);
        WireCheckReport r;
        try {
            r = WireCheck.run(request);
        } catch (IllegalArgumentException e) {
            return result.refuse(List.of(e.getMessage()));
        }
        show(r);
        session.inform("wire check: " + r.atRisk().size() + " of " + r.notes().size()
                + " notes at or above the danger band at the peak");
        return true;
    }

    private void show(WireCheckReport r) {
        rows.setAll(rowsOf(r));
        summary.set(r.riskSummary());
        totals.set(r.totals().states().stream().map(TensionTotals.State::words).collect(Collectors.joining("\n")));
        stages.set(WireCheckText.stages(r));
        cautions.setAll(r.request().isPitchRaise() ? BuiltInData.cautions() : List.of());
        result.show(r, overlays(r));
    }

    /** @return the table's rows, wires in the display length unit */
    private List<Row> rowsOf(WireCheckReport r) {
        double caution = r.request().settings().bands().caution();
        var unit = session.units().length();
        List<Row> next = new ArrayList<>(r.notes().size());
        for (WireCheckNote n : r.notes()) {
            next.add(new Row(n.key(), n.noteName(), WireCheckText.wire(n.presentNote(), unit),
                    WireCheckText.wire(n.replacementNote(), unit), n.centsFlat(), n.breakPctBefore(), n.breakPctAfter(),
                    n.breakPctPeak(), n.headroomCentsAfter(), n.overDanger(), n.breakPctPeak() >= caution));
        }
        return next;
    }

    /** @return after (and the peak, where it differs) as overlays of the percent chart */
    static List<CurveOverlay> overlays(WireCheckReport r) {
        Map<Integer, Double> after = new TreeMap<>();
        Map<Integer, Double> peak = new TreeMap<>();
        boolean peakDiffers = false;
        for (WireCheckNote n : r.byKey()) {
            after.put(n.key(), n.breakPctAfter());
            peak.put(n.key(), n.breakPctPeak());
            peakDiffers |= Math.abs(n.breakPctPeak() - n.breakPctAfter()) > 1e-9;
        }
        List<CurveOverlay> list = new ArrayList<>();
        list.add(CurveOverlay.of(AFTER, after, CurveOverlay.Look.LINE));
        if (peakDiffers) {
            list.add(CurveOverlay.of(PEAK, peak, CurveOverlay.Look.DOTTED));
        }
        return list;
    }

    /** Writes the per-note results as CSV (DESIGN §5 columns) to a file the user chooses. */
    boolean exportCsv() {
        return result.exportCsv("wire-check.csv",
                new ToolResult.CsvForm<>(WireCheckCsv::comments, WireCheckCsv.HEADER, WireCheckCsv::rows));
    }

    /** Takes the results away, and their overlays off the curves. */
    void clear() {
        result.clear();
        rows.clear();
        totals.set("");
        stages.set("");
        cautions.clear();
        summary.set("");
    }

    /** Selects the key of a result row (the table and curves follow). */
    void select(Row row) {
        if (row != null) {
            result.select(row.key());
        }
    }

    // ---- results ----

    ObservableList<Row> rows() {
        return rows;
    }

    ReadOnlyObjectProperty<WireCheckReport> reportProperty() {
        return result.reportProperty();
    }

    ReadOnlyStringProperty summaryProperty() {
        return summary.getReadOnlyProperty();
    }

    ReadOnlyStringProperty totalsProperty() {
        return totals.getReadOnlyProperty();
    }

    ReadOnlyStringProperty stagesProperty() {
        return stages.getReadOnlyProperty();
    }

    /** @return the safety cautions, shown where the check involves a pitch raise (else empty) */
    ObservableList<String> cautions() {
        return cautions;
    }

    ReadOnlyStringProperty problemProperty() {
        return result.problemProperty();
    }

    /** @return true when the scale or settings changed after the check (its overlays are taken down) */
    ReadOnlyBooleanProperty staleProperty() {
        return result.staleProperty();
    }

    double dangerPct() {
        return session.settingsProperty().get().bands().danger();
    }

    private String presentTableWords() {
        return "none: the present table (" + session.settingsProperty().get().strength().name() + ")";
    }

    private static List<String> problems(BadInputException e) {
        return e.problems().stream().map(SheetProblem::toString).toList();
    }

    private static String a4Text(double a4) {
        return DisplayFormat.decimals(a4, 1, 2);
    }

    /** @return what {@code value} gives, or null with its refusal added to {@code bad} */
    private static <T> T refused(List<String> bad, Supplier<T> value) {
        try {
            return value.get();
        } catch (InvalidInput e) {
            bad.add(e.getMessage());
            return null;
        }
    }
}
