package org.scalewright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.jfree.chart.JFreeChart;
import org.junit.jupiter.api.Test;
import org.scalewright.design.rescale.ControlPoint;
import org.scalewright.design.rescale.TargetCurve;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.io.BuiltInData;
import org.scalewright.physics.ScaleAnalyzer;
import org.scalewright.model.DisplayUnits;
import org.scalewright.model.ForceUnit;

/** A rescaling target drawn on the tension chart: its own datasets, display units, and removal. */
class TargetMarksTest {
    private static JFreeChart emptyTensionChart() {
        var empty = ScaleAnalyzer.analyze(new Scale("", PitchStandard.ISO_16, List.of(), null),
                BuiltInData.defaultSettings());
        return ScaleCurves.tension(CurveData.of(empty, DisplayUnits.METRIC));
    }

    @Test
    void drawsTheCurveAndPointsInTheDisplayUnitAndRemovesThem() {
        JFreeChart chart = emptyTensionChart();
        TargetCurve curve = new TargetCurve(40, new double[] {700, 710, 720}, "hand-made test curve");
        TargetMarks marks = new TargetMarks(curve, List.of(new ControlPoint(40, 700), new ControlPoint(42, 720)));
        TargetMarks.draw(chart, marks, DisplayUnits.IMPERIAL);
        assertEquals(3, TargetMarks.curveLength(chart));
        assertEquals(2, TargetMarks.pointCount(chart));
        var points = chart.getXYPlot().getDataset(TargetMarks.POINTS_INDEX);
        assertEquals(42, points.getXValue(0, 1));
        assertEquals(ForceUnit.LBF.fromNewtons(720), points.getYValue(0, 1), 1e-9);

        ScaleCurves.refresh(chart, Curve.TENSION, CurveData.of(ScaleAnalyzer.analyze(
                new Scale("", PitchStandard.ISO_16, List.of(), null), BuiltInData.defaultSettings()),
                DisplayUnits.METRIC));
        assertEquals(2, TargetMarks.pointCount(chart), "a refresh of the curves leaves the target alone");

        TargetMarks.draw(chart, null, DisplayUnits.METRIC);
        assertEquals(0, TargetMarks.curveLength(chart));
        assertEquals(0, TargetMarks.pointCount(chart));
    }
}
