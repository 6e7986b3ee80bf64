package org.scalewright.app.session;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import javafx.application.Platform;
import javafx.scene.control.Alert;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Label;
import javafx.scene.control.TextArea;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Stage;

/** The window's dialogs and file choosers. */
public final class FxPrompts implements UserPrompts {
    private static File lastDirectory;
    private final Stage owner;
    private final DeskSettings settings;

    public FxPrompts(Stage owner) {
        this(owner, null);
    }

    /** Dialogs whose file choosers start in the folder remembered in {@code settings} and remember the one used. */
    public FxPrompts(Stage owner, DeskSettings settings) {
        this.owner = owner;
        this.settings = settings;
        if (settings != null && lastDirectory == null) {
            settings.lastFolder().map(Path::toFile).filter(File::isDirectory).ifPresent(d -> lastDirectory = d);
        }
    }

    @Override
    public boolean confirm(String title, String question, String yesWords) {
        ButtonType yes = new ButtonType(yesWords, ButtonBar.ButtonData.YES);
        ButtonType cancel = new ButtonType("Cancel", ButtonBar.ButtonData.CANCEL_CLOSE);
        Alert a = new Alert(Alert.AlertType.CONFIRMATION, question, yes, cancel);
        a.initOwner(owner);
        a.setTitle(title);
        a.setHeaderText(title);
        return a.showAndWait().orElse(cancel) == yes;
    }

    @Override
    public void showInformation(String title, String header, String message) {
        Alert a = new Alert(Alert.AlertType.INFORMATION);
        a.initOwner(owner);
        a.setTitle(title);
        a.setHeaderText(header);
        TextArea text = new TextArea(message);
        text.setEditable(false);
        text.setWrapText(true);
        text.setPrefRowCount(Math.min(14, (int) message.lines().count() + 2));
        text.setPrefColumnCount(64);
        a.getDialogPane().setContent(text);
        a.showAndWait();
    }

    @Override
    public SaveChoice askToSave(String documentName) {
        ButtonType save = new ButtonType("Save", ButtonBar.ButtonData.YES);
        ButtonType discard = new ButtonType("Don't save", ButtonBar.ButtonData.NO);
        ButtonType cancel = new ButtonType("Cancel", ButtonBar.ButtonData.CANCEL_CLOSE);
        Alert a = new Alert(Alert.AlertType.CONFIRMATION, "", save, discard, cancel);
        a.initOwner(owner);
        a.setTitle("Unsaved changes");
        a.setHeaderText("Save the changes to " + documentName + "?");
        a.setContentText("The scale has edits that are not in a file yet.");
        ButtonType answer = a.showAndWait().orElse(cancel);
        return answer == save ? SaveChoice.SAVE : answer == discard ? SaveChoice.DISCARD : SaveChoice.CANCEL;
    }

    @Override
    public Optional<Path> chooseSheetToOpen(String title) {
        FileChooser c = chooser(title);
        c.getExtensionFilters().addAll(new FileChooser.ExtensionFilter("Sheets (*.csv, *.xlsx)", "*.csv", "*.xlsx", "*.txt"),
                new FileChooser.ExtensionFilter("All files", "*"));
        return remember(c.showOpenDialog(owner));
    }

    @Override
    public Optional<Path> chooseSheetToSave(String suggestedName) {
        FileChooser c = chooser("Save scale sheet");
        c.setInitialFileName(suggestedName);
        c.getExtensionFilters().add(new FileChooser.ExtensionFilter("Scale sheets (*.csv)", "*.csv"));
        return remember(c.showSaveDialog(owner));
    }

    @Override
    public Optional<Path> chooseStrengthTable() {
        FileChooser c = chooser("Open a wire maker's strength table");
        c.getExtensionFilters().addAll(new FileChooser.ExtensionFilter("Strength tables (*.csv)", "*.csv"),
                new FileChooser.ExtensionFilter("All files", "*"));
        return remember(c.showOpenDialog(owner));
    }

    @Override
    public Optional<Path> choosePitchStateFile() {
        FileChooser c = chooser("Open the cents flat per note (key, cents_flat)");
        c.getExtensionFilters().addAll(new FileChooser.ExtensionFilter("CSV files (*.csv)", "*.csv"),
                new FileChooser.ExtensionFilter("All files", "*"));
        return remember(c.showOpenDialog(owner));
    }

    @Override
    public Optional<Path> chooseArchiveFile() {
        FileChooser c = chooser("Choose the workshop archive");
        c.getExtensionFilters().addAll(new FileChooser.ExtensionFilter("Workshop archives (*.db)", "*.db"),
                new FileChooser.ExtensionFilter("All files", "*"));
        return remember(c.showOpenDialog(owner));
    }

    @Override
    public void showProblems(String title, String intro, List<String> problems) {
        if (!owner.isShowing()) {
            Platform.runLater(() -> showProblems(title, intro, problems));
            return;
        }
        Alert a = new Alert(Alert.AlertType.ERROR);
        a.initOwner(owner);
        a.setTitle(title);
        a.setHeaderText(intro);
        TextArea list = new TextArea(String.join("\n", problems));
        list.setEditable(false);
        list.setWrapText(true);
        list.setPrefRowCount(Math.min(16, problems.size() + 3));
        list.setPrefColumnCount(70);
        a.getDialogPane().setContent(new VBox(6, new Label(problems.size() + (problems.size() == 1 ? " problem:"
                : " problems:")), list));
        a.showAndWait();
    }

    @Override
    public void showError(String title, String message) {
        Alert a = new Alert(Alert.AlertType.ERROR);
        a.initOwner(owner);
        a.setTitle(title);
        a.setHeaderText(title);
        a.setContentText(message);
        a.showAndWait();
    }

    @Override
    public void showCautions(List<String> cautions) {
        Alert a = new Alert(Alert.AlertType.WARNING);
        a.initOwner(owner);
        a.setTitle("Safety cautions");
        a.setHeaderText("Before raising pitch or bringing strings up");
        VBox box = new VBox(8);
        for (String c : cautions) {
            Label l = new Label(c);
            l.setWrapText(true);
            l.setPrefWidth(520);
            box.getChildren().add(l);
        }
        a.getDialogPane().setContent(box);
        a.showAndWait();
    }

    /** Shows the keys of the table and the window. */
    public void showKeyboardHelp() {
        Alert a = new Alert(Alert.AlertType.INFORMATION);
        a.initOwner(owner);
        a.setTitle("Keyboard");
        a.setHeaderText("Editing the note table");
        a.setContentText(String.join("\n",
                "Arrow keys: move between cells",
                "Type: start editing the cell with what you type",
                "Enter or F2: edit the cell; while editing, Enter keeps the entry and moves down",
                "Tab / Shift+Tab: keep the entry and move right / left",
                "Escape: drop the entry",
                "Delete: clear an optional cell (wrap 2, section, remark; wrap 1 makes a plain string)",
                "Wire: a size number (12 to 23, half sizes) or a diameter; '1.1 mm' or '0.043 in' name their unit",
                "",
                "Ctrl+Z undo, Ctrl+Y redo, Ctrl+S save, Ctrl+Shift+S save as, Ctrl+O open"));
        a.showAndWait();
    }

    @Override
    public Optional<Path> chooseExportFile(String title, String suggestedName, String extension) {
        FileChooser c = chooser(title);
        c.setInitialFileName(suggestedName);
        String ext = extension.toLowerCase(java.util.Locale.ROOT);
        c.getExtensionFilters().add(new FileChooser.ExtensionFilter(ext.toUpperCase(java.util.Locale.ROOT)
                + " files (*." + ext + ")", "*." + ext));
        if (ext.equals("csv")) {
            // a table can be written as a workbook too (io.TableFiles chooses by the name)
            c.getExtensionFilters().add(new FileChooser.ExtensionFilter("Excel workbooks (*.xlsx)", "*.xlsx"));
        }
        return remember(c.showSaveDialog(owner));
    }

    @Override
    public Optional<Path> chooseExportFolder(String title) {
        javafx.stage.DirectoryChooser c = new javafx.stage.DirectoryChooser();
        c.setTitle(title);
        File dir = lastDirectory != null ? lastDirectory : new File(System.getProperty("user.dir"));
        if (dir.isDirectory()) {
            c.setInitialDirectory(dir);
        }
        File chosen = c.showDialog(owner);
        if (chosen == null) {
            return Optional.empty();
        }
        keep(chosen);
        return Optional.of(chosen.toPath());
    }

    private static FileChooser chooser(String title) {
        FileChooser c = new FileChooser();
        c.setTitle(title);
        File dir = lastDirectory != null ? lastDirectory : new File(System.getProperty("user.dir"));
        if (dir.isDirectory()) {
            c.setInitialDirectory(dir);
        }
        return c;
    }

    private Optional<Path> remember(File f) {
        if (f == null) {
            return Optional.empty();
        }
        Path p = f.toPath();
        if (p.getParent() != null && Files.isDirectory(p.getParent())) {
            keep(p.getParent().toFile());
        }
        return Optional.of(p);
    }

    private void keep(File folder) {
        lastDirectory = folder;
        if (settings != null) {
            settings.lastFolder(folder.toPath());
        }
    }
}
