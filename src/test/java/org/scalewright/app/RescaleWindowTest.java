package org.scalewright.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import javafx.geometry.Point2D;
import javafx.scene.control.TableView;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.fx.ChartViewer;
import org.jfree.chart.ui.RectangleEdge;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.scalewright.chart.Curve;
import org.scalewright.chart.CurveSeries;
import org.scalewright.chart.ScaleCurves;
import org.scalewright.chart.TargetMarks;
import org.scalewright.model.Scale;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.ScriptedPrompts;
import org.scalewright.app.session.TestSheets;

/** The rescaling tab of the real window on the demo grand, headless: propose, see it drawn, apply, undo. */
@ExtendWith(ApplicationExtension.class)
class RescaleWindowTest {
    private WorkstationView view;

    @Start
    void start(Stage stage) {
        WorkstationViewModel model = new WorkstationViewModel(new ScaleSession(), new ScriptedPrompts());
        view = new WorkstationView(stage, model);
        assertTrue(model.openSheet(TestSheets.demoGrand(), false));
        stage.show();
    }

    private void openTab(FxRobot robot) {
        ToolTabsRobot.open(robot, "rescale-tab");
    }

    private void type(FxRobot robot, String id, String text) {
        javafx.scene.control.TextField f = robot.lookup(id).queryAs(javafx.scene.control.TextField.class);
        robot.interact(() -> f.setText(text));
    }

    @Test
    void aProposalIsDrawnAppliedAndUndone(FxRobot robot) {
        Scale before = view.scale();
        JFreeChart tension = view.curves().chart(Curve.TENSION);
        openTab(robot);
        type(robot, "#rescale-from", "1");
        type(robot, "#rescale-to", "28");
        robot.clickOn("#rescale-propose");
        WaitForAsyncUtils.waitForFxEvents();

        assertEquals(88, ScaleCurves.dataset(tension, CurveSeries.PROPOSAL).getItemCount(0),
                "the proposal is the third curve");
        assertTrue(TargetMarks.curveLength(tension) > 0, "the target is drawn on the tension curve");
        TableView<?> changes = robot.lookup("#rescale-changes").queryAs(TableView.class);
        assertFalse(changes.getItems().isEmpty());
        String summary = robot.lookup("#rescale-summary").queryLabeled().getText();
        assertTrue(summary.contains("Largest neighbour step"), summary);

        robot.clickOn("#rescale-apply");
        WaitForAsyncUtils.waitForFxEvents();
        assertNotEquals(before, view.scale());
        assertEquals(0, ScaleCurves.dataset(tension, CurveSeries.PROPOSAL).getSeriesCount(), "proposal cleared");
        assertTrue(changes.getItems().isEmpty());

        robot.push(KeyCode.CONTROL, KeyCode.Z);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(before, view.scale(), "Ctrl+Z undoes the whole proposal");
    }

    @Test
    void draggingAControlPointOnTheTensionCurveMovesTheTarget(FxRobot robot) {
        openTab(robot);
        type(robot, "#rescale-from", "40");
        type(robot, "#rescale-to", "60");
        robot.clickOn("#rescale-seed");
        WaitForAsyncUtils.waitForFxEvents();
        JFreeChart tension = view.curves().chart(Curve.TENSION);
        assertTrue(TargetMarks.pointCount(tension) >= 2);
        ChartViewer viewer = view.curves().viewers().get(0);
        assertEquals(tension, viewer.getChart());
        var area = viewer.getRenderingInfo().getPlotInfo().getDataArea();
        var plot = tension.getXYPlot();
        var points = plot.getDataset(TargetMarks.POINTS_INDEX);
        int i = 2;
        double key = points.getXValue(0, i);
        double value = points.getYValue(0, i);
        double x = plot.getDomainAxis().valueToJava2D(key, area, RectangleEdge.BOTTOM);
        double y = plot.getRangeAxis().valueToJava2D(value, area, RectangleEdge.LEFT);
        Point2D start = viewer.getCanvas().localToScreen(x, y);
        robot.drag(start.getX(), start.getY()).moveBy(0, -25).release(javafx.scene.input.MouseButton.PRIMARY);
        WaitForAsyncUtils.waitForFxEvents();
        double moved = plot.getDataset(TargetMarks.POINTS_INDEX).getYValue(0, i);
        assertTrue(moved > value * 1.02, "dragged up: " + value + " → " + moved);
        assertEquals(88, ScaleCurves.dataset(tension, CurveSeries.PROPOSAL).getItemCount(0),
                "releasing the point proposes again");
    }
}
