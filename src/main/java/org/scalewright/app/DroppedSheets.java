package org.scalewright.app;

import java.io.File;
import java.nio.file.Path;
import java.util.List;
import javafx.application.Platform;
import javafx.scene.Scene;
import javafx.scene.input.DragEvent;
import javafx.scene.input.TransferMode;
import org.scalewright.app.session.CsvFileNames;

/** Opens a scale sheet dropped onto the window (after the unsaved-changes question). */
final class DroppedSheets {
    private DroppedSheets() {
    }

    static void install(Scene scene, WorkstationViewModel model) {
        scene.addEventHandler(DragEvent.DRAG_OVER, e -> {
            if (e.getDragboard().hasFiles() && files(e).stream().anyMatch(CsvFileNames::isCsv)) {
                e.acceptTransferModes(TransferMode.COPY);
                e.consume();
            }
        });
        scene.addEventHandler(DragEvent.DRAG_DROPPED, e -> {
            if (!e.getDragboard().hasFiles()) {
                return;
            }
            List<Path> dropped = files(e);
            e.setDropCompleted(true);
            e.consume();
            // after the drop has ended, so the unsaved-changes question is not asked inside it
            Platform.runLater(() -> model.openDropped(dropped));
        });
    }

    private static List<Path> files(DragEvent e) {
        return e.getDragboard().getFiles().stream().map(File::toPath).toList();
    }
}
