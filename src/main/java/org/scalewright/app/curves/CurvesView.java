package org.scalewright.app.curves;

import java.awt.geom.Rectangle2D;
import java.util.EnumMap;
import java.util.Map;
import javafx.application.Platform;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.entity.XYItemEntity;
import org.jfree.chart.fx.ChartViewer;
import org.jfree.chart.fx.interaction.ChartMouseEventFX;
import org.jfree.chart.fx.interaction.ChartMouseListenerFX;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.Range;
import org.scalewright.app.session.Timings;
import org.scalewright.chart.Curve;
import org.scalewright.chart.CurveData;
import org.scalewright.chart.ScaleCurves;
import org.scalewright.chart.TargetMarks;

/**
 * The three linked curves, stacked: tension per string, percent of breaking strength and
 * inharmonicity over key number. A click on a curve selects the nearest note; hovering shows
 * the note and its values; zooming one curve's keys (drag a rectangle) zooms all three.
 * Charts are built by {@link ScaleCurves}; this view only shows them.
 */
public final class CurvesView {
    private final CurvesViewModel model;
    private final VBox box = new VBox(4);
    private final Map<Curve, ChartViewer> viewers = new EnumMap<>(Curve.class);
    private boolean syncingAxes;
    private CurveData pending;

    public CurvesView(CurvesViewModel model) {
        this.model = model;
        box.getStyleClass().add("curves");
        CurveData data = model.data();
        for (Curve c : Curve.values()) {
            JFreeChart chart = ScaleCurves.build(c, data, false);
            ChartViewer viewer = new ChartViewer(chart);
            viewer.getCanvas().setTooltipEnabled(false); // hover texts come from the Picker
            viewer.setId("chart-" + c.name().toLowerCase(java.util.Locale.ROOT));
            viewer.setMinHeight(150);
            viewer.setPrefHeight(300);
            VBox.setVgrow(viewer, Priority.ALWAYS);
            viewer.addChartMouseListener(new Picker(viewer));
            chart.getXYPlot().getDomainAxis().addChangeListener(e -> linkKeys(c));
            viewers.put(c, viewer);
            box.getChildren().add(viewer);
        }
        model.dataProperty().addListener((o, a, b) -> later(b));
        model.targetProperty().addListener((o, a, b) -> drawTarget());
        new PointDragger(viewers.get(Curve.TENSION));
    }

    private void drawTarget() {
        TargetMarks.draw(viewers.get(Curve.TENSION).getChart(), model.targetProperty().get(), model.data().units());
    }

    public VBox node() {
        return box;
    }

    /** @return the three chart viewers, top to bottom */
    public java.util.List<ChartViewer> viewers() {
        return java.util.List.copyOf(viewers.values());
    }

    /** @return the chart showing {@code c} */
    public JFreeChart chart(Curve c) {
        return viewers.get(c).getChart();
    }

    /**
     * Redraws once after the event being handled: an Enter in the table both edits a note and
     * moves the selection, which makes one redraw rather than two.
     */
    private void later(CurveData data) {
        boolean scheduled = pending != null;
        pending = data;
        if (!scheduled) {
            Platform.runLater(() -> {
                CurveData d = pending;
                pending = null;
                show(d);
            });
        }
    }

    private void show(CurveData data) {
        for (Curve c : Curve.values()) {
            ScaleCurves.refresh(viewers.get(c).getChart(), c, data);
        }
        drawTarget();
        Timings.curvesShown(data.working().notes().size());
    }

    private void linkKeys(Curve source) {
        if (syncingAxes) {
            return;
        }
        syncingAxes = true;
        try {
            var axis = viewers.get(source).getChart().getXYPlot().getDomainAxis();
            Range r = axis.getRange();
            for (Curve c : Curve.values()) {
                var other = viewers.get(c).getChart().getXYPlot().getDomainAxis();
                if (c != source) {
                    if (axis.isAutoRange()) {
                        other.setAutoRange(true);
                    } else if (!other.getRange().equals(r)) {
                        other.setRange(r);
                    }
                }
            }
        } finally {
            syncingAxes = false;
        }
    }

    /** Selects the note under a click: the point clicked, or the key nearest the click. */
    private final class Picker implements ChartMouseListenerFX {
        private final ChartViewer viewer;
        private String shown;

        Picker(ChartViewer viewer) {
            this.viewer = viewer;
        }

        @Override
        public void chartMouseClicked(ChartMouseEventFX e) {
            if (e.getEntity() instanceof XYItemEntity item) {
                model.pick(item.getDataset().getXValue(item.getSeriesIndex(), item.getItem()));
                return;
            }
            PlotRenderingInfo info = viewer.getRenderingInfo().getPlotInfo();
            Rectangle2D area = info.getDataArea();
            double x = e.getTrigger().getX();
            if (area.getWidth() > 0 && x >= area.getMinX() && x <= area.getMaxX()) {
                model.pick(e.getChart().getXYPlot().getDomainAxis().java2DToValue(x, area, RectangleEdge.BOTTOM));
            }
        }

        @Override
        public void chartMouseMoved(ChartMouseEventFX e) {
            String text = null;
            if (e.getEntity() instanceof XYItemEntity item) {
                int key = (int) Math.round(item.getDataset().getXValue(item.getSeriesIndex(), item.getItem()));
                text = ScaleCurves.seriesOf(e.getChart(), item.getDataset())
                        .flatMap(s -> ScaleCurves.hoverText(model.data(), s, key)).orElse(null);
            }
            if (!java.util.Objects.equals(text, shown)) {
                shown = text;
                viewer.getCanvas().setTooltip(text, e.getTrigger().getScreenX() + 12, e.getTrigger().getScreenY() + 12);
            }
        }
    }

    /**
     * Lets the user drag a control point of the target on the tension curve up and down: a press
     * within a few pixels of a point takes it (instead of starting a zoom), a drag moves it, the
     * release drops it. The view model is told in N through {@link CurvesViewModel.PointDrag}.
     */
    private final class PointDragger {
        private static final double REACH_PX = 8;
        private final ChartViewer viewer;
        private int dragging = -1;
        private boolean axisWasAuto;

        PointDragger(ChartViewer viewer) {
            this.viewer = viewer;
            var canvas = viewer.getCanvas();
            canvas.addEventFilter(javafx.scene.input.MouseEvent.MOUSE_PRESSED, e -> {
                dragging = pointNear(e.getX(), e.getY());
                if (dragging >= 0) {
                    // hold the tension axis still while the point moves, so it does not run away under the mouse
                    var axis = viewer.getChart().getXYPlot().getRangeAxis();
                    axisWasAuto = axis.isAutoRange();
                    axis.setRange(axis.getRange());
                    e.consume();
                }
            });
            canvas.addEventFilter(javafx.scene.input.MouseEvent.MOUSE_DRAGGED, e -> {
                if (dragging >= 0) {
                    tell(e.getY(), false);
                    e.consume();
                }
            });
            canvas.addEventFilter(javafx.scene.input.MouseEvent.MOUSE_RELEASED, e -> {
                if (dragging >= 0) {
                    tell(e.getY(), true);
                    dragging = -1;
                    if (axisWasAuto) {
                        viewer.getChart().getXYPlot().getRangeAxis().setAutoRange(true);
                    }
                    e.consume();
                }
            });
        }

        private int pointNear(double x, double y) {
            TargetMarks marks = model.targetProperty().get();
            if (marks == null || model.pointDragProperty().get() == null) {
                return -1;
            }
            Rectangle2D area = viewer.getRenderingInfo().getPlotInfo().getDataArea();
            var plot = viewer.getChart().getXYPlot();
            var units = model.data().units();
            for (int i = 0; i < marks.points().size(); i++) {
                var p = marks.points().get(i);
                double px = plot.getDomainAxis().valueToJava2D(p.key(), area, RectangleEdge.BOTTOM);
                double py = plot.getRangeAxis().valueToJava2D(units.force().fromNewtons(p.value()), area,
                        RectangleEdge.LEFT);
                if (Math.abs(px - x) <= REACH_PX && Math.abs(py - y) <= REACH_PX) {
                    return i;
                }
            }
            return -1;
        }

        private void tell(double y, boolean release) {
            CurvesViewModel.PointDrag listener = model.pointDragProperty().get();
            if (listener == null) {
                return;
            }
            Rectangle2D area = viewer.getRenderingInfo().getPlotInfo().getDataArea();
            double clamped = Math.max(area.getMinY(), Math.min(area.getMaxY(), y));
            double shown = viewer.getChart().getXYPlot().getRangeAxis().java2DToValue(clamped, area, RectangleEdge.LEFT);
            double newtons = model.data().units().force().toNewtons(shown);
            if (!(newtons > 0)) {
                return;
            }
            if (release) {
                listener.released(dragging, newtons);
            } else {
                listener.dragged(dragging, newtons);
            }
        }
    }
}
