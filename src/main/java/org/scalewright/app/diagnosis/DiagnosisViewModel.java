package org.scalewright.app.diagnosis;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.scalewright.app.curves.CurvesViewModel;
import org.scalewright.app.session.DisplayFormat;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.TypedEntry;
import org.scalewright.app.session.UserPrompts;
import org.scalewright.app.tool.ToolResult;
import org.scalewright.chart.CurveOverlay;
import org.scalewright.design.diagnosis.DiagnosedNote;
import org.scalewright.design.diagnosis.DiagnosisReport;
import org.scalewright.design.diagnosis.DiagnosisRequest;
import org.scalewright.design.diagnosis.Finding;
import org.scalewright.design.diagnosis.Remedy;
import org.scalewright.design.diagnosis.SectionDiagnosis;
import org.scalewright.design.wirecheck.MakerTables;
import org.scalewright.io.BadInputException;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.DiagnosisCsv;
import org.scalewright.io.SheetProblem;
import org.scalewright.io.StrengthTableReader;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Note;
import org.scalewright.model.Scale;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.StrengthTable;

/**
 * The section diagnosis tool: for a key range where strings break, the engine's diagnosis
 * ({@link SectionDiagnosis#diagnose}) shown as rows, the finding in plain words with its
 * remedies and their computed effect, and the inspection list; the notes standing out are
 * marked on the percent-of-breaking-strength curve; the results are written as CSV.
 */
public final class DiagnosisViewModel {
    /** The overlay name of the notes standing out on the percent chart. */
    static final String STANDING_OUT = "stands out from its section";

    /** One row of the results. */
    record Row(int key, String note, String section, double stressMpa, double breakPct, double trendPct,
               double deviationPct, double headroomCents, double breakHz, String standsOut) {
    }

    /** One remedy: its words and whether, applied, it brings the range under the caution band. */
    record RemedyLine(String text, boolean fixes, double maxPctAfter) {
    }

    private final ScaleSession session;
    private final UserPrompts prompts;
    private final StringProperty range = new SimpleStringProperty("");
    private final StringProperty margin = new SimpleStringProperty(
            DisplayFormat.decimals(DiagnosisRequest.DEFAULT_MARGIN_PCT, 0, 1));
    private final ReadOnlyObjectWrapper<MakerTables> candidates = new ReadOnlyObjectWrapper<>(MakerTables.empty());
    private final ReadOnlyStringWrapper candidateNames = new ReadOnlyStringWrapper("none");
    private final ObservableList<Row> rows = FXCollections.observableArrayList();
    private final ToolResult<DiagnosisReport> result;
    private final ReadOnlyStringWrapper finding = new ReadOnlyStringWrapper("");
    private final ObservableList<RemedyLine> remedies = FXCollections.observableArrayList();
    private final ObservableList<String> inspect = FXCollections.observableArrayList();
    private String lastFilled = "";

    /** @return the stress column's header in the display units: {@code stress MPa}, or {@code stress ksi} with lbf */
    javafx.beans.binding.StringBinding stressHeader() {
        return javafx.beans.binding.Bindings.createStringBinding(() -> "stress " + DisplayFormat.stressUnit(session.units()),
                session.unitsProperty());
    }

    /** @return a row's stress in the display units */
    String stressText(Row r) {
        return DisplayFormat.stress(r.stressMpa() * 1e6, session.units());
    }

    public DiagnosisViewModel(ScaleSession session, UserPrompts prompts, CurvesViewModel curves) {
        this.session = session;
        this.prompts = prompts;
        this.result = new ToolResult<>(session, prompts, curves, "diagnosis");
        session.selectedKeyProperty().addListener((o, a, b) -> followSelection());
        followSelection();
    }

    // ---- entries ----

    /** @return the key range typed or prefilled (the section of the selected key), e.g. {@code 64-71} or {@code C6-G6} */
    StringProperty rangeProperty() {
        return range;
    }

    StringProperty marginProperty() {
        return margin;
    }

    ReadOnlyStringProperty candidateNamesProperty() {
        return candidateNames.getReadOnlyProperty();
    }

    /** Fills the range with the section of the selected key (a run of the same section label and string kind). */
    void useSectionOfSelection() {
        Integer key = session.selectedKeyProperty().get();
        if (key != null) {
            sectionOf(session.scale(), key).ifPresent(r -> {
                lastFilled = r.toString();
                range.set(lastFilled);
            });
        }
    }

    /** Reads another maker's table to try as a stronger wire; a bad file shows its problems and changes nothing. */
    boolean addCandidate() {
        Optional<Path> file = prompts.chooseStrengthTable();
        if (file.isEmpty()) {
            return false;
        }
        try {
            StrengthTable t = StrengthTableReader.read(file.get());
            candidates.set(candidates.get().with(t));
            candidateNames.set(String.join("; ", candidates.get().names()));
            return true;
        } catch (BadInputException e) {
            prompts.showProblems("Strength table not read", file.get()
                            + " could not be read; the tables to compare are unchanged.",
                    e.problems().stream().map(SheetProblem::toString).toList());
            return false;
        }
    }

    void clearCandidates() {
        candidates.set(MakerTables.empty());
        candidateNames.set("none");
    }

    // ---- the diagnosis ----

    /**
     * Diagnoses the range with the entries; entries that cannot be read are named in
     * {@link #problemProperty()} and nothing changes.
     *
     * @return true when the diagnosis ran
     */
    boolean diagnose() {
        List<String> bad = new ArrayList<>();
        Scale scale = session.scale();
        KeyRange keys = null;
        if (scale.notes().isEmpty()) {
            bad.add("open a scale sheet first");
        } else {
            try {
                keys = KeyRange.parse(range.get() == null ? "" : range.get().strip());
                if (scale.notesIn(keys).isEmpty()) {
                    bad.add("keys " + keys + ": the scale has no note in that range");
                    keys = null;
                }
            } catch (InvalidInput e) {
                bad.add("keys: " + e.getMessage());
            }
        }
        Double m = TypedEntry.number(margin.get(), "margin", "%", bad);
        if (m != null && !(m > 0 && m < 100)) {
            bad.add("margin must be between 0 and 100 %, was " + margin.get().strip());
        }
        if (!bad.isEmpty()) {
            return result.refuse(bad);
        }
        DiagnosisReport r;
        try {
            r = SectionDiagnosis.diagnose(DiagnosisRequest.of(scale, keys, session.settingsProperty().get(),
                            BuiltInData.musicWireSizes(), BuiltInData.metricPlainWire())
                    .withCandidates(candidates.get().tables()).withMargin(m));
        } catch (InvalidInput e) {
            return result.refuse(List.of(e.getMessage().split("\n")));
        }
        show(r);
        session.inform("diagnosis of keys " + keys + ": " + r.standingOut().size() + " notes stand out; "
                + r.finding().cause().words());
        return true;
    }

    private void show(DiagnosisReport r) {
        List<Row> next = new ArrayList<>();
        Map<Integer, Double> marks = new TreeMap<>();
        for (DiagnosedNote d : r.notes()) {
            NoteResult n = d.result();
            String out = d.standsOut() ? (d.trendDeviationPct() > 0 ? "high" : "low") : "";
            next.add(new Row(d.key(), n.noteName(), n.section(), n.stress() / 1e6, n.breakPct(), d.trendPct(),
                    d.trendDeviationPct(), n.headroomCents(), n.breakingFrequency(), out));
            if (d.standsOut()) {
                marks.put(d.key(), n.breakPct());
            }
        }
        rows.setAll(next);
        Finding f = r.finding();
        finding.set("Finding: " + f.cause().words() + ".\n\n" + String.join("\n\n", f.explanation()));
        List<RemedyLine> lines = new ArrayList<>();
        for (Remedy x : f.remedies()) {
            lines.add(new RemedyLine(x.describe(), x.fixes(), x.maxPctAfter()));
        }
        remedies.setAll(lines);
        inspect.setAll(f.inspect());
        result.show(r, marks.isEmpty() ? List.of()
                : List.of(CurveOverlay.of(STANDING_OUT, marks, CurveOverlay.Look.MARKS)));
    }

    /** Writes the per-note results as CSV (DESIGN §5 columns) to a file the user chooses. */
    boolean exportCsv() {
        DiagnosisReport r = result.get();
        return result.exportCsv(r == null ? "" : "diagnosis-" + r.request().range().toString().replace(' ', '_')
                + ".csv", new ToolResult.CsvForm<>(DiagnosisCsv::comments, DiagnosisCsv.HEADER, DiagnosisCsv::rows));
    }

    /** Takes the results away, and their overlays off the curves. */
    void clear() {
        result.clear();
        rows.clear();
        finding.set("");
        remedies.clear();
        inspect.clear();
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

    ReadOnlyObjectProperty<DiagnosisReport> reportProperty() {
        return result.reportProperty();
    }

    /** @return the cause and the finding's paragraphs, one a line */
    ReadOnlyStringProperty findingProperty() {
        return finding.getReadOnlyProperty();
    }

    ObservableList<RemedyLine> remedies() {
        return remedies;
    }

    ObservableList<String> inspect() {
        return inspect;
    }

    ReadOnlyStringProperty problemProperty() {
        return result.problemProperty();
    }

    ReadOnlyBooleanProperty staleProperty() {
        return result.staleProperty();
    }

    double cautionPct() {
        return session.settingsProperty().get().bands().caution();
    }

    private void followSelection() {
        String now = range.get() == null ? "" : range.get().strip();
        if (now.isEmpty() || now.equals(lastFilled)) {
            useSectionOfSelection();
        }
    }

    /** @return the run of keys around {@code key} with its section label and kind of string (plain or wound) */
    static Optional<KeyRange> sectionOf(Scale scale, int key) {
        List<Note> notes = scale.notes();
        int i = -1;
        for (int j = 0; j < notes.size(); j++) {
            if (notes.get(j).key() == key) {
                i = j;
            }
        }
        if (i < 0) {
            return Optional.empty();
        }
        Note at = notes.get(i);
        int lo = i;
        int hi = i;
        while (lo > 0 && same(notes.get(lo - 1), at)) {
            lo--;
        }
        while (hi < notes.size() - 1 && same(notes.get(hi + 1), at)) {
            hi++;
        }
        return Optional.of(new KeyRange(notes.get(lo).key(), notes.get(hi).key()));
    }

    private static boolean same(Note a, Note b) {
        return a.section().equals(b.section()) && a.isWound() == b.isWound();
    }

    static String pct(double v) {
        return String.format(Locale.ROOT, "%.1f %%", v);
    }
}
