package org.scalewright.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.OptionalInt;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.TableView;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.scalewright.app.archive.ArchiveViewModel;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.ScriptedPrompts;
import org.scalewright.app.session.TestSheets;
import org.scalewright.archive.Archive;
import org.scalewright.archive.Instrument;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.BreakActivity;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The instruments panel in the real window, driven headless (TestFX with Monocle), on a real archive
 * file holding the demo grand as measured: a break logged on the selected key shows in the list.
 */
@ExtendWith(ApplicationExtension.class)
class ArchiveWindowTest {
    private final ScriptedPrompts prompts = new ScriptedPrompts();
    private WorkstationViewModel model;
    private Path db;

    @Start
    void start(Stage stage) throws Exception {
        Path dir = Files.createTempDirectory("scalewright-archive-window");
        db = dir.resolve("workshop.db");
        try (Archive a = Archive.create(db)) {
            a.addInstrument(Instrument.named("grand-190"));
            a.saveVersion("grand-190", ScaleSheetReader.standard().read(TestSheets.demoGrand()), "as measured",
                    OptionalInt.empty(), LocalDate.of(2026, 11, 2));
        }
        System.setProperty("scalewright.archive", db.toString());
        model = new WorkstationViewModel(new ScaleSession(), prompts);
        new WorkstationView(stage, model);
        assertTrue(model.openSheet(TestSheets.demoGrand(), false));
        stage.show();
    }

    @AfterEach
    void forgetTheArchive() throws Exception {
        System.clearProperty("scalewright.archive");
        Files.deleteIfExists(db);
        Files.deleteIfExists(db.getParent());
    }

    @Test
    void aBreakLoggedOnTheSelectedKeyShowsInTheList(FxRobot robot) {
        ToolTabsRobot.open(robot, "archive-tab");
        @SuppressWarnings("unchecked")
        ComboBox<String> instrument = robot.lookup("#archive-instrument").queryAs(ComboBox.class);
        assertEquals("grand-190", instrument.getValue(), "the archive's one instrument is chosen");
        @SuppressWarnings("unchecked")
        TableView<ArchiveViewModel.VersionRow> versions = robot.lookup("#archive-versions").queryAs(TableView.class);
        assertEquals(1, versions.getItems().size());

        ToolTabsRobot.openInner(robot, "archive-breaks-tab");
        robot.interact(() -> model.session().selectedKeyProperty().set(66));
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(robot.lookup("#archive-break-key").queryLabeled().getText().startsWith("66 D6"));
        robot.doubleClickOn("#archive-break-pitch").write("1178");
        robot.doubleClickOn("#archive-break-string").write("2");
        robot.interact(() -> robot.lookup(n -> n instanceof ChoiceBox<?> c && c.getItems().contains(
                BreakActivity.PITCH_RAISE)).queryAs(ChoiceBox.class).setValue(BreakActivity.PITCH_RAISE));
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(robot.lookup("#archive-caution").query().isVisible(), "a pitch raise shows the caution");
        robot.clickOn("#archive-log-break");
        WaitForAsyncUtils.waitForFxEvents();

        @SuppressWarnings("unchecked")
        TableView<ArchiveViewModel.BreakRow> breaks = robot.lookup("#archive-breaks").queryAs(TableView.class);
        assertEquals(1, breaks.getItems().size(), robot.lookup("#archive-problem").queryLabeled().getText());
        ArchiveViewModel.BreakRow row = breaks.getItems().get(0);
        assertEquals(66, row.key());
        assertEquals("1178", row.hz());
        assertEquals("2", row.string());
        assertEquals("pitch-raise", row.during());
        assertTrue(!row.stressMpa().isEmpty(), "judged on the version as measured: " + row);
        assertTrue(robot.lookup("#archive-breaks .table-row-cell").queryAll().stream()
                .anyMatch(n -> n.lookupAll(".table-cell").stream().anyMatch(c -> c instanceof
                        javafx.scene.control.TableCell<?, ?> tc && "1178".equals(tc.getText()))),
                "the row is drawn in the list");
        try (Archive a = Archive.open(db)) {
            assertEquals(1, a.breaks("grand-190").size(), "kept in the archive file");
        }
    }

    @Test
    void aJobLoggedFromItsTabShowsInTheListWithTheWorkingPitch(FxRobot robot) {
        ToolTabsRobot.open(robot, "archive-tab");
        ToolTabsRobot.openInner(robot, "archive-jobs-tab");
        assertEquals("440", robot.lookup("#archive-job-a4").queryTextInputControl().getText(),
                "the pitch starts as the working A4");
        robot.clickOn("#archive-job-kind").write("pitch raise");
        robot.doubleClickOn("#archive-job-notes").write("from 435, two passes");
        @SuppressWarnings("unchecked")
        ComboBox<ArchiveViewModel.VersionChoice> version = robot.lookup("#archive-job-version").queryAs(ComboBox.class);
        robot.clickOn(version).clickOn("1 (as measured)");
        robot.clickOn("#archive-log-job");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(1, version.getSelectionModel().getSelectedIndex(), "the version chosen is still shown");
        assertTrue(robot.lookup("#archive-job-version .list-cell").queryAs(javafx.scene.control.ListCell.class)
                .getText().equals("1 (as measured)"), "and drawn in the box");

        @SuppressWarnings("unchecked")
        TableView<ArchiveViewModel.JobRow> jobs = robot.lookup("#archive-jobs").queryAs(TableView.class);
        assertEquals(1, jobs.getItems().size(), robot.lookup("#archive-problem").queryLabeled().getText());
        assertEquals("pitch raise", jobs.getItems().get(0).kind());
        assertEquals("440", jobs.getItems().get(0).a4());
        assertEquals("from 435, two passes", jobs.getItems().get(0).notes());
        assertEquals("1", jobs.getItems().get(0).version());
        try (Archive a = Archive.open(db)) {
            assertEquals(1, a.jobs("grand-190").size(), "kept in the archive file");
        }
    }
}
