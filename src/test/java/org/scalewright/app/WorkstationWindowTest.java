package org.scalewright.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.nio.file.Files;
import java.nio.file.Path;
import javafx.geometry.Point2D;
import javafx.scene.control.TableView;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.fx.ChartViewer;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.RectangleEdge;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.chart.Curve;
import org.scalewright.chart.CurveSeries;
import org.scalewright.chart.ScaleCurves;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.Scale;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.ScriptedPrompts;
import org.scalewright.app.session.TestSheets;
import org.scalewright.app.table.NoteColumn;
import org.scalewright.app.table.NoteRow;

/**
 * The real window on the demo grand, driven headless (TestFX with Monocle): keyboard edits,
 * the curves following them, undo, save and reload.
 */
@ExtendWith(ApplicationExtension.class)
class WorkstationWindowTest {
    private static final int KEY = 30;
    @TempDir
    Path dir;
    private final ScriptedPrompts prompts = new ScriptedPrompts();
    private WorkstationView view;

    /** Fails with the fix in words when the Monocle on the class path cannot run on this Java. */
    @BeforeAll
    static void monocleRunsOnThisJava() {
        try {
            Class.forName("com.sun.glass.ui.monocle.MonoclePlatformFactory");
        } catch (UnsupportedClassVersionError e) {
            fail("org.testfx:openjfx-monocle on the test class path was built for a newer Java than "
                    + System.getProperty("java.version") + " (" + e.getMessage() + "); on Java 17 use "
                    + "org.testfx:openjfx-monocle:17.0.10, which runs JavaFX 21 headless");
        } catch (ClassNotFoundException e) {
            fail("org.testfx:openjfx-monocle is not on the test class path: " + e.getMessage());
        }
    }

    @Start
    void start(Stage stage) {
        WorkstationViewModel model = new WorkstationViewModel(new ScaleSession(), prompts);
        view = new WorkstationView(stage, model);
        assertTrue(model.openSheet(TestSheets.demoGrand(), false));
        stage.show();
    }

    private ScaleSession session() {
        return view.model().session();
    }

    private JFreeChart chart(Curve c) {
        return view.curves().chart(c);
    }

    private void focusCell(FxRobot robot, int key, NoteColumn column) {
        TableView<NoteRow> table = view.table().node();
        robot.interact(() -> {
            int row = view.model().table().indexOf(key);
            table.scrollTo(Math.max(0, row - 3));
            table.getSelectionModel().clearAndSelect(row, view.table().tableColumn(column));
            table.getFocusModel().focus(row, view.table().tableColumn(column));
            table.requestFocus();
        });
        WaitForAsyncUtils.waitForFxEvents();
    }

    @Test
    void theWindowOpensOnTheDemoGrandWithTableAndCurves(FxRobot robot) {
        assertEquals(88, view.table().node().getItems().size());
        for (Curve c : Curve.values()) {
            assertEquals(88, ScaleCurves.dataset(chart(c), CurveSeries.WORKING).getItemCount(0), c.name());
            assertEquals(88, ScaleCurves.dataset(chart(c), CurveSeries.REFERENCE).getItemCount(0), c.name());
        }
        assertTrue(robot.lookup("#status-totals").queryLabeled().getText().startsWith("Total tension"));
        assertFalse(robot.lookup("#flags-list").queryListView().getItems().isEmpty());
    }

    @Test
    void aTypedWireSizeChangesTheCurvesAndUndoRestoresThem(FxRobot robot) {
        double tension = ScaleCurves.valueAt(chart(Curve.TENSION), CurveSeries.WORKING, KEY);
        double pct = ScaleCurves.valueAt(chart(Curve.BREAK_PERCENT), CurveSeries.WORKING, KEY);
        double b = ScaleCurves.valueAt(chart(Curve.INHARMONICITY), CurveSeries.WORKING, KEY);
        focusCell(robot, KEY, NoteColumn.WIRE);
        robot.write("18").type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();

        assertEquals(18, session().scale().note(KEY).orElseThrow().wire().musicWireSize().getAsDouble());
        double edited = ScaleCurves.valueAt(chart(Curve.TENSION), CurveSeries.WORKING, KEY);
        assertTrue(edited < tension, "a thinner wire pulls less: " + edited + " vs " + tension);
        assertEquals(session().analysis().result(KEY).orElseThrow().tension(), edited, 1e-9);
        assertNotEquals(b, ScaleCurves.valueAt(chart(Curve.INHARMONICITY), CurveSeries.WORKING, KEY));
        assertEquals(tension, ScaleCurves.valueAt(chart(Curve.TENSION), CurveSeries.REFERENCE, KEY), 1e-9,
                "the reference stays as opened");
        assertEquals(KEY + 1, session().selectedKeyProperty().get(), "Enter moved down a row");

        robot.push(KeyCode.CONTROL, KeyCode.Z);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(tension, ScaleCurves.valueAt(chart(Curve.TENSION), CurveSeries.WORKING, KEY), 1e-9);
        assertEquals(pct, ScaleCurves.valueAt(chart(Curve.BREAK_PERCENT), CurveSeries.WORKING, KEY), 1e-9);
        assertEquals(b, ScaleCurves.valueAt(chart(Curve.INHARMONICITY), CurveSeries.WORKING, KEY), 1e-15);

        robot.push(KeyCode.CONTROL, KeyCode.Y);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(edited, ScaleCurves.valueAt(chart(Curve.TENSION), CurveSeries.WORKING, KEY), 1e-9);
    }

    @Test
    void aBadEntryIsRefusedInTheStatusLine(FxRobot robot) {
        Scale before = session().scale();
        focusCell(robot, KEY, NoteColumn.LENGTH);
        robot.write("long").type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(before, session().scale());
        String message = robot.lookup("#status-message").queryLabeled().getText();
        assertTrue(message.contains("expected a number in mm, was 'long'"), message);
    }

    @Test
    void savingAndReopeningGiveTheSameScale(FxRobot robot) throws Exception {
        focusCell(robot, KEY, NoteColumn.WIRE);
        robot.write("18").type(KeyCode.TAB);
        robot.write("0.3").type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(session().scale().note(KEY).orElseThrow().isWound(), "Tab moved to wrap 1 and made it wound");
        Scale edited = session().scale();

        Path saved = dir.resolve("grand-edited.csv");
        prompts.files.add(saved);
        robot.push(KeyCode.CONTROL, KeyCode.S); // the demo asks where to save
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(Files.exists(saved));
        assertFalse(session().isDirty());

        prompts.files.add(saved);
        robot.push(KeyCode.CONTROL, KeyCode.O);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(0, prompts.saveQuestions, "nothing unsaved, nothing asked");
        assertEquals(edited, session().scale());
        assertEquals(ScaleSheetReader.standard().read(saved), session().scale());
        assertEquals(saved, session().file().orElseThrow());
        assertEquals(0.3e-3, session().scale().note(KEY).orElseThrow().wrap().inner(), 1e-12);
    }

    @Test
    void selectingARowRingsItsPointAndClickingAPointSelectsItsRow(FxRobot robot) {
        focusCell(robot, 45, NoteColumn.LENGTH);
        for (Curve c : Curve.values()) {
            assertEquals(ScaleCurves.valueAt(chart(c), CurveSeries.WORKING, 45),
                    ScaleCurves.valueAt(chart(c), CurveSeries.SELECTED, 45), c.name());
        }
        ChartViewer viewer = view.curves().viewers().get(1);
        XYPlot plot = viewer.getChart().getXYPlot();
        var area = viewer.getRenderingInfo().getPlotInfo().getDataArea();
        double x = plot.getDomainAxis().valueToJava2D(70, area, RectangleEdge.BOTTOM);
        double y = plot.getRangeAxis().valueToJava2D(ScaleCurves.valueAt(viewer.getChart(), CurveSeries.WORKING, 70),
                area, RectangleEdge.LEFT);
        Point2D onScreen = viewer.localToScreen(x, y);
        robot.clickOn(onScreen.getX(), onScreen.getY());
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(70, session().selectedKeyProperty().get());
        assertEquals(view.model().table().indexOf(70), view.table().node().getSelectionModel().getSelectedIndex());
    }

    @Test
    void unitsSwitchRelabelsTheCurvesAndTheTable(FxRobot robot) {
        robot.interact(() -> view.model().setUnits(WorkstationViewModel.UnitChoice.IMPERIAL));
        assertTrue(chart(Curve.TENSION).getXYPlot().getRangeAxis().getLabel().endsWith("lbf"));
        assertTrue(view.model().table().header(NoteColumn.LENGTH).get().endsWith("in"));
        assertTrue(robot.lookup("#status-totals").queryLabeled().getText().contains("lbf"));
    }
}
