package org.scalewright.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.geom.Ellipse2D;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.scalewright.design.stretch.StretchCurve;
import org.scalewright.design.stretch.StretchPoint;
import org.scalewright.design.stretch.TuningStretch;

/**
 * The tuning-stretch curve: cents from equal temperament over key number, one line per octave
 * type, the equal-tempered band A3–A4 shaded. Drawn without any GUI toolkit, for the window,
 * images and the PDF.
 */
public final class StretchChart {
    private static final Color[] LINE = {new Color(0x1F4E79), new Color(0xB5562B), new Color(0x3C7A3A)};
    private static final float[][] DASH = {null, {6f, 3f}, {1.5f, 2.5f}};

    private StretchChart() {
    }

    /**
     * @param title  the chart title (e.g. the scale's title; "" for none)
     * @param curves the stretch of one scale for one or more octave types (keys without a known
     *               stretch are left as gaps)
     * @return the chart
     */
    public static JFreeChart build(String title, List<StretchCurve> curves) {
        if (curves == null || curves.isEmpty()) {
            throw new IllegalArgumentException("stretch chart needs at least one curve, had none");
        }
        XYSeriesCollection data = new XYSeriesCollection();
        int minKey = Integer.MAX_VALUE;
        int maxKey = Integer.MIN_VALUE;
        for (StretchCurve c : curves) {
            XYSeries s = new XYSeries(c.octave().label() + " octaves", true, false);
            for (StretchPoint p : c.points()) {
                minKey = Math.min(minKey, p.key());
                maxKey = Math.max(maxKey, p.key());
                s.add(p.key(), p.stretchCents().isPresent() ? p.stretchCents().getAsDouble() : Double.NaN);
            }
            data.addSeries(s);
        }
        NumberAxis keys = new KeyAxis();
        keys.setRange(Math.min(minKey, 1) - 1, Math.max(maxKey, 88) + 1);
        keys.setLabelFont(CurveLook.AXIS);
        keys.setTickLabelFont(CurveLook.TICKS);
        keys.setLabelPaint(CurveLook.TEXT);
        keys.setTickLabelPaint(CurveLook.TEXT);
        NumberAxis cents = new NumberAxis("stretch, cents from equal temperament");
        cents.setAutoRangeIncludesZero(true);
        cents.setLabelFont(CurveLook.AXIS);
        cents.setTickLabelFont(CurveLook.TICKS);
        cents.setLabelPaint(CurveLook.TEXT);
        cents.setTickLabelPaint(CurveLook.TEXT);
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, true);
        for (int i = 0; i < curves.size(); i++) {
            int look = curves.get(i).octave().ordinal() % LINE.length;
            r.setSeriesPaint(i, LINE[look]);
            float[] dash = DASH[look];
            r.setSeriesStroke(i, dash == null ? new BasicStroke(1.8f)
                    : new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f, dash, 0f));
            r.setSeriesShape(i, new Ellipse2D.Double(-1.8, -1.8, 3.6, 3.6));
        }
        r.setDrawSeriesLineAsPath(false);
        XYPlot plot = new XYPlot(data, keys, cents, r);
        plot.setBackgroundPaint(CurveLook.PLOT);
        plot.setDomainGridlinePaint(CurveLook.GRID);
        plot.setRangeGridlinePaint(CurveLook.GRID);
        plot.setOutlinePaint(CurveLook.GRID);
        IntervalMarker band = new IntervalMarker(TuningStretch.EQUAL_TEMPERED_BAND.first() - 0.5,
                TuningStretch.EQUAL_TEMPERED_BAND.last() + 0.5, new Color(0xE9E4D4));
        band.setLabel("equal temperament A3-A4");
        band.setLabelFont(CurveLook.MARKER);
        band.setLabelPaint(CurveLook.TEXT);
        band.setLabelAnchor(RectangleAnchor.TOP);
        band.setLabelTextAnchor(TextAnchor.TOP_CENTER);
        band.setLabelBackgroundColor(new Color(0, 0, 0, 0));
        plot.addDomainMarker(band, Layer.BACKGROUND);
        ValueMarker zero = new ValueMarker(0, Color.GRAY, new BasicStroke(0.8f));
        plot.addRangeMarker(zero, Layer.BACKGROUND);
        JFreeChart chart = new JFreeChart(title == null || title.isEmpty() ? "Tuning stretch from inharmonicity"
                : title + ": tuning stretch from inharmonicity", CurveLook.TITLE, plot, true);
        chart.getTitle().setHorizontalAlignment(org.jfree.chart.ui.HorizontalAlignment.LEFT);
        chart.setBackgroundPaint(CurveLook.BACKGROUND);
        chart.getTitle().setPaint(CurveLook.TEXT);
        LegendTitle legend = chart.getLegend();
        legend.setPosition(RectangleEdge.BOTTOM);
        legend.setItemFont(CurveLook.TICKS);
        legend.setBackgroundPaint(CurveLook.BACKGROUND);
        return chart;
    }
}
