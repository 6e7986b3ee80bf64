package org.scalewright.app.curves;

import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.collections.MapChangeListener;
import javafx.collections.ObservableMap;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.chart.CurveData;
import org.scalewright.chart.CurveOverlay;
import org.scalewright.chart.TargetMarks;
import org.scalewright.physics.ScaleAnalysis;

/**
 * What the three curves show, rebuilt whenever the working scale, the reference, the display
 * units or the selected key change. The proposal is set by whoever has one to show (none by
 * default); so are the overlays drawn over the percent-of-breaking-strength curve, each tool
 * putting its own under its name in {@link #overlays()} (e.g. the wire check's after and peak).
 */
public final class CurvesViewModel {
    private final ScaleSession session;
    private final ReadOnlyObjectWrapper<CurveData> data = new ReadOnlyObjectWrapper<>();
    private final ObjectProperty<ScaleAnalysis> proposal = new SimpleObjectProperty<>();
    private final ObjectProperty<TargetMarks> target = new SimpleObjectProperty<>();
    private final ObjectProperty<PointDrag> pointDrag = new SimpleObjectProperty<>();

    /**
     * Told when the user drags a control point of the target on the tension curve. Values are
     * per-string tension in N.
     */
    public interface PointDrag {
        /** The point at {@code index} of the target's control points is being dragged to {@code newtons}. */
        void dragged(int index, double newtons);

        /** The drag of the point at {@code index} ended at {@code newtons}. */
        void released(int index, double newtons);
    }
    private final ObservableMap<String, java.util.List<CurveOverlay>> overlays =
            FXCollections.observableMap(new java.util.LinkedHashMap<>());

    public CurvesViewModel(ScaleSession session) {
        this.session = session;
        session.analysisProperty().addListener((o, a, b) -> update());
        session.referenceAnalysisProperty().addListener((o, a, b) -> update());
        session.showReferenceProperty().addListener((o, a, b) -> update());
        session.unitsProperty().addListener((o, a, b) -> update());
        session.selectedKeyProperty().addListener((o, a, b) -> update());
        proposal.addListener((o, a, b) -> update());
        overlays.addListener((MapChangeListener<String, java.util.List<CurveOverlay>>) c -> update());
        update();
    }

    ReadOnlyObjectProperty<CurveData> dataProperty() {
        return data.getReadOnlyProperty();
    }

    public CurveData data() {
        return data.get();
    }

    public ObjectProperty<ScaleAnalysis> proposalProperty() {
        return proposal;
    }

    /** @return the rescaling target drawn on the tension curve (null: none) */
    public ObjectProperty<TargetMarks> targetProperty() {
        return target;
    }

    /** @return who is told of control-point drags on the tension curve (null: points cannot be dragged) */
    public ObjectProperty<PointDrag> pointDragProperty() {
        return pointDrag;
    }

    /**
     * The overlays drawn over the percent-of-breaking-strength curve, by the tool that shows
     * them (put a tool's list under its own name; remove it to clear), drawn in the order the
     * tools first put them.
     */
    public ObservableMap<String, java.util.List<CurveOverlay>> overlays() {
        return overlays;
    }

    /** Selects the note nearest to a key-number position on a curve (a click on a chart). */
    public void pick(double keyPosition) {
        ScaleAnalysis a = session.analysis();
        Integer best = null;
        double bestDistance = Double.MAX_VALUE;
        for (var r : a.notes()) {
            double d = Math.abs(r.key() - keyPosition);
            if (d < bestDistance) {
                bestDistance = d;
                best = r.key();
            }
        }
        if (best != null && bestDistance <= 1.0) {
            session.selectedKeyProperty().set(best);
        }
    }

    private void update() {
        CurveData d = CurveData.of(session.analysis(), session.units());
        if (session.showReferenceProperty().get() && session.referenceAnalysisProperty().get() != null
                && !session.referenceAnalysisProperty().get().notes().isEmpty()) {
            d = d.withReference(session.referenceAnalysisProperty().get());
        }
        d = d.withProposal(proposal.get());
        d = d.withOverlays(overlays.values().stream().flatMap(java.util.List::stream).toList());
        Integer key = session.selectedKeyProperty().get();
        if (key != null) {
            d = d.withSelectedKey(key);
        }
        data.set(d);
    }
}
