package org.scalewright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.util.List;
import java.util.Map;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.junit.jupiter.api.Test;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.model.DisplayUnits;

/** Overlays of percent of breaking strength drawn over the percent chart (invented values, drawing only). */
class CurveOverlayTest {
    private final ScaleAnalysis working = CurveFixtures.analysis(1.0);
    private final CurveOverlay after = CurveOverlay.of("after", Map.of(3, 41.0, 4, 43.5, 5, Double.NaN),
            CurveOverlay.Look.LINE);
    private final CurveOverlay peak = CurveOverlay.of("peak", Map.of(3, 66.0, 4, 72.0), CurveOverlay.Look.DOTTED);

    @Test
    void overlaysAreDrawnOnThePercentChartInTheirOwnSeries() {
        CurveData data = CurveData.of(working, DisplayUnits.METRIC).withOverlays(List.of(after, peak));
        JFreeChart chart = ScaleCurves.breakPercent(data);
        assertEquals(2, ScaleCurves.overlayDataset(chart).getSeriesCount());
        assertEquals("after", ScaleCurves.overlayDataset(chart).getSeriesKey(0));
        assertEquals(2, ScaleCurves.overlayDataset(chart).getItemCount(0), "the NaN is left out");
        assertEquals(43.5, ScaleCurves.overlayValueAt(chart, "after", 4), 0);
        assertEquals(72.0, ScaleCurves.overlayValueAt(chart, "peak", 4), 0);
        assertTrue(Double.isNaN(ScaleCurves.overlayValueAt(chart, "peak", 5)));
        assertEquals(working.notes().size(), ScaleCurves.dataset(chart, CurveSeries.WORKING).getItemCount(0),
                "the working curve is still drawn");
        var r = (XYLineAndShapeRenderer) chart.getXYPlot().getRenderer(ScaleCurves.OVERLAY_INDEX);
        assertNotEquals(r.getSeriesPaint(0), r.getSeriesPaint(1), "after and peak look different");
        assertNotEquals(r.getSeriesStroke(0), r.getSeriesStroke(1));
    }

    @Test
    void otherChartsDoNotDrawThemAndARefreshReplacesThem() {
        CurveData data = CurveData.of(working, DisplayUnits.METRIC).withOverlays(List.of(after, peak));
        assertEquals(0, ScaleCurves.overlayDataset(ScaleCurves.tension(data)).getSeriesCount());
        assertEquals(0, ScaleCurves.overlayDataset(ScaleCurves.inharmonicity(data)).getSeriesCount());

        JFreeChart chart = ScaleCurves.breakPercent(data);
        CurveOverlay marks = CurveOverlay.of("stands out", Map.of(12, 55.0), CurveOverlay.Look.MARKS);
        ScaleCurves.refresh(chart, Curve.BREAK_PERCENT, data.withOverlays(List.of(marks)).withSelectedKey(12));
        assertEquals(1, ScaleCurves.overlayDataset(chart).getSeriesCount());
        assertEquals(55.0, ScaleCurves.overlayValueAt(chart, "stands out", 12), 0);
        assertEquals(List.of(marks), data.withOverlays(List.of(marks)).withSelectedKey(12).withReference(working)
                .withUnits(DisplayUnits.IMPERIAL).overlays(), "the other copies keep the overlays");
        ScaleCurves.refresh(chart, Curve.BREAK_PERCENT, data.withOverlays(null));
        assertEquals(0, ScaleCurves.overlayDataset(chart).getSeriesCount());
    }

    @Test
    void theAxisMakesRoomForAPeakAboveTheCurvesAndTheChartDraws() {
        CurveOverlay high = CurveOverlay.of("peak", Map.of(20, 140.0), CurveOverlay.Look.DOTTED);
        JFreeChart chart = ScaleCurves.breakPercent(CurveData.of(working, DisplayUnits.METRIC)
                .withOverlays(List.of(high)));
        BufferedImage img = chart.createBufferedImage(800, 400);
        assertEquals(800, img.getWidth());
        assertTrue(chart.getXYPlot().getRangeAxis().getUpperBound() >= 140,
                "upper bound " + chart.getXYPlot().getRangeAxis().getUpperBound());
    }

    @Test
    void namesMustBeGivenAndUnique() {
        assertThrows(IllegalArgumentException.class, () -> CurveOverlay.of(" ", Map.of(), CurveOverlay.Look.LINE));
        var e = assertThrows(IllegalArgumentException.class,
                () -> CurveData.of(working, DisplayUnits.METRIC).withOverlays(List.of(after, after)));
        assertTrue(e.getMessage().contains("unique"), e.getMessage());
    }
}
