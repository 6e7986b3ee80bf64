package org.scalewright.app;

import java.nio.file.Files;
import java.nio.file.Path;
import javafx.collections.ListChangeListener;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuItem;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import org.scalewright.app.export.ExportMenu;
import org.scalewright.io.SheetTemplate;

/**
 * The File menu: new sheet from a template, open, open recent, close, revert, save, save as,
 * the exports and quit.
 */
final class FileMenu {
    private FileMenu() {
    }

    /**
     * @param model the window's commands
     * @param quit  closes the window when the unsaved changes are settled
     */
    static Menu build(WorkstationViewModel model, Runnable quit) {
        Menu fresh = new Menu("New from template");
        fresh.setId("menu-new");
        for (SheetTemplate t : SheetTemplate.values()) {
            fresh.getItems().add(item(t.title() + " (blank sheet)…", "menu-new-" + t.name().toLowerCase(java.util.Locale.ROOT),
                    null, () -> model.newSheet(t)));
        }
        MenuItem open = item("Open sheet…", "menu-open", shortcut(KeyCode.O), model::open);
        Menu recent = new Menu("Open recent");
        recent.setId("menu-recent");
        Runnable fill = () -> fillRecent(recent, model);
        model.recentFiles().addListener((ListChangeListener<Path>) c -> fill.run());
        recent.setOnShowing(e -> fill.run()); // marks files gone since the list was made
        fill.run();
        MenuItem close = item("Close sheet", "menu-close", shortcut(KeyCode.W), model::close);
        MenuItem revert = item("Revert to saved…", "menu-revert", null, model::revert);
        revert.disableProperty().bind(model.session().dirtyProperty().not());
        MenuItem save = item("Save", "menu-save", shortcut(KeyCode.S), model::save);
        MenuItem saveAs = item("Save as…", "menu-save-as", new KeyCodeCombination(KeyCode.S,
                KeyCombination.SHORTCUT_DOWN, KeyCombination.SHIFT_DOWN), model::saveAs);
        MenuItem exit = item("Quit", "menu-quit", shortcut(KeyCode.Q), quit);
        return new Menu("File", null, fresh, open, recent, new SeparatorMenuItem(), save, saveAs, revert, close,
                new SeparatorMenuItem(), ExportMenu.build(model.exports()), new SeparatorMenuItem(), exit);
    }

    private static void fillRecent(Menu recent, WorkstationViewModel model) {
        recent.getItems().clear();
        int n = 0;
        for (Path p : model.recentFiles()) {
            n++;
            boolean there = Files.isRegularFile(p);
            String label = (n < 10 ? "_" + n + "  " : "    ") + p.getFileName() + "  —  "
                    + (p.getParent() == null ? "" : p.getParent().toString()) + (there ? "" : "  (not found)");
            MenuItem m = new MenuItem(label);
            m.setMnemonicParsing(true);
            m.setId("menu-recent-" + n);
            m.setOnAction(e -> model.openRecent(p));
            recent.getItems().add(m);
        }
        if (n == 0) {
            MenuItem none = new MenuItem("(no sheets opened yet)");
            none.setDisable(true);
            recent.getItems().add(none);
        } else {
            recent.getItems().addAll(new SeparatorMenuItem(),
                    item("Clear the list", "menu-recent-clear", null, model::clearRecentFiles));
        }
    }

    private static KeyCombination shortcut(KeyCode k) {
        return new KeyCodeCombination(k, KeyCombination.SHORTCUT_DOWN);
    }

    static MenuItem item(String text, String id, KeyCombination keys, Runnable action) {
        MenuItem m = new MenuItem(text);
        m.setId(id);
        if (keys != null) {
            m.setAccelerator(keys);
        }
        m.setOnAction(e -> action.run());
        return m;
    }
}
