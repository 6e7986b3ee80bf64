package org.scalewright.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import javafx.scene.control.TableView;
import javafx.scene.input.Clipboard;
import javafx.scene.input.ClipboardContent;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.ScriptedPrompts;
import org.scalewright.app.session.TestSheets;
import org.scalewright.app.table.NoteColumn;
import org.scalewright.app.table.NoteRow;
import org.scalewright.model.Scale;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The note table and the clipboard in the real window, headless (TestFX with Monocle): a 3 × 2 block
 * copied from a spreadsheet, with decimal commas, pasted with Ctrl+V as one edit and undone with one
 * Ctrl+Z; a block copied with Ctrl+C.
 */
@ExtendWith(ApplicationExtension.class)
class ClipboardWindowTest {
    private WorkstationView view;

    @Start
    void start(Stage stage) {
        WorkstationViewModel model = new WorkstationViewModel(new ScaleSession(), new ScriptedPrompts());
        view = new WorkstationView(stage, model);
        assertTrue(model.openSheet(TestSheets.demoGrand(), false));
        stage.show();
    }

    private ScaleSession session() {
        return view.model().session();
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

    private static void putOnClipboard(FxRobot robot, String text) {
        robot.interact(() -> {
            ClipboardContent c = new ClipboardContent();
            c.putString(text);
            Clipboard.getSystemClipboard().setContent(c);
        });
    }

    @Test
    void aPastedBlockIsOneEditAndOneUndo(FxRobot robot) {
        Scale before = session().scale();
        // speaking length (mm) and wire (size number or mm) of keys 40-42, as a German spreadsheet copies them
        putOnClipboard(robot, "1234,5\t16\n1220,5\t16,5\n1210\t17\n");
        focusCell(robot, 40, NoteColumn.LENGTH);
        robot.push(KeyCode.CONTROL, KeyCode.V);
        WaitForAsyncUtils.waitForFxEvents();

        Scale after = session().scale();
        assertEquals(1.2345, after.note(40).orElseThrow().speakingLength(), 1e-12);
        assertEquals(1.2205, after.note(41).orElseThrow().speakingLength(), 1e-12);
        assertEquals(1.210, after.note(42).orElseThrow().speakingLength(), 1e-12);
        assertEquals(16, after.note(40).orElseThrow().wire().musicWireSize().getAsDouble());
        assertEquals(16.5, after.note(41).orElseThrow().wire().musicWireSize().getAsDouble());
        assertEquals(17, after.note(42).orElseThrow().wire().musicWireSize().getAsDouble());
        assertEquals(before.note(43), after.note(43), "the key below the block is untouched");
        assertTrue(session().undoTextProperty().get().startsWith("paste of 3 × 2 cells"),
                session().undoTextProperty().get());

        robot.push(KeyCode.CONTROL, KeyCode.Z);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(before, session().scale(), "one undo takes the whole block back");
        assertFalse(session().canUndoProperty().get(), "the paste was one step");
    }

    @Test
    void aBadCellPastesNothingAndSaysWhere(FxRobot robot) {
        Scale before = session().scale();
        putOnClipboard(robot, "1234,5\t16\n1220,5\tthick\n");
        focusCell(robot, 40, NoteColumn.LENGTH);
        robot.push(KeyCode.CONTROL, KeyCode.V);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(before, session().scale());
        String message = robot.lookup("#status-message").queryLabeled().getText();
        assertTrue(message.contains("row 2, column 2 of the block (key 41"), message);
    }

    @Test
    void aChosenBlockIsCopiedAsTabSeparatedText(FxRobot robot) {
        TableView<NoteRow> table = view.table().node();
        focusCell(robot, 40, NoteColumn.LENGTH);
        robot.interact(() -> table.getSelectionModel().selectRange(view.model().table().indexOf(40),
                view.table().tableColumn(NoteColumn.LENGTH), view.model().table().indexOf(41),
                view.table().tableColumn(NoteColumn.WIRE)));
        robot.push(KeyCode.CONTROL, KeyCode.C);
        WaitForAsyncUtils.waitForFxEvents();
        String[] text = new String[1];
        robot.interact(() -> text[0] = Clipboard.getSystemClipboard().getString());
        String[] lines = text[0].split("\n");
        assertEquals(2, lines.length, text[0]);
        assertEquals(2, lines[0].split("\t").length, text[0]);
    }
}
