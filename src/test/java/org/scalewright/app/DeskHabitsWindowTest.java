package org.scalewright.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.prefs.BackingStoreException;
import java.util.prefs.Preferences;
import javafx.scene.Node;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Labeled;
import javafx.scene.control.TableView;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.app.session.DeskSettings;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.ScriptedPrompts;
import org.scalewright.app.session.SettingsStore;
import org.scalewright.app.session.TestSheets;
import org.scalewright.app.table.NoteColumn;
import org.scalewright.app.table.NoteRow;
import org.scalewright.model.DisplayUnits;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The real window, headless, on a throwaway preferences node: a setting chosen in one window
 * is there in the next (a restart), the sheet opened is listed under File › Open recent and
 * opens from there; a refused cell entry goes back to the value the figures use.
 */
@ExtendWith(ApplicationExtension.class)
class DeskHabitsWindowTest {
    @TempDir
    Path dir;
    private final Preferences node = Preferences.userRoot().node("org/scalewright/test/window-" + System.nanoTime());
    private final ScriptedPrompts prompts = new ScriptedPrompts();
    private Stage first;

    @Start
    void start(Stage stage) {
        first = stage;
    }

    @AfterEach
    void removeNode() throws BackingStoreException {
        node.removeNode();
        node.flush();
    }

    private WorkstationView window(FxRobot robot, Stage stage, Path sheet) {
        WorkstationView[] made = new WorkstationView[1];
        robot.interact(() -> {
            WorkstationViewModel vm = new WorkstationViewModel(new ScaleSession(), prompts,
                    new DeskSettings(SettingsStore.of(node)));
            made[0] = new WorkstationView(stage, vm);
            if (sheet != null) {
                assertTrue(vm.openSheet(sheet, true));
            }
            stage.show();
            stage.toFront();
        });
        WaitForAsyncUtils.waitForFxEvents();
        return made[0];
    }

    @Test
    void unitsChosenInOneWindowAndTheSheetOpenedAreThereAfterARestart(FxRobot robot) throws Exception {
        Path sheet = TestSheets.small(dir);
        WorkstationView one = window(robot, first, sheet);
        robot.clickOn("#units-choice");
        robot.clickOn("in and lbf");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(DisplayUnits.IMPERIAL, one.model().session().units());
        robot.clickOn("File").clickOn("Quit");
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(!first.isShowing(), "Quit closed the first window");

        Stage[] s = new Stage[1];
        robot.interact(() -> s[0] = new Stage());
        WorkstationView two = window(robot, s[0], null);
        @SuppressWarnings("unchecked")
        ChoiceBox<Object> units = robot.lookup("#units-choice").queryAs(ChoiceBox.class);
        assertEquals("in and lbf", units.getValue().toString(), "the units chosen before the restart");
        assertEquals(DisplayUnits.IMPERIAL, two.model().session().units());
        assertTrue(two.table().node().getItems().isEmpty(), "nothing opened yet");

        robot.clickOn("File").clickOn("Open recent");
        WaitForAsyncUtils.waitForFxEvents();
        List<String> listed = robot.lookup(".menu-item .label").queryAllAs(Labeled.class).stream()
                .filter(Node::isVisible).map(Labeled::getText).toList();
        assertTrue(listed.stream().anyMatch(t -> t.contains("small.csv") && t.contains(dir.toString())), listed.toString());
        robot.clickOn(robot.lookup(".menu-item .label").queryAllAs(Labeled.class).stream()
                .filter(l -> l.getText().contains("small.csv")).findFirst().orElseThrow());
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(10, two.table().node().getItems().size(), "the recent sheet opened");
        assertEquals("55.12", NoteColumn.LENGTH.text(two.table().node().getItems().get(0), two.model().session().units()),
                "in inches: 1400 mm / 25.4 mm per inch (NIST SP 811)");
        robot.interact(() -> s[0].close());
    }

    @Test
    void aRefusedEntryGoesBackToTheValueTheFiguresUse(FxRobot robot) throws Exception {
        WorkstationView w = window(robot, first, TestSheets.small(dir));
        TableView<NoteRow> table = w.table().node();
        robot.interact(() -> {
            table.getSelectionModel().clearAndSelect(4, w.table().tableColumn(NoteColumn.WIRE));
            table.getFocusModel().focus(4, w.table().tableColumn(NoteColumn.WIRE));
            table.requestFocus();
        });
        robot.write("9x").type(KeyCode.TAB);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(20, w.model().session().scale().note(5).orElseThrow().wire().musicWireSize().getAsDouble());
        List<String> shown = robot.lookup(".table-cell").queryAllAs(Labeled.class).stream()
                .filter(c -> c instanceof javafx.scene.control.TableCell<?, ?> tc && tc.getTableColumn()
                        == w.table().tableColumn(NoteColumn.WIRE) && tc.getIndex() == 4)
                .map(Labeled::getText).toList();
        assertEquals(List.of("20"), shown, "the cell shows the wire the figures use, not the refused '9x'");
        String message = robot.lookup("#status-message").queryLabeled().getText();
        assertTrue(message.contains("'9x'"), message);
        assertTrue(robot.lookup("#status-message").queryLabeled().getStyleClass().contains("problem"));
    }
}
