package org.scalewright.app;

import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.SimpleObjectProperty;
import org.scalewright.chart.CurveData;
import org.scalewright.chart.TargetMarks;
import org.scalewright.physics.ScaleAnalysis;

/**
 * What the three curves show, rebuilt whenever the working scale, the reference, the display
 * units or the selected key change. The proposal is set by whoever has one to show (none by
 * default).
 */
final class CurvesViewModel {
    private final ScaleSession session;
    private final ReadOnlyObjectWrapper<CurveData> data = new ReadOnlyObjectWrapper<>();
    private final ObjectProperty<ScaleAnalysis> proposal = new SimpleObjectProperty<>();
    private final ObjectProperty<TargetMarks> target = new SimpleObjectProperty<>();
    private final ObjectProperty<PointDrag> pointDrag = new SimpleObjectProperty<>();

    /**
     * Told when the user drags a control point of the target on the tension curve. Values are
     * per-string tension in N.
     */
    interface PointDrag {
        /** The point at {@code index} of the target's control points is being dragged to {@code newtons}. */
        void dragged(int index, double newtons);

        /** The drag of the point at {@code index} ended at {@code newtons}. */
        void released(int index, double newtons);
    }

    CurvesViewModel(ScaleSession session) {
        this.session = session;
        session.analysisProperty().addListener((o, a, b) -> update());
        session.referenceAnalysisProperty().addListener((o, a, b) -> update());
        session.showReferenceProperty().addListener((o, a, b) -> update());
        session.unitsProperty().addListener((o, a, b) -> update());
        session.selectedKeyProperty().addListener((o, a, b) -> update());
        proposal.addListener((o, a, b) -> update());
        update();
    }

    ReadOnlyObjectProperty<CurveData> dataProperty() {
        return data.getReadOnlyProperty();
    }

    CurveData data() {
        return data.get();
    }

    ObjectProperty<ScaleAnalysis> proposalProperty() {
        return proposal;
    }

    /** @return the rescaling target drawn on the tension curve (null: none) */
    ObjectProperty<TargetMarks> targetProperty() {
        return target;
    }

    /** @return who is told of control-point drags on the tension curve (null: points cannot be dragged) */
    ObjectProperty<PointDrag> pointDragProperty() {
        return pointDrag;
    }

    /** Selects the note nearest to a key-number position on a curve (a click on a chart). */
    void pick(double keyPosition) {
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
        Integer key = session.selectedKeyProperty().get();
        if (key != null) {
            d = d.withSelectedKey(key);
        }
        data.set(d);
    }
}
