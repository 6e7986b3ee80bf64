package org.scalewright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.util.List;
import java.util.NavigableMap;
import java.util.TreeMap;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.Layer;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;
import org.scalewright.design.orders.TestScales;
import org.scalewright.design.stretch.OctaveType;
import org.scalewright.design.stretch.StretchCurve;
import org.scalewright.design.stretch.StretchPoint;
import org.scalewright.design.stretch.TuningStretch;
import org.scalewright.io.BuiltInData;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

class StretchChartTest {
    private final ScaleAnalysis analysis = ScaleAnalyzer.analyze(TestScales.generated(),
            BuiltInData.defaultSettings());

    private List<StretchCurve> curves() {
        return List.of(TuningStretch.of(analysis, OctaveType.TWO_ONE), TuningStretch.of(analysis, OctaveType.FOUR_TWO),
                TuningStretch.of(analysis, OctaveType.SIX_THREE));
    }

    @Test
    void oneSeriesPerOctaveTypeCarryingTheStretchOfEveryKey() {
        List<StretchCurve> curves = curves();
        JFreeChart chart = StretchChart.build("", curves);
        XYDataset data = chart.getXYPlot().getDataset();
        assertEquals(3, data.getSeriesCount());
        for (int s = 0; s < 3; s++) {
            assertEquals(curves.get(s).octave().label() + " octaves", data.getSeriesKey(s));
            assertEquals(88, data.getItemCount(s));
            for (int i = 0; i < 88; i++) {
                StretchPoint p = curves.get(s).points().get(i);
                assertEquals(p.key(), data.getXValue(s, i));
                assertEquals(p.stretchCents().getAsDouble(), data.getYValue(s, i), 1e-12);
            }
        }
        assertEquals("Tuning stretch from inharmonicity", chart.getTitle().getText());
    }

    @Test
    void theEqualTemperedBandIsShadedAndUnknownKeysAreGaps() {
        NavigableMap<Integer, Double> b = new TreeMap<>();
        b.put(49, 4e-4);
        b.put(73, 2e-3); // its octave partner 61 is missing
        JFreeChart chart = StretchChart.build("x", List.of(TuningStretch.of(b, 440, OctaveType.TWO_ONE)));
        XYPlot plot = chart.getXYPlot();
        IntervalMarker band = (IntervalMarker) plot.getDomainMarkers(Layer.BACKGROUND).iterator().next();
        assertEquals(36.5, band.getStartValue());
        assertEquals(49.5, band.getEndValue());
        assertTrue(Double.isNaN(plot.getDataset().getYValue(0, 1)));
        assertEquals("x: tuning stretch from inharmonicity", chart.getTitle().getText());
    }

    @Test
    void itDrawsIntoAnImageWithoutAWindow() {
        BufferedImage img = ChartImages.draw(StretchChart.build("", curves()), 640, 380);
        int dark = 0;
        for (int y = 0; y < img.getHeight(); y += 2) {
            for (int x = 0; x < img.getWidth(); x += 2) {
                int rgb = img.getRGB(x, y);
                if (((rgb >> 16) & 0xFF) < 100 && ((rgb >> 8) & 0xFF) < 120) {
                    dark++;
                }
            }
        }
        assertTrue(dark > 500, "the curves and labels are drawn: " + dark + " dark pixels");
    }

    @Test
    void aChartNeedsACurve() {
        assertThrows(IllegalArgumentException.class, () -> StretchChart.build("", List.of()));
    }
}
