package org.scalewright.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.stage.Stage;
import org.jfree.chart.fx.ChartViewer;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.model.CoreWire;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;
import org.scalewright.app.export.ExportTestPrompts;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.TestSheets;

/** The Tuning stretch and Exports tabs in the real window on the demo grand, headless (TestFX with Monocle). */
@ExtendWith(ApplicationExtension.class)
class ExportWindowTest {
    @TempDir
    Path dir;
    private final ExportTestPrompts prompts = new ExportTestPrompts();
    private WorkstationView view;

    @Start
    void start(Stage stage) {
        WorkstationViewModel model = new WorkstationViewModel(new ScaleSession(), prompts);
        view = new WorkstationView(stage, model);
        assertTrue(model.openSheet(TestSheets.demoGrand(), false));
        stage.show();
    }

    private void selectTab(FxRobot robot, String id) {
        ToolTabsRobot.open(robot, id);
    }

    private static XYDataset stretchData(FxRobot robot) {
        return robot.lookup("#stretch-chart").queryAs(ChartViewer.class).getChart().getXYPlot().getDataset();
    }

    @Test
    void theStretchTabDrawsTheCurveAndRedrawsAfterAnEdit(FxRobot robot) {
        selectTab(robot, "stretch-tab");
        XYDataset data = stretchData(robot);
        assertEquals(1, data.getSeriesCount());
        assertEquals(88, data.getItemCount(0));
        assertEquals(0.0, data.getYValue(0, 48), 1e-9, "A4 at equal temperament");
        double top = data.getYValue(0, 79); // key 80, an octave above the edited key 68
        assertTrue(top > 0, "treble sharp");
        ScaleSession s = view.model().session();
        robot.interact(() -> s.edit("wire of key 68", sc -> sc.withNote(
                sc.note(68).orElseThrow().withWire(CoreWire.ofDiameter(1.2e-3)))));
        WaitForAsyncUtils.waitForFxEvents();
        assertNotEquals(top, stretchData(robot).getYValue(0, 79), 1e-6);
        robot.clickOn("#stretch-all");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(3, stretchData(robot).getSeriesCount());
    }

    @Test
    void anExportButtonWritesTheChosenFileAndSaysSo(FxRobot robot) throws Exception {
        selectTab(robot, "exports-tab");
        Path target = dir.resolve("order.csv");
        prompts.files.add(target);
        robot.clickOn("#export-wound-order");
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(Files.readString(target).contains("key"), "the wound-string order was written");
        String note = robot.lookup("#export-note").queryAs(Label.class).getText();
        assertTrue(note.startsWith("Wrote wound-string order to " + target.toAbsolutePath()), note);
        ListView<?> written = robot.lookup("#export-written").queryListView();
        assertEquals(1, written.getItems().size());
        assertTrue(robot.lookup("#status-message").tryQuery().map(n -> ((Label) n).getText()).orElse("")
                .startsWith("wrote wound-string order"), "the status line says what was written");
    }

    @Test
    void theWholeReportIsMadeInTheBackgroundAndTheButtonWaitsForIt(FxRobot robot) throws Exception {
        selectTab(robot, "exports-tab");
        Path folder = dir.resolve("report");
        prompts.files.add(folder);
        robot.clickOn("#export-report");
        Button button = robot.lookup("#export-report").queryButton();
        WaitForAsyncUtils.waitFor(60, java.util.concurrent.TimeUnit.SECONDS,
                () -> !button.isDisabled() && Files.exists(folder.resolve("report.pdf")));
        WaitForAsyncUtils.waitForFxEvents();
        String note = robot.lookup("#export-note").queryAs(Label.class).getText();
        assertTrue(note.startsWith("Wrote the report into " + folder.toAbsolutePath()), note);
        assertTrue(Files.readString(folder.resolve("schedule.csv")).contains("key"));
    }
}
