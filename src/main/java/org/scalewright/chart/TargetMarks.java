package org.scalewright.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.geom.Rectangle2D;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.scalewright.design.rescale.ControlPoint;
import org.scalewright.design.rescale.TargetCurve;
import org.scalewright.model.DisplayUnits;

/**
 * A rescaling target drawn on the tension chart of {@link ScaleCurves}: the target curve (a
 * thin green line) and its control points (hollow squares a user may drag). Kept in two
 * datasets of their own, at {@link #CURVE_INDEX} and {@link #POINTS_INDEX}, after the
 * {@link CurveSeries} datasets, so {@link ScaleCurves#refresh} leaves them alone.
 *
 * @param curve  the target, per-string tension in N, or null for none
 * @param points control points, tension in N (may be empty)
 */
public record TargetMarks(TargetCurve curve, List<ControlPoint> points) {
    /** Dataset index of the target curve. */
    public static final int CURVE_INDEX = 20;
    /** Dataset index of the control points. */
    public static final int POINTS_INDEX = 21;

    private static final Color TARGET = new Color(0x2E8B57);
    private static final Color HANDLE = new Color(0x14532D);

    public TargetMarks {
        points = points == null ? List.of() : List.copyOf(points);
    }

    /**
     * Puts the marks into a tension chart made by {@link ScaleCurves#build}, replacing any drawn
     * before; {@code marks} null removes them.
     *
     * @param units the chart's display units (tension converted from N)
     */
    public static void draw(JFreeChart chart, TargetMarks marks, DisplayUnits units) {
        XYPlot plot = chart.getXYPlot();
        XYSeriesCollection line = collection(plot, CURVE_INDEX, false);
        XYSeriesCollection handles = collection(plot, POINTS_INDEX, true);
        boolean notify = chart.isNotify();
        chart.setNotify(false);
        try {
            line.removeAllSeries();
            handles.removeAllSeries();
            if (marks == null) {
                return;
            }
            if (marks.curve() != null) {
                XYSeries s = new XYSeries("target", false, true);
                double[] v = marks.curve().values();
                for (int i = 0; i < v.length; i++) {
                    s.add(marks.curve().firstKey() + i, units.force().fromNewtons(v[i]), false);
                }
                line.addSeries(s);
            }
            if (!marks.points().isEmpty()) {
                XYSeries s = new XYSeries("control points", false, true);
                for (ControlPoint p : marks.points()) {
                    s.add(p.key(), units.force().fromNewtons(p.value()), false);
                }
                handles.addSeries(s);
            }
        } finally {
            chart.setNotify(notify);
        }
        if (notify) {
            chart.fireChartChanged();
        }
    }

    /** @return the number of control points drawn in a chart (0 when none) */
    public static int pointCount(JFreeChart chart) {
        var d = chart.getXYPlot().getDataset(POINTS_INDEX);
        return d == null || d.getSeriesCount() == 0 ? 0 : d.getItemCount(0);
    }

    /** @return the number of keys of the target curve drawn in a chart (0 when none) */
    public static int curveLength(JFreeChart chart) {
        var d = chart.getXYPlot().getDataset(CURVE_INDEX);
        return d == null || d.getSeriesCount() == 0 ? 0 : d.getItemCount(0);
    }

    private static XYSeriesCollection collection(XYPlot plot, int index, boolean handles) {
        if (plot.getDataset(index) instanceof XYSeriesCollection c) {
            return c;
        }
        XYSeriesCollection c = new XYSeriesCollection();
        plot.setDataset(index, c);
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer();
        if (handles) {
            r.setSeriesLinesVisible(0, false);
            r.setSeriesShapesVisible(0, true);
            r.setSeriesShapesFilled(0, false);
            r.setUseOutlinePaint(false);
            r.setSeriesShape(0, new Rectangle2D.Double(-5, -5, 10, 10));
            r.setSeriesStroke(0, new BasicStroke(2f));
            r.setSeriesPaint(0, HANDLE);
        } else {
            r.setDrawSeriesLineAsPath(true);
            r.setSeriesShapesVisible(0, false);
            r.setSeriesPaint(0, TARGET);
            r.setSeriesStroke(0, new BasicStroke(1f));
        }
        plot.setRenderer(index, r);
        return c;
    }
}
