package org.scalewright.app.rescale;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.scalewright.app.curves.CurvesViewModel;
import org.scalewright.app.session.DisplayFormat;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.TypedEntry;
import org.scalewright.chart.TargetMarks;
import org.scalewright.design.SmoothTrend;
import org.scalewright.design.rescale.ControlPoint;
import org.scalewright.design.rescale.PlainPlanOptions;
import org.scalewright.design.rescale.PlainPlanner;
import org.scalewright.design.rescale.PlanChecks;
import org.scalewright.design.rescale.PlanNotPossible;
import org.scalewright.design.rescale.Proposal;
import org.scalewright.design.rescale.ProposalText;
import org.scalewright.design.rescale.TargetCurve;
import org.scalewright.design.rescale.TargetQuantity;
import org.scalewright.design.rescale.TargetSpec;
import org.scalewright.design.rescale.WoundPlanOptions;
import org.scalewright.design.rescale.WoundPlanner;
import org.scalewright.design.rescale.WrapWires;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.KeyNames;
import org.scalewright.model.KeyRange;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;

/**
 * The rescaling panel's state: a key range, plain wire or wound strings, a target (smooth
 * trend, line, or spline through control points the user drags on the tension curve), the
 * planner's settings, and the proposal with its change table. The proposal is drawn as the
 * third curve; "apply" makes it the working scale in one undoable edit, "discard" drops it.
 */
public final class RescaleViewModel implements CurvesViewModel.PointDrag {
    /** What the planned keys are strung with. */
    enum Kind {
        PLAIN("plain wire"), WOUND("wound strings");

        private final String words;

        Kind(String words) {
            this.words = words;
        }

        @Override
        public String toString() {
            return words;
        }
    }

    /** How the target is made. */
    enum TargetKind {
        SMOOTH("smooth trend"),
        LINE("straight line"),
        LOG_LINE("log-linear line"),
        SPLINE("spline through points");

        private final String words;

        TargetKind(String words) {
            this.words = words;
        }

        @Override
        public String toString() {
            return words;
        }
    }

    /** Control points seeded from a target when the spline is first chosen. */
    static final int SEED_POINTS = 6;

    private final ScaleSession session;
    private final CurvesViewModel curves;
    private final StringProperty from = new SimpleStringProperty("");
    private final StringProperty to = new SimpleStringProperty("");
    private final ObjectProperty<Kind> kind = new SimpleObjectProperty<>(Kind.WOUND);
    private final ObjectProperty<TargetKind> targetKind = new SimpleObjectProperty<>(TargetKind.SMOOTH);
    private final StringProperty bandwidth = new SimpleStringProperty("0.5");
    private final BooleanProperty perSection = new SimpleBooleanProperty(false);
    private final StringProperty maxBreak = new SimpleStringProperty("");
    private final ObjectProperty<RescaleWireList> wireList = new SimpleObjectProperty<>(RescaleWireList.MUSIC);
    private final StringProperty customWires = new SimpleStringProperty("");
    private final StringProperty changeCost = new SimpleStringProperty(Double.toString(PlainPlanOptions.DEFAULT_CHANGE_COST));
    private final StringProperty wrapStep = new SimpleStringProperty(""); // empty: the wrap-wire catalogue
    private final StringProperty doubleAbove = new SimpleStringProperty("");
    private final BooleanProperty joinBreak = new SimpleBooleanProperty(false);
    private final StringProperty joinKeys = new SimpleStringProperty("3");
    private final ObservableList<ControlPoint> points = FXCollections.observableArrayList();
    private final ReadOnlyObjectWrapper<Proposal> proposal = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyObjectWrapper<TargetCurve> target = new ReadOnlyObjectWrapper<>();
    private final ObservableList<String> problems = FXCollections.observableArrayList();
    private final ReadOnlyStringWrapper summary = new ReadOnlyStringWrapper("");
    private final ObservableList<RescaleChangeRow> changes = FXCollections.observableArrayList();
    private final ReadOnlyStringWrapper tensionHeader = new ReadOnlyStringWrapper("tension N");
    /** The range the control points were made for; they are made afresh for another. */
    private KeyRange pointsRange;

    public RescaleViewModel(ScaleSession session, CurvesViewModel curves) {
        this.session = session;
        this.curves = curves;
        maxBreak.set(DisplayFormat.decimals(session.settingsProperty().get().bands().danger(), 0, 1));
        curves.pointDragProperty().set(this);
        session.analysisProperty().addListener((o, a, b) -> {
            Proposal p = proposal.get();
            if (p != null && p.before() != b) {
                clear();
                session.inform("the rescaling proposal was dropped: the working scale or its settings changed");
            }
        });
        session.unitsProperty().addListener((o, a, b) -> {
            tensionHeader.set("tension " + b.force().symbol());
            showChanges();
        });
        tensionHeader.set("tension " + session.units().force().symbol());
        // the kind follows the range as it is typed; the user may still choose the other one
        from.addListener((o, a, b) -> kindFromRange());
        to.addListener((o, a, b) -> kindFromRange());
        session.selectedKeyProperty().addListener((o, a, b) -> {
            if (b != null && from.get().isBlank() && to.get().isBlank()) {
                useSelectedSection();
            }
        });
    }

    // ---- inputs ----

    StringProperty fromProperty() {
        return from;
    }

    StringProperty toProperty() {
        return to;
    }

    ObjectProperty<Kind> kindProperty() {
        return kind;
    }

    ObjectProperty<TargetKind> targetKindProperty() {
        return targetKind;
    }

    StringProperty bandwidthProperty() {
        return bandwidth;
    }

    BooleanProperty perSectionProperty() {
        return perSection;
    }

    StringProperty maxBreakProperty() {
        return maxBreak;
    }

    ObjectProperty<RescaleWireList> wireListProperty() {
        return wireList;
    }

    StringProperty customWiresProperty() {
        return customWires;
    }

    StringProperty changeCostProperty() {
        return changeCost;
    }

    StringProperty wrapStepProperty() {
        return wrapStep;
    }

    StringProperty doubleAboveProperty() {
        return doubleAbove;
    }

    BooleanProperty joinBreakProperty() {
        return joinBreak;
    }

    StringProperty joinKeysProperty() {
        return joinKeys;
    }

    /** @return the spline's control points, per-string tension in N, bass to treble */
    ObservableList<ControlPoint> points() {
        return points;
    }

    // ---- outputs ----

    ReadOnlyObjectProperty<Proposal> proposalProperty() {
        return proposal.getReadOnlyProperty();
    }

    Proposal proposal() {
        return proposal.get();
    }

    /** @return the target the last proposal (or control-point edit) was made to */
    ReadOnlyObjectProperty<TargetCurve> targetProperty() {
        return target.getReadOnlyProperty();
    }

    /** @return why the last "propose" gave no proposal, one sentence each (empty when it gave one) */
    ObservableList<String> problems() {
        return problems;
    }

    ReadOnlyStringProperty summaryProperty() {
        return summary.getReadOnlyProperty();
    }

    /** @return the change table's tension heading, with the display force unit */
    ReadOnlyStringProperty tensionHeaderProperty() {
        return tensionHeader.getReadOnlyProperty();
    }

    ObservableList<RescaleChangeRow> changes() {
        return changes;
    }

    // ---- choosing the range ----

    /** Sets the range to the run of keys sharing the selected key's section, and the kind from it. */
    void useSelectedSection() {
        Integer key = session.selectedKeyProperty().get();
        ScaleAnalysis a = session.analysis();
        if (key == null || a.result(key).isEmpty()) {
            session.complain("select a note in the table or on a curve first");
            return;
        }
        String section = a.result(key).get().section();
        int lo = key;
        int hi = key;
        while (a.result(lo - 1).map(r -> r.section().equals(section)).orElse(false)) {
            lo--;
        }
        while (a.result(hi + 1).map(r -> r.section().equals(section)).orElse(false)) {
            hi++;
        }
        setRange(lo, hi);
    }

    /** Makes the selected key the lower end of the range. */
    void fromSelected() {
        Integer key = session.selectedKeyProperty().get();
        if (key != null) {
            from.set(Integer.toString(key));
        }
    }

    /** Makes the selected key the upper end of the range. */
    void toSelected() {
        Integer key = session.selectedKeyProperty().get();
        if (key != null) {
            to.set(Integer.toString(key));
        }
    }

    /** Sets the range and takes the kind from the strings in it (wound when most are wound). */
    void setRange(int first, int last) {
        from.set(Integer.toString(Math.min(first, last)));
        to.set(Integer.toString(Math.max(first, last)));
    }

    private void kindFromRange() {
        KeyRange r;
        try {
            r = range();
        } catch (InvalidInput e) {
            return;
        }
        long wound = session.analysis().notes().stream().filter(n -> r.contains(n.key()) && n.wound()).count();
        long plain = session.analysis().notes().stream().filter(n -> r.contains(n.key()) && !n.wound()).count();
        kind.set(wound > plain ? Kind.WOUND : Kind.PLAIN);
    }

    // ---- proposing ----

    /**
     * Plans the range with the settings given; on success the proposal is shown as the third
     * curve and as the change table, otherwise {@link #problems()} says why.
     *
     * @return true when there is a proposal
     */
    boolean propose() {
        problems.clear();
        try {
            KeyRange r = range();
            ScaleAnalysis present = session.analysis();
            double max = number(maxBreak.get(), "maximum % of breaking strength");
            TargetCurve t = buildTarget(present, r);
            Proposal p;
            if (kind.get() == Kind.PLAIN) {
                double cost = number(changeCost.get(), "change cost");
                p = PlainPlanner.plan(present, r, t, new PlainPlanOptions(wireList.get().wires(customWires.get()), max,
                        cost, PlainPlanOptions.DEFAULT_STEP_COST));
            } else {
                p = WoundPlanner.plan(present, r, t, woundOptions(max, present, r));
            }
            show(p, t);
            session.inform("proposal for keys " + r + ": " + p.changedCount() + " of " + p.changes().size()
                    + " keys change; apply it or discard it");
            return true;
        } catch (PlanNotPossible e) {
            fail(e.reasons());
        } catch (InvalidInput e) {
            fail(List.of(e.getMessage()));
        }
        return false;
    }

    /**
     * The wound designer's settings as the command line's defaults: wrap wire from the catalogue
     * (or in the steps typed), cores chosen with the wraps from the range's present cores and the
     * music-wire sizes between them.
     */
    private WoundPlanOptions woundOptions(double max, ScaleAnalysis present, KeyRange r) {
        String typedStep = wrapStep.get() == null ? "" : wrapStep.get().strip();
        WrapWires wraps = typedStep.isEmpty() ? BuiltInData.wrapWire()
                : WrapWires.steps(typedLength(typedStep, "wrap step"));
        OptionalDouble dbl = doubleAbove.get() == null || doubleAbove.get().isBlank() ? OptionalDouble.empty()
                : OptionalDouble.of(typedLength(doubleAbove.get(), "double-wind above"));
        int join = 0;
        if (joinBreak.get()) {
            double j = number(joinKeys.get(), "keys joined either side of the break");
            if (j != Math.rint(j)) {
                throw new InvalidInput("keys joined either side of a break must be a whole number, was "
                        + joinKeys.get().trim());
            }
            join = PlanChecks.joinBreakKeys((int) Math.min(j, Integer.MAX_VALUE));
        }
        List<Double> cores = WoundPlanner.presentCores(present, r, BuiltInData.musicWireSizes().diameters());
        return new WoundPlanOptions(TargetQuantity.TENSION, wraps, dbl, WoundPlanOptions.DEFAULT_DOUBLE_RATIO, cores,
                max, WoundPlanOptions.DEFAULT_CHANGE_COST, WoundPlanOptions.DEFAULT_STEP_COST, join);
    }

    private TargetCurve buildTarget(ScaleAnalysis present, KeyRange r) {
        List<NoteResult> planned = planned(present, r);
        if (targetKind.get() == TargetKind.SPLINE) {
            if (points.size() < 2 || !r.equals(pointsRange)) {
                seedPoints(present, r);
            }
            return targetOf(planned, new TargetSpec.Spline(new ArrayList<>(points), false), false);
        }
        return targetOf(planned, spec(planned), perSection.get() && targetKind.get() == TargetKind.SMOOTH);
    }

    private TargetSpec spec(List<NoteResult> planned) {
        return switch (targetKind.get()) {
            case SMOOTH -> {
                double bw = number(bandwidth.get(), "bandwidth");
                yield new TargetSpec.Loess(bw, SmoothTrend.DEFAULT_ROBUSTNESS_ITERATIONS);
            }
            case LINE, LOG_LINE -> {
                if (planned.size() < 2) {
                    throw new InvalidInput("a line needs at least two planned keys, had " + planned.size());
                }
                yield TargetSpec.Line.throughPresent(planned.get(0).key(), planned.get(planned.size() - 1).key(),
                        targetKind.get() == TargetKind.LOG_LINE);
            }
            case SPLINE -> new TargetSpec.Spline(new ArrayList<>(points), false);
        };
    }

    private TargetCurve targetOf(List<NoteResult> planned, TargetSpec spec, boolean sections) {
        KeyRange r = new KeyRange(planned.get(0).key(), planned.get(planned.size() - 1).key());
        ScaleAnalysis present = session.analysis();
        return kind.get() == Kind.PLAIN ? PlainPlanner.target(present, r, spec, sections)
                : WoundPlanner.target(present, r, spec, TargetQuantity.TENSION, sections);
    }

    private List<NoteResult> planned(ScaleAnalysis present, KeyRange r) {
        List<NoteResult> planned = kind.get() == Kind.PLAIN ? PlainPlanner.plannedKeys(present, r)
                : WoundPlanner.plannedKeys(present, r);
        if (planned.isEmpty()) {
            throw new PlanNotPossible(List.of("keys " + r + " hold no " + kind.get() + "; choose the other kind or "
                    + "another range"));
        }
        return planned;
    }

    /**
     * Makes the control points afresh from the smooth trend of the present scale over the range
     * (or the last target when it covers the range).
     */
    void seedPoints() {
        problems.clear();
        try {
            seedPoints(session.analysis(), range());
            targetKind.set(TargetKind.SPLINE);
            previewPoints();
        } catch (PlanNotPossible e) {
            fail(e.reasons());
        } catch (InvalidInput e) {
            fail(List.of(e.getMessage()));
        }
    }

    private void seedPoints(ScaleAnalysis present, KeyRange r) {
        List<NoteResult> planned = planned(present, r);
        TargetCurve base = target.get();
        int first = planned.get(0).key();
        int last = planned.get(planned.size() - 1).key();
        if (base == null || !base.covers(first) || !base.covers(last)) {
            base = targetOf(planned, TargetSpec.loess(0.5), false);
        }
        points.setAll(base.part(first, last).controlPoints(SEED_POINTS));
        pointsRange = r;
    }

    /**
     * Sets the value of one control point (an edit in the points table, or a drag) and makes
     * the target a spline through the points.
     *
     * @param newtons per-string tension, N, &gt; 0
     */
    void setPoint(int index, double newtons) {
        if (index < 0 || index >= points.size()) {
            throw new IllegalArgumentException("control point " + index + " does not exist (there are "
                    + points.size() + ")");
        }
        points.set(index, new ControlPoint(points.get(index).key(), newtons));
        targetKind.set(TargetKind.SPLINE);
        previewPoints();
    }

    @Override
    public void dragged(int index, double newtons) {
        if (index >= 0 && index < points.size()) {
            setPoint(index, newtons);
        }
    }

    @Override
    public void released(int index, double newtons) {
        if (index >= 0 && index < points.size()) {
            setPoint(index, newtons);
            propose();
        }
    }

    /** Draws the spline through the points without planning (while a point is dragged). */
    private void previewPoints() {
        try {
            TargetCurve t = targetOf(planned(session.analysis(), range()),
                    new TargetSpec.Spline(new ArrayList<>(points), false), false);
            target.set(t);
            curves.targetProperty().set(new TargetMarks(t, points));
        } catch (InvalidInput | PlanNotPossible e) {
            curves.targetProperty().set(new TargetMarks(null, points));
        }
    }

    private void show(Proposal p, TargetCurve t) {
        proposal.set(p);
        target.set(t);
        curves.proposalProperty().set(p.after());
        curves.targetProperty().set(new TargetMarks(t, targetKind.get() == TargetKind.SPLINE ? points : List.of()));
        summary.set(summaryOf(p));
        showChanges();
    }

    private void showChanges() {
        Proposal p = proposal.get();
        if (p == null) {
            changes.clear();
            return;
        }
        changes.setAll(p.changes().stream().map(c -> RescaleChangeRow.of(c, session.units())).toList());
    }

    private void fail(List<String> reasons) {
        clear();
        problems.setAll(reasons);
        summary.set(ProposalText.noProposal(reasons));
        session.complain("no rescaling proposal: " + reasons.get(0));
    }

    // ---- apply or discard ----

    /**
     * Makes the proposal the working scale as one undoable edit, and clears it.
     *
     * @return false when there was no proposal
     */
    boolean apply() {
        Proposal p = proposal.get();
        if (p == null) {
            return false;
        }
        clear();
        boolean changed = session.edit("rescale keys " + p.range() + " (" + p.action() + ")", s -> p.proposedScale());
        if (!changed) {
            session.inform("the proposal changes no wire; nothing applied");
        }
        return changed;
    }

    /** Drops the proposal and the target from the curves. */
    void discard() {
        boolean had = proposal.get() != null;
        clear();
        problems.clear();
        if (had) {
            session.inform("rescaling proposal discarded");
        }
    }

    private void clear() {
        proposal.set(null);
        curves.proposalProperty().set(null);
        curves.targetProperty().set(targetKind.get() == TargetKind.SPLINE && !points.isEmpty()
                ? new TargetMarks(null, points) : null);
        summary.set("");
        changes.clear();
    }

    // ---- reading the fields ----

    /** @return the range in the from/to fields (key numbers or note names) */
    KeyRange range() {
        String a = from.get() == null ? "" : from.get().trim();
        String b = to.get() == null ? "" : to.get().trim();
        if (a.isEmpty() || b.isEmpty()) {
            throw new InvalidInput("give the range: from and to keys (numbers or note names such as "
                    + "A0 or C#3), or select a note and use its section");
        }
        int x = key(a, "from");
        int y = key(b, "to");
        return new KeyRange(Math.min(x, y), Math.max(x, y));
    }

    private static int key(String text, String field) {
        try {
            return KeyNames.parse(text);
        } catch (InvalidInput e) {
            throw new InvalidInput(field + " key: " + e.getMessage());
        }
    }

    /**
     * @return a wire diameter typed in the display length unit, or in the unit written after it
     *         ({@code 0.01 mm}, {@code 0.0005 in}), m
     */
    private double typedLength(String text, String what) {
        LengthUnit unit = session.units().length();
        String t = text.strip();
        for (LengthUnit u : LengthUnit.values()) {
            if (t.toLowerCase(java.util.Locale.ROOT).endsWith(u.symbol())) {
                unit = u;
                t = t.substring(0, t.length() - u.symbol().length()).strip();
                break;
            }
        }
        return unit.toMetres(number(t, what + " (" + unit.symbol() + ")"));
    }

    /** @return the display length unit's symbol, for the wound settings' labels */
    javafx.beans.binding.StringBinding lengthSymbol() {
        return javafx.beans.binding.Bindings.createStringBinding(() -> session.units().length().symbol(),
                session.unitsProperty());
    }

    private static double number(String text, String what) {
        String t = text == null ? "" : text.trim();
        try {
            double v = TypedEntry.parse(t, what, "");
            if (v >= 0 && (v > 0 || what.equals("change cost"))) {
                return v;
            }
        } catch (InvalidInput e) {
            // said below, with the range
        }
        throw new InvalidInput(what + ": expected a number > 0, was '" + t + "'");
    }

    /** Lays out the proposal's sentences (composed by {@link ProposalText}) and the cautions, one a line. */
    private static String summaryOf(Proposal p) {
        List<String> lines = new ArrayList<>(ProposalText.summary(p));
        lines.add("Caution: " + String.join(" ", BuiltInData.cautions()));
        return String.join("\n", lines);
    }
}
