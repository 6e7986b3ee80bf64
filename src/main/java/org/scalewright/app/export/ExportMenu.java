package org.scalewright.app.export;

import java.util.Locale;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuItem;
import javafx.scene.control.SeparatorMenuItem;

/** The File ▸ Export submenu: the same exports as the Exports tab, through the same view model. */
public final class ExportMenu {
    private ExportMenu() {
    }

    public static Menu build(ExportViewModel model) {
        Menu menu = new Menu("Export");
        menu.setId("menu-export");
        MenuItem report = new MenuItem("Whole report into a folder…");
        report.setId("menu-export-report");
        report.setOnAction(e -> model.exportReportInBackground());
        report.disableProperty().bind(model.busyProperty());
        menu.getItems().addAll(report, new SeparatorMenuItem());
        ExportContent before = null;
        for (ExportPiece p : ExportPiece.all()) {
            if (before != null && before.isChart() != p.content().isChart()) {
                menu.getItems().add(new SeparatorMenuItem());
            }
            MenuItem m = new MenuItem(p.title() + " (" + p.format().extension().toUpperCase(Locale.ROOT) + ")…");
            m.setId("menu-export-" + p.id());
            m.setOnAction(e -> model.export(p));
            menu.getItems().add(m);
            before = p.content();
        }
        return menu;
    }
}
