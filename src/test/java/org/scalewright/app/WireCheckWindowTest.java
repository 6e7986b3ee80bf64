package org.scalewright.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import javafx.scene.control.TableView;
import javafx.stage.Stage;
import org.jfree.chart.JFreeChart;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.scalewright.chart.Curve;
import org.scalewright.chart.ScaleCurves;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.ScriptedPrompts;
import org.scalewright.app.session.TestSheets;
import org.scalewright.app.wirecheck.WireCheckViewModel;

/** The wire check tab in the real window on the demo grand, driven headless (TestFX with Monocle). */
@ExtendWith(ApplicationExtension.class)
class WireCheckWindowTest {
    private final ScriptedPrompts prompts = new ScriptedPrompts();
    private WorkstationView view;

    @Start
    void start(Stage stage) {
        WorkstationViewModel model = new WorkstationViewModel(new ScaleSession(), prompts);
        view = new WorkstationView(stage, model);
        assertTrue(model.openSheet(TestSheets.demoGrand(), false));
        stage.show();
    }

    @Test
    void aCheckDrawsAfterAndPeakOverThePercentCurve(FxRobot robot) {
        ToolTabsRobot.open(robot, "wire-check-tab");
        prompts.files.add(Path.of("scales", "wire-makers", "specimen-wire-mill-mm-load-n.csv"));
        robot.clickOn("#wire-check-load-table");
        robot.doubleClickOn("#wire-check-flat").write("40");
        robot.doubleClickOn("#wire-check-overpull").write("25");
        robot.clickOn("#wire-check-run");
        WaitForAsyncUtils.waitForFxEvents();

        @SuppressWarnings("unchecked")
        TableView<WireCheckViewModel.Row> table = robot.lookup("#wire-check-table").queryAs(TableView.class);
        assertEquals(88, table.getItems().size());
        assertTrue(table.getItems().get(0).overDanger(), "at risk first");
        JFreeChart percent = view.curves().chart(Curve.BREAK_PERCENT);
        var overlays = ScaleCurves.overlayDataset(percent);
        assertEquals(2, overlays.getSeriesCount());
        assertEquals(WireCheckViewModel.AFTER, overlays.getSeriesKey(0));
        assertEquals(WireCheckViewModel.PEAK, overlays.getSeriesKey(1));
        assertEquals(88, overlays.getItemCount(1));
        var first = table.getItems().get(0);
        assertEquals(first.pctPeak(), ScaleCurves.overlayValueAt(percent, WireCheckViewModel.PEAK, first.key()), 1e-9);
        assertEquals(0, ScaleCurves.overlayDataset(view.curves().chart(Curve.TENSION)).getSeriesCount());
        assertTrue(robot.lookup("#wire-check-cautions").query().isVisible(), "a pitch raise shows the cautions");

        robot.interact(() -> table.getSelectionModel().select(0));
        robot.clickOn(robot.lookup("#wire-check-table .table-row-cell").nth(0).queryAs(javafx.scene.Node.class));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(first.key(), view.model().session().selectedKeyProperty().get(), "the row selects its key");
    }
}
