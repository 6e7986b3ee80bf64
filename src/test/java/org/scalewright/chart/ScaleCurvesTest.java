package org.scalewright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.Layer;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.Test;
import org.scalewright.model.UnitConversions;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.model.DisplayUnits;

class ScaleCurvesTest {
    private final ScaleAnalysis working = CurveFixtures.analysis(1.0);
    private final ScaleAnalysis reference = CurveFixtures.analysis(1.05);

    @Test
    void tensionCurveCarriesEveryNoteInTheDisplayUnit() {
        JFreeChart n = ScaleCurves.tension(CurveData.of(working, DisplayUnits.METRIC));
        JFreeChart lbf = ScaleCurves.tension(CurveData.of(working, DisplayUnits.IMPERIAL));
        XYSeriesCollection ds = ScaleCurves.dataset(n, CurveSeries.WORKING);
        assertEquals(1, ds.getSeriesCount());
        assertEquals(working.notes().size(), ds.getItemCount(0));
        for (NoteResult r : working.notes()) {
            assertEquals(r.tension(), ScaleCurves.valueAt(n, CurveSeries.WORKING, r.key()), 1e-9);
            // 1 lbf = 4.4482216152605 N (NIST SP 811, B.8)
            assertEquals(r.tension() / UnitConversions.NEWTONS_PER_LBF,
                    ScaleCurves.valueAt(lbf, CurveSeries.WORKING, r.key()), 1e-9);
        }
        assertTrue(lbf.getXYPlot().getRangeAxis().getLabel().contains("lbf"));
        assertTrue(n.getXYPlot().getRangeAxis().getLabel().endsWith(", N"));
    }

    @Test
    void referenceAndProposalAreDrawnOnlyWhenGiven() {
        CurveData alone = CurveData.of(working, DisplayUnits.METRIC);
        JFreeChart chart = ScaleCurves.breakPercent(alone);
        assertEquals(0, ScaleCurves.dataset(chart, CurveSeries.REFERENCE).getSeriesCount());
        assertEquals(0, ScaleCurves.dataset(chart, CurveSeries.PROPOSAL).getSeriesCount());
        assertEquals(0, ScaleCurves.dataset(chart, CurveSeries.SELECTED).getSeriesCount());

        ScaleCurves.refresh(chart, Curve.BREAK_PERCENT, alone.withReference(reference).withProposal(reference)
                .withSelectedKey(12));
        assertEquals(reference.notes().size(), ScaleCurves.dataset(chart, CurveSeries.REFERENCE).getItemCount(0));
        assertEquals(reference.notes().size(), ScaleCurves.dataset(chart, CurveSeries.PROPOSAL).getItemCount(0));
        assertEquals(1, ScaleCurves.dataset(chart, CurveSeries.SELECTED).getItemCount(0));
        assertEquals(working.result(12).orElseThrow().breakPct(),
                ScaleCurves.valueAt(chart, CurveSeries.SELECTED, 12), 1e-9);
        assertEquals(reference.result(3).orElseThrow().breakPct(),
                ScaleCurves.valueAt(chart, CurveSeries.REFERENCE, 3), 1e-9);
        assertNotEquals(ScaleCurves.valueAt(chart, CurveSeries.WORKING, 3),
                ScaleCurves.valueAt(chart, CurveSeries.REFERENCE, 3));
    }

    @Test
    void flaggedNotesHaveTheirOwnSeries() {
        JFreeChart chart = ScaleCurves.tension(CurveData.of(working, DisplayUnits.METRIC));
        long flagged = working.flaggedNoteCount();
        assertTrue(flagged > 0, "the fixture has flagged notes (the tenor bridge step, low stress)");
        assertEquals(flagged, ScaleCurves.dataset(chart, CurveSeries.FLAGGED).getItemCount(0));
        for (NoteResult r : working.notes()) {
            double v = ScaleCurves.valueAt(chart, CurveSeries.FLAGGED, r.key());
            assertEquals(r.isFlagged(), !Double.isNaN(v), "key " + r.key());
        }
    }

    @Test
    void sectionBoundaryAndWoundPlainChangeAreMarkedOnEveryCurve() {
        List<Boundary> boundaries = Boundary.of(working);
        assertEquals(List.of(new Boundary(10.5, "bass | tenor", Boundary.Kind.SECTION),
                new Boundary(14.5, "wound | plain", Boundary.Kind.WOUND_PLAIN)), boundaries);
        for (Curve c : Curve.values()) {
            JFreeChart chart = ScaleCurves.build(c, CurveData.of(working, DisplayUnits.METRIC));
            var markers = chart.getXYPlot().getDomainMarkers(Layer.BACKGROUND);
            Set<Double> at = new HashSet<>();
            for (Object m : markers) {
                at.add(((ValueMarker) m).getValue());
            }
            assertEquals(Set.of(10.5, 14.5), at, c.name());
        }
    }

    @Test
    void breakPercentChartDrawsTheFourStressBands() {
        JFreeChart chart = ScaleCurves.breakPercent(CurveData.of(working, DisplayUnits.METRIC));
        var markers = chart.getXYPlot().getRangeMarkers(Layer.BACKGROUND);
        assertEquals(4, markers.size());
        var bands = working.settings().bands();
        Set<Double> starts = new HashSet<>();
        for (Object m : markers) {
            starts.add(((IntervalMarker) m).getStartValue());
        }
        assertEquals(Set.of(0.0, bands.low(), bands.caution(), bands.danger()), starts);
        // the danger band stays in view even when every string is below it
        chart.getXYPlot().getRangeAxis().configure();
        assertTrue(chart.getXYPlot().getRangeAxis().getUpperBound() >= bands.danger());
    }

    @Test
    void inharmonicityIsOnALogarithmicAxis() {
        JFreeChart chart = ScaleCurves.inharmonicity(CurveData.of(working, DisplayUnits.METRIC));
        assertInstanceOf(LogAxis.class, chart.getXYPlot().getRangeAxis());
        NoteResult r = working.notes().get(20);
        assertEquals(r.inharmonicity(), ScaleCurves.valueAt(chart, CurveSeries.WORKING, r.key()), 1e-15);
    }

    @Test
    void refreshReplacesTheDataAfterAnEdit() {
        JFreeChart chart = ScaleCurves.tension(CurveData.of(working, DisplayUnits.METRIC));
        double before = ScaleCurves.valueAt(chart, CurveSeries.WORKING, 20);
        ScaleCurves.refresh(chart, Curve.TENSION, CurveData.of(reference, DisplayUnits.METRIC));
        double after = ScaleCurves.valueAt(chart, CurveSeries.WORKING, 20);
        assertEquals(reference.result(20).orElseThrow().tension(), after, 1e-9);
        assertNotEquals(before, after);
    }

    @Test
    void refreshRefusesAForeignChart() {
        JFreeChart foreign = new JFreeChart(new XYPlot());
        assertThrows(IllegalArgumentException.class, () -> ScaleCurves.refresh(foreign, Curve.TENSION,
                CurveData.of(working, DisplayUnits.METRIC)));
    }

    @Test
    void eachChartDrawsIntoAnImage() {
        CurveData data = CurveData.of(working, DisplayUnits.METRIC).withReference(reference).withSelectedKey(20);
        for (Curve c : Curve.values()) {
            JFreeChart chart = ScaleCurves.build(c, data);
            XYPlot plot = chart.getXYPlot();
            assertEquals(CurveSeries.values().length, plot.getDatasetCount());
            BufferedImage img = ChartImages.draw(chart, 800, 400);
            int workingBlue = 0;
            Set<Integer> colours = new HashSet<>();
            for (int y = 0; y < img.getHeight(); y++) {
                for (int x = 0; x < img.getWidth(); x++) {
                    int rgb = img.getRGB(x, y) & 0xFFFFFF;
                    colours.add(rgb);
                    if (near(rgb, CurveLook.WORKING.getRGB() & 0xFFFFFF)) {
                        workingBlue++;
                    }
                }
            }
            assertTrue(colours.size() > 20, c + " drew " + colours.size() + " colours");
            assertTrue(workingBlue > 100, c + " drew " + workingBlue + " pixels of the working curve");
            byte[] png = ChartImages.png(chart, 400, 200);
            assertEquals((byte) 0x89, png[0]);
            assertEquals('P', png[1]);
        }
    }

    @Test
    void hoverTextsNameTheNoteAndItsValues() {
        CurveData data = CurveData.of(working, DisplayUnits.IMPERIAL).withReference(reference);
        NoteResult r = working.result(20).orElseThrow();
        String text = ScaleCurves.hoverText(data, CurveSeries.WORKING, 20).orElseThrow();
        assertTrue(text.startsWith("working, key 20 " + r.noteName() + " (tenor)"), text);
        assertTrue(text.contains(String.format(java.util.Locale.ROOT, "%.0f lbf per string",
                r.tension() / UnitConversions.NEWTONS_PER_LBF)), text);
        assertTrue(ScaleCurves.hoverText(data, CurveSeries.REFERENCE, 20).orElseThrow().startsWith("reference"));
        assertTrue(ScaleCurves.hoverText(data, CurveSeries.PROPOSAL, 20).isEmpty());
        assertTrue(ScaleCurves.hoverText(data, CurveSeries.WORKING, 99).isEmpty());

        // a chart built with hover texts gives each drawn point its text; one built without, none
        JFreeChart with = ScaleCurves.tension(data);
        var info = new org.jfree.chart.ChartRenderingInfo();
        with.draw(ChartImages.draw(with, 10, 10).createGraphics(), new java.awt.geom.Rectangle2D.Double(0, 0, 800, 400),
                info);
        long texts = info.getEntityCollection().getEntities().stream()
                .filter(e -> e instanceof org.jfree.chart.entity.XYItemEntity x && x.getToolTipText() != null).count();
        assertTrue(texts >= working.notes().size(), texts + " hover texts");
        JFreeChart without = ScaleCurves.build(Curve.TENSION, data, false);
        var none = new org.jfree.chart.ChartRenderingInfo();
        without.draw(ChartImages.draw(without, 10, 10).createGraphics(),
                new java.awt.geom.Rectangle2D.Double(0, 0, 800, 400), none);
        assertEquals(0, none.getEntityCollection().getEntities().stream()
                .filter(e -> e instanceof org.jfree.chart.entity.XYItemEntity x && x.getToolTipText() != null).count());
        assertEquals(java.util.Optional.of(CurveSeries.WORKING),
                ScaleCurves.seriesOf(with, ScaleCurves.dataset(with, CurveSeries.WORKING)));
    }

    @Test
    void imageSizeMustBePositive() {
        JFreeChart chart = ScaleCurves.tension(CurveData.of(working, DisplayUnits.METRIC));
        var e = assertThrows(IllegalArgumentException.class, () -> ChartImages.draw(chart, 0, 10));
        assertTrue(e.getMessage().contains("0 x 10"));
    }

    private static boolean near(int a, int b) {
        int dr = Math.abs((a >> 16 & 0xFF) - (b >> 16 & 0xFF));
        int dg = Math.abs((a >> 8 & 0xFF) - (b >> 8 & 0xFF));
        int db = Math.abs((a & 0xFF) - (b & 0xFF));
        return dr + dg + db < 30;
    }
}
