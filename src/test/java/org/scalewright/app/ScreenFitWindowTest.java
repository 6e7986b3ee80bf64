package org.scalewright.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Labeled;
import javafx.scene.control.TabPane;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.text.Text;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.ScriptedPrompts;
import org.scalewright.app.session.TestSheets;
import org.scalewright.app.table.NoteColumn;
import org.scalewright.archive.Archive;
import org.scalewright.archive.Instrument;
import org.scalewright.archive.Job;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.BreakActivity;
import org.scalewright.model.BreakPlace;
import org.scalewright.model.StringBreak;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The window at an ordinary laptop's 1366×768 (1346×728 inside the frame, as the window opens
 * there), each tab with its tool run on the demo grand: no label, button or table cell on
 * screen is cut short with an ellipsis. The instruments tab is looked at on an archive of its own
 * holding the demo grand with a job and a break. With {@code -Dscalewright.tour=FOLDER} it also saves a
 * picture of each tab there (the pictures the README's window section is checked against).
 */
@ExtendWith(ApplicationExtension.class)
class ScreenFitWindowTest {
    static final double WIDTH = 1346;
    static final double HEIGHT = 728;
    private final ScriptedPrompts prompts = new ScriptedPrompts();
    private WorkstationView view;
    private Stage stage;
    private Path archive;

    @Start
    void start(Stage stage) throws Exception {
        this.stage = stage;
        archive = Files.createTempDirectory("scalewright-screen-fit").resolve("workshop.db");
        try (Archive a = Archive.create(archive)) {
            a.addInstrument(new Instrument("grand-190", "Marrowby & Fenn", "190", "40117", "", "the school hall"));
            a.saveVersion("grand-190", ScaleSheetReader.standard().read(TestSheets.demoGrand()), "as strung",
                    OptionalInt.empty(), LocalDate.of(2026, 11, 2));
            a.logJob("grand-190", new Job(LocalDate.of(2026, 11, 2), "restringing", "treble from key 52, new wire",
                    OptionalDouble.of(440), BuiltInData.astmMinimum().name(), OptionalInt.of(1)));
            a.logBreak("grand-190", new StringBreak(LocalDate.of(2026, 11, 20), 66, OptionalInt.of(2),
                    OptionalDouble.of(1178), BreakActivity.PITCH_RAISE, BreakPlace.SPEAKING_LENGTH, "",
                    "second pass"), OptionalInt.empty());
        }
        System.setProperty("scalewright.archive", archive.toString());
        WorkstationViewModel model = new WorkstationViewModel(new ScaleSession(), prompts);
        view = new WorkstationView(stage, model);
        assertTrue(model.openSheet(TestSheets.demoGrand(), false));
        stage.setWidth(WIDTH);
        stage.setHeight(HEIGHT);
        stage.show();
    }

    @AfterEach
    void forgetTheArchive() throws IOException {
        System.clearProperty("scalewright.archive");
        Files.deleteIfExists(archive);
        Files.deleteIfExists(archive.getParent());
    }

    private void openTab(FxRobot robot, String id) {
        ToolTabsRobot.open(robot, id);
    }

    private void type(FxRobot robot, String id, String text) {
        TextField f = robot.lookup(id).queryAs(TextField.class);
        robot.interact(() -> f.setText(text));
    }

    private void click(FxRobot robot, String id) {
        robot.interact(() -> robot.lookup(id).queryButton().fire());
        WaitForAsyncUtils.waitForFxEvents();
    }

    @Test
    void everyTabFitsAnOrdinaryLaptopScreen(FxRobot robot) throws IOException {
        List<String> clipped = new ArrayList<>();
        // the table with a selected row in the flagged treble group
        robot.interact(() -> view.model().session().selectedKeyProperty().set(66));
        robot.interact(() -> view.table().node().getSelectionModel().select(view.model().table().indexOf(66),
                view.table().tableColumn(NoteColumn.TENSION)));
        robot.interact(() -> robot.lookup("#flags-list").queryListView().getSelectionModel().select(4));
        WaitForAsyncUtils.waitForFxEvents();
        look(robot, "table-selected", clipped);

        openTab(robot, "rescale-tab");
        type(robot, "#rescale-from", "1");
        type(robot, "#rescale-to", "28");
        click(robot, "#rescale-propose");
        look(robot, "rescale-tab", clipped);

        openTab(robot, "wire-check-tab");
        prompts.files.add(Path.of("scales", "wire-makers", "specimen-wire-mill-mm-load-n.csv"));
        click(robot, "#wire-check-load-table");
        type(robot, "#wire-check-flat", "40");
        type(robot, "#wire-check-overpull", "25");
        click(robot, "#wire-check-run");
        robot.interact(() -> {
            TableView<?> t = robot.lookup("#wire-check-table").queryAs(TableView.class);
            t.getSelectionModel().select(1);
            t.requestFocus();
        });
        look(robot, "wirecheck-tab", clipped);

        openTab(robot, "diagnosis-tab");
        type(robot, "#diagnosis-keys", "64-71");
        click(robot, "#diagnosis-run");
        look(robot, "diagnosis-tab", clipped);

        openTab(robot, "stretch-tab");
        look(robot, "stretch-tab", clipped);

        openTab(robot, "exports-tab");
        look(robot, "exports-tab", clipped);

        openTab(robot, "archive-tab");
        look(robot, "archive-versions", clipped);
        ToolTabsRobot.openInner(robot, "archive-jobs-tab");
        look(robot, "archive-jobs", clipped);
        robot.interact(() -> view.model().session().selectedKeyProperty().set(66));
        ToolTabsRobot.openInner(robot, "archive-breaks-tab");
        look(robot, "archive-breaks", clipped);

        robot.interact(() -> view.model().setUnits(WorkstationViewModel.UnitChoice.IMPERIAL));
        openTab(robot, "flags-tab");
        robot.interact(() -> view.table().node().scrollToColumn(view.table().tableColumn(NoteColumn.HEADROOM)));
        look(robot, "imperial-table", clipped);

        // the lengths measured for the string maker, shown from the column chooser
        robot.interact(() -> {
            for (NoteColumn c : List.of(NoteColumn.STRETCHED, NoteColumn.BACK, NoteColumn.WOUND, NoteColumn.BARE_FRONT,
                    NoteColumn.BARE_BACK, NoteColumn.STRIKE)) {
                view.table().tableColumn(c).setVisible(true);
            }
            view.table().node().scrollToColumn(view.table().tableColumn(NoteColumn.METAL));
        });
        look(robot, "measured-lengths", clipped);

        assertEquals(List.of(), clipped, "cut short or illegible at " + WIDTH + "×" + HEIGHT);
    }

    /** Saves a picture when asked and notes every text on screen that is cut short. */
    private void look(FxRobot robot, String name, List<String> clipped) throws IOException {
        WaitForAsyncUtils.waitForFxEvents();
        String folder = System.getProperty("scalewright.tour", "");
        if (!folder.isBlank()) {
            Path out = Path.of(folder).resolve(name + ".png");
            Files.createDirectories(out.getParent());
            javafx.scene.image.WritableImage[] taken = new javafx.scene.image.WritableImage[1];
            robot.interact(() -> taken[0] = view.scene().snapshot(null));
            javax.imageio.ImageIO.write(png(taken[0]), "png", out.toFile());
        }
        robot.interact(() -> collectClipped(stage.getScene().getRoot(), name, clipped));
        robot.interact(() -> collectIllegible(stage.getScene().getRoot(), name, clipped));
    }

    private static final javafx.css.PseudoClass SELECTED = javafx.css.PseudoClass.getPseudoClass("selected");

    /**
     * Notes every selected table or list cell whose text has less contrast with what is behind it
     * than 4.5:1, the least WCAG 2.1 (success criterion 1.4.3, contrast minimum) asks of body text.
     */
    private static void collectIllegible(Node node, String where, List<String> out) {
        if (!node.isVisible()) {
            return;
        }
        if ((node instanceof javafx.scene.control.IndexedCell<?> cell) && !cell.isEmpty() && cell.getText() != null
                && !cell.getText().isBlank() && (node.getPseudoClassStates().contains(SELECTED)
                || cell.getParent() != null && cell.getParent().getPseudoClassStates().contains(SELECTED)
                && cell instanceof javafx.scene.control.TableCell<?, ?>)) {
            javafx.scene.paint.Color text = (javafx.scene.paint.Color) cell.getTextFill();
            javafx.scene.paint.Color behind = background(cell);
            double ratio = contrast(text, behind);
            if (ratio < 4.5) {
                out.add(where + ": selected " + cell.getClass().getSimpleName() + " '" + cell.getText() + "' "
                        + text + " on " + behind + ", contrast " + String.format(java.util.Locale.ROOT, "%.1f", ratio));
            }
        }
        if (node instanceof Parent p) {
            for (Node child : p.getChildrenUnmodifiable()) {
                collectIllegible(child, where, out);
            }
        }
    }

    /** @return the last opaque fill of the node or, when it has none, of the nearest parent that has one */
    private static javafx.scene.paint.Color background(Node n) {
        for (Node at = n; at != null; at = at.getParent()) {
            if (at instanceof javafx.scene.layout.Region r && r.getBackground() != null) {
                var fills = r.getBackground().getFills();
                for (int i = fills.size() - 1; i >= 0; i--) {
                    if (fills.get(i).getFill() instanceof javafx.scene.paint.Color c && c.getOpacity() > 0.9) {
                        return c;
                    }
                }
            }
        }
        return javafx.scene.paint.Color.WHITE;
    }

    /** WCAG 2.1 contrast ratio (relative luminance, sRGB), 1 to 21. */
    static double contrast(javafx.scene.paint.Color a, javafx.scene.paint.Color b) {
        double la = luminance(a);
        double lb = luminance(b);
        return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
    }

    private static double luminance(javafx.scene.paint.Color c) {
        return 0.2126 * channel(c.getRed()) + 0.7152 * channel(c.getGreen()) + 0.0722 * channel(c.getBlue());
    }

    private static double channel(double v) {
        return v <= 0.03928 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
    }

    private static java.awt.image.BufferedImage png(javafx.scene.image.Image image) {
        int w = (int) image.getWidth();
        int h = (int) image.getHeight();
        java.awt.image.BufferedImage out = new java.awt.image.BufferedImage(w, h, java.awt.image.BufferedImage.TYPE_INT_ARGB);
        var reader = image.getPixelReader();
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                out.setRGB(x, y, reader.getArgb(x, y));
            }
        }
        return out;
    }

    private static void collectClipped(Node node, String where, List<String> out) {
        if (!node.isVisible()) {
            return;
        }
        if (node instanceof Labeled l && l.getText() != null && !l.getText().isEmpty() && onScreen(l)) {
            for (Node child : l.getChildrenUnmodifiable()) {
                if (child instanceof Text t && t.getText() != null && !t.getText().equals(l.getText())
                        && t.getText().contains(l.getEllipsisString()) && !l.getText().contains(l.getEllipsisString())) {
                    out.add(where + ": " + l.getClass().getSimpleName() + (l.getId() == null ? "" : " #" + l.getId())
                            + " '" + l.getText() + "' shown as '" + t.getText() + "'");
                }
            }
        }
        if (node instanceof Parent p) {
            for (Node child : p.getChildrenUnmodifiable()) {
                collectClipped(child, where, out);
            }
        }
    }

    /** @return true when the label lies inside the window and its table row (if any) is a filled one */
    private static boolean onScreen(Labeled l) {
        var b = l.localToScene(l.getBoundsInLocal());
        return b.getMaxX() > 0 && b.getMinX() < WIDTH && b.getMaxY() > 0 && b.getMinY() < HEIGHT && b.getWidth() > 0;
    }
}
