package org.scalewright.chart;

import java.awt.Color;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.scalewright.model.DisplayUnits;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.StressBand;
import org.scalewright.physics.StressBands;

/**
 * Builds the three curves of a scale over key number, with JFreeChart and without any GUI
 * toolkit, so the desktop window and the reports draw the same charts:
 * <ul>
 *   <li>{@link #tension}: tension per string in the display force unit;</li>
 *   <li>{@link #breakPercent}: percent of breaking strength with the stress bands of the
 *       working analysis' settings drawn behind the curve;</li>
 *   <li>{@link #inharmonicity}: inharmonicity B on a logarithmic axis.</li>
 * </ul>
 * Every chart marks the section boundaries and the wound/plain changes of the working scale
 * (labelled dashed lines), shows flagged notes as red triangles, draws the reference scale
 * (a wide pale line under the working one) and a proposal (green dash-dot) beside the
 * working scale (blue), and rings
 * the highlighted key. The datasets are laid out as in {@link CurveSeries}; x is the key
 * number. {@link #refresh} puts new data into a chart already built, which is how a live
 * window redraws after an edit.
 */
public final class ScaleCurves {
    /**
     * The index of the dataset (and renderer) holding the {@link CurveData#overlays() overlays},
     * after those of {@link CurveSeries}, so they are drawn on top: one series per overlay, in
     * the order given, keyed by its name; empty on the charts other than percent of breaking
     * strength. The dataset is added the first time there are overlays to draw.
     */
    public static final int OVERLAY_INDEX = CurveSeries.values().length;

    private ScaleCurves() {
    }

    /** @return the dataset holding the overlays in a chart made by {@link #build} (empty when none were drawn) */
    public static XYSeriesCollection overlayDataset(JFreeChart chart) {
        var d = chart.getXYPlot().getDataset(OVERLAY_INDEX);
        return d instanceof XYSeriesCollection c ? c : new XYSeriesCollection();
    }

    /** @return the value of overlay {@code name} drawn at {@code key}, or NaN when absent */
    public static double overlayValueAt(JFreeChart chart, String name, int key) {
        XYSeriesCollection c = overlayDataset(chart);
        int i = c.getSeriesIndex(name);
        if (i < 0) {
            return Double.NaN;
        }
        XYSeries s = c.getSeries(i);
        int j = s.indexOf(Double.valueOf(key));
        return j < 0 ? Double.NaN : s.getY(j).doubleValue();
    }

    private static void putOverlays(XYPlot plot, List<CurveOverlay> overlays) {
        if (!(plot.getDataset(OVERLAY_INDEX) instanceof XYSeriesCollection)) {
            if (overlays.isEmpty()) {
                return;
            }
            plot.setDataset(OVERLAY_INDEX, new XYSeriesCollection());
            XYLineAndShapeRenderer r = new XYLineAndShapeRenderer();
            r.setDrawSeriesLineAsPath(true);
            plot.setRenderer(OVERLAY_INDEX, r);
        }
        XYSeriesCollection c = (XYSeriesCollection) plot.getDataset(OVERLAY_INDEX);
        c.removeAllSeries();
        XYLineAndShapeRenderer r = (XYLineAndShapeRenderer) plot.getRenderer(OVERLAY_INDEX);
        for (CurveOverlay o : overlays) {
            XYSeries series = new XYSeries(o.name(), false, true);
            o.values().forEach((key, pct) -> series.add(key.doubleValue(), pct, false));
            int i = c.getSeriesCount();
            c.addSeries(series);
            CurveLook.styleOverlay(r, i, o.look());
        }
    }

    /** @return the tension-per-string chart */
    public static JFreeChart tension(CurveData data) {
        return build(Curve.TENSION, data);
    }

    /** @return the percent-of-breaking-strength chart with stress bands */
    public static JFreeChart breakPercent(CurveData data) {
        return build(Curve.BREAK_PERCENT, data);
    }

    /** @return the inharmonicity chart, logarithmic value axis */
    public static JFreeChart inharmonicity(CurveData data) {
        return build(Curve.INHARMONICITY, data);
    }

    /** @return a new chart of {@code curve} showing {@code data}, with hover texts on its points */
    public static JFreeChart build(Curve curve, CurveData data) {
        return build(curve, data, true);
    }

    /**
     * @param hoverTexts true to give every point its hover text while drawing (image maps,
     *                   SVG, a simple viewer); false for a live window that asks
     *                   {@link #hoverText} only for the point under the mouse, which draws faster
     * @return a new chart of {@code curve} showing {@code data}
     */
    public static JFreeChart build(Curve curve, CurveData data, boolean hoverTexts) {
        ValueAxis valueAxis;
        if (curve == Curve.INHARMONICITY) {
            LogAxis log = new LogAxis(curve.axisLabel(data.units()));
            log.setSmallestValue(1e-7);
            log.setAutoTickUnitSelection(false);
            log.setTickUnit(new NumberTickUnit(1), false, false);
            log.setNumberFormatOverride(new DecimalFormat("0E0", DecimalFormatSymbols.getInstance(Locale.ROOT)));
            log.setMinorTickMarksVisible(true);
            valueAxis = log;
        } else if (curve == Curve.BREAK_PERCENT) {
            valueAxis = new PercentAxis(curve.axisLabel(data.units()));
        } else {
            NumberAxis n = new NumberAxis(curve.axisLabel(data.units()));
            n.setAutoRangeIncludesZero(false);
            valueAxis = n;
        }
        XYPlot plot = new XYPlot();
        plot.setDomainAxis(new KeyAxis());
        plot.setRangeAxis(valueAxis);
        plot.setDatasetRenderingOrder(DatasetRenderingOrder.FORWARD);
        for (CurveSeries s : CurveSeries.values()) {
            plot.setDataset(s.index(), new XYSeriesCollection());
            XYLineAndShapeRenderer r = renderer(s);
            if (hoverTexts) {
                r.setDefaultToolTipGenerator(new NoteTooltips());
            }
            plot.setRenderer(s.index(), r);
        }
        style(plot);
        if (curve == Curve.INHARMONICITY) {
            plot.setRangeMinorGridlinesVisible(true);
            plot.setRangeMinorGridlinePaint(CurveLook.MINOR_GRID);
        }
        JFreeChart chart = new JFreeChart(curve.title(), CurveLook.TITLE, plot, true);
        chart.setBackgroundPaint(CurveLook.BACKGROUND);
        chart.getTitle().setPaint(CurveLook.TEXT);
        chart.getTitle().setHorizontalAlignment(org.jfree.chart.ui.HorizontalAlignment.LEFT);
        chart.getTitle().setMargin(2, 8, 0, 0);
        LegendTitle legend = chart.getLegend();
        legend.setPosition(RectangleEdge.TOP);
        legend.setHorizontalAlignment(org.jfree.chart.ui.HorizontalAlignment.RIGHT);
        legend.setFrame(BlockBorder.NONE);
        legend.setBackgroundPaint(CurveLook.BACKGROUND);
        legend.setItemFont(CurveLook.TICKS);
        legend.setMargin(new RectangleInsets(0, 0, 0, 8));
        refresh(chart, curve, data);
        return chart;
    }

    /**
     * Puts {@code data} into a chart made by {@link #build} for the same curve: replaces the
     * series, the boundary and band markers and the axis label, and notifies listeners once.
     *
     * @throws IllegalArgumentException when the chart was not made by {@link #build}
     */
    public static void refresh(JFreeChart chart, Curve curve, CurveData data) {
        if (!(chart.getPlot() instanceof XYPlot plot) || plot.getDatasetCount() < CurveSeries.values().length) {
            throw new IllegalArgumentException("chart was not built by ScaleCurves.build for " + curve);
        }
        boolean notify = chart.isNotify();
        chart.setNotify(false);
        try {
            plot.getRangeAxis().setLabel(curve.axisLabel(data.units()));
            put(plot, CurveSeries.REFERENCE, curve, data.units(), notesOf(data.reference()), "reference");
            put(plot, CurveSeries.PROPOSAL, curve, data.units(), notesOf(data.proposal()), "proposal");
            List<NoteResult> working = data.working().notes();
            put(plot, CurveSeries.WORKING, curve, data.units(), working, "working");
            put(plot, CurveSeries.FLAGGED, curve, data.units(),
                    working.stream().filter(NoteResult::isFlagged).toList(), "working");
            List<NoteResult> selected = data.selectedKey().isPresent()
                    ? data.working().result(data.selectedKey().getAsInt()).stream().toList() : List.of();
            put(plot, CurveSeries.SELECTED, curve, data.units(), selected, "working");
            putOverlays(plot, curve == Curve.BREAK_PERCENT ? data.overlays() : List.of());
            markBoundaries(plot, data);
            if (plot.getRangeAxis() instanceof PercentAxis axis) {
                StressBands bands = data.working().settings().bands();
                axis.setLeastUpperBound(bands.danger() + 10);
                markBands(plot, bands);
            }
        } finally {
            chart.setNotify(notify);
        }
    }

    /** @return the dataset holding {@code series} in a chart made by {@link #build} */
    public static XYSeriesCollection dataset(JFreeChart chart, CurveSeries series) {
        return (XYSeriesCollection) chart.getXYPlot().getDataset(series.index());
    }

    private static List<NoteResult> notesOf(Optional<ScaleAnalysis> a) {
        return a.map(ScaleAnalysis::notes).orElse(List.of());
    }

    private static void put(XYPlot plot, CurveSeries s, Curve curve, DisplayUnits units, List<NoteResult> notes,
                            String scaleName) {
        XYSeriesCollection c = (XYSeriesCollection) plot.getDataset(s.index());
        c.removeAllSeries();
        if (notes.isEmpty()) {
            return;
        }
        XYSeries series = new XYSeries(s.label(), false, true);
        List<NoteResult> drawn = new java.util.ArrayList<>(notes.size());
        for (NoteResult r : notes) {
            double v = curve.value(r, units);
            if (curve.drawable(v)) {
                series.add(r.key(), v, false);
                drawn.add(r);
            }
        }
        c.addSeries(series);
        if (plot.getRenderer(s.index()).getDefaultToolTipGenerator() instanceof NoteTooltips t) {
            t.show(scaleName, drawn, units);
        }
    }

    /**
     * @return the hover text of {@code key} in a series of {@code data} (the note and its values
     *         in the display units), or empty when the series does not have the key
     */
    public static Optional<String> hoverText(CurveData data, CurveSeries series, int key) {
        Optional<ScaleAnalysis> a = switch (series) {
            case REFERENCE -> data.reference();
            case PROPOSAL -> data.proposal();
            case WORKING, FLAGGED, SELECTED -> Optional.of(data.working());
        };
        String name = switch (series) {
            case REFERENCE -> "reference";
            case PROPOSAL -> "proposal";
            default -> "working";
        };
        return a.flatMap(x -> x.result(key)).map(r -> NoteTooltips.text(name, r, data.units()));
    }

    /** @return which series a dataset of a chart made by {@link #build} holds, if it is one of them */
    public static Optional<CurveSeries> seriesOf(JFreeChart chart, org.jfree.data.xy.XYDataset dataset) {
        for (CurveSeries s : CurveSeries.values()) {
            if (chart.getXYPlot().getDataset(s.index()) == dataset) {
                return Optional.of(s);
            }
        }
        return Optional.empty();
    }

    private static XYLineAndShapeRenderer renderer(CurveSeries s) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer();
        r.setDrawSeriesLineAsPath(true);
        switch (s) {
            case REFERENCE -> {
                r.setSeriesPaint(0, CurveLook.REFERENCE);
                r.setSeriesStroke(0, CurveLook.REFERENCE_STROKE);
                r.setSeriesShapesVisible(0, false);
            }
            case PROPOSAL -> {
                r.setSeriesPaint(0, CurveLook.PROPOSAL);
                r.setSeriesStroke(0, CurveLook.PROPOSAL_STROKE);
                r.setSeriesShapesVisible(0, false);
            }
            case WORKING -> {
                r.setSeriesPaint(0, CurveLook.WORKING);
                r.setSeriesStroke(0, CurveLook.WORKING_STROKE);
                r.setSeriesShape(0, CurveLook.DOT);
                r.setSeriesShapesVisible(0, true);
            }
            case FLAGGED -> {
                r.setSeriesLinesVisible(0, false);
                r.setSeriesShapesVisible(0, true);
                r.setSeriesShape(0, CurveLook.FLAG_MARK);
                r.setSeriesPaint(0, CurveLook.FLAGGED);
            }
            case SELECTED -> {
                r.setSeriesLinesVisible(0, false);
                r.setSeriesShapesVisible(0, true);
                r.setSeriesShapesFilled(0, false);
                r.setUseOutlinePaint(false);
                r.setSeriesShape(0, CurveLook.RING);
                r.setSeriesPaint(0, CurveLook.SELECTED);
                r.setSeriesStroke(0, CurveLook.SELECTED_STROKE);
            }
        }
        return r;
    }

    private static void style(XYPlot plot) {
        plot.setBackgroundPaint(CurveLook.PLOT);
        plot.setDomainGridlinePaint(CurveLook.GRID);
        plot.setRangeGridlinePaint(CurveLook.GRID);
        plot.setOutlinePaint(CurveLook.GRID);
        plot.setAxisOffset(new RectangleInsets(2, 2, 2, 2));
        for (ValueAxis axis : List.of(plot.getDomainAxis(), plot.getRangeAxis())) {
            axis.setLabelFont(CurveLook.AXIS);
            axis.setTickLabelFont(CurveLook.TICKS);
            axis.setLabelPaint(CurveLook.TEXT);
            axis.setTickLabelPaint(CurveLook.TEXT);
        }
    }

    private static void markBoundaries(XYPlot plot, CurveData data) {
        plot.clearDomainMarkers();
        boolean high = true;
        for (Boundary b : Boundary.of(data.working())) {
            ValueMarker m = new ValueMarker(b.position());
            m.setPaint(b.kind() == Boundary.Kind.WOUND_PLAIN ? CurveLook.WOUND_LINE : CurveLook.SECTION_LINE);
            m.setStroke(CurveLook.BOUNDARY_STROKE);
            m.setLabel(b.label());
            m.setLabelFont(CurveLook.MARKER);
            m.setLabelPaint(m.getPaint());
            m.setLabelBackgroundColor(new Color(255, 255, 255, 210));
            // alternate label heights so that neighbouring boundaries stay readable
            m.setLabelAnchor(high ? RectangleAnchor.TOP_RIGHT : RectangleAnchor.BOTTOM_RIGHT);
            m.setLabelTextAnchor(high ? TextAnchor.TOP_LEFT : TextAnchor.BOTTOM_LEFT);
            m.setLabelOffset(new RectangleInsets(4, 3, 4, 3));
            high = !high;
            plot.addDomainMarker(m, Layer.BACKGROUND);
        }
        if (data.selectedKey().isPresent()) {
            ValueMarker sel = new ValueMarker(data.selectedKey().getAsInt());
            sel.setPaint(new Color(0xE0, 0x8A, 0x00, 90));
            sel.setStroke(new java.awt.BasicStroke(5f));
            plot.addDomainMarker(sel, Layer.BACKGROUND);
        }
    }

    private static void markBands(XYPlot plot, StressBands bands) {
        plot.clearRangeMarkers();
        band(plot, 0, bands.low(), StressBand.LOW, "low below " + pct(bands.low()));
        band(plot, bands.low(), bands.caution(), StressBand.NORMAL, "");
        band(plot, bands.caution(), bands.danger(), StressBand.CAUTION, "caution from " + pct(bands.caution()));
        band(plot, bands.danger(), Math.max(200, bands.danger() + 50), StressBand.DANGER,
                "danger from " + pct(bands.danger()));
    }

    private static void band(XYPlot plot, double from, double to, StressBand band, String label) {
        Color c = CurveLook.bandFill(band);
        IntervalMarker m = new IntervalMarker(from, to, new Color(c.getRed(), c.getGreen(), c.getBlue(), 40));
        m.setOutlinePaint(null);
        if (!label.isEmpty()) {
            m.setLabel(label);
            m.setLabelFont(CurveLook.MARKER);
            m.setLabelPaint(c.darker());
            m.setLabelAnchor(RectangleAnchor.BOTTOM_LEFT);
            m.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
            m.setLabelOffset(new RectangleInsets(2, 4, 2, 4));
            m.setLabelBackgroundColor(new Color(0, 0, 0, 0));
        }
        plot.addRangeMarker(m, Layer.BACKGROUND);
    }

    private static String pct(double v) {
        return (v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v)) + " %";
    }

    /** @return the y value drawn for {@code key} in {@code series}, or NaN when absent (tests, hover) */
    public static double valueAt(JFreeChart chart, CurveSeries series, int key) {
        XYSeriesCollection c = dataset(chart, series);
        if (c.getSeriesCount() == 0) {
            return Double.NaN;
        }
        XYSeries s = c.getSeries(0);
        int i = s.indexOf(Double.valueOf(key));
        return i < 0 ? Double.NaN : s.getY(i).doubleValue();
    }
}
