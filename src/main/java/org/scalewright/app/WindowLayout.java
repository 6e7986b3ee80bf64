package org.scalewright.app;

import javafx.geometry.Rectangle2D;
import javafx.scene.control.SplitPane;
import javafx.stage.Stage;
import org.scalewright.app.session.DeskSettings;

/** The window's size and divider positions, taken from the settings at start and kept at close. */
final class WindowLayout {
    static final double WIDTH = 1560;
    static final double HEIGHT = 960;
    private final DeskSettings settings;

    WindowLayout(DeskSettings settings) {
        this.settings = settings;
    }

    /** @return the window size to start with: as remembered, else the default, within the screen */
    double[] startSize(Rectangle2D screen) {
        double[] wanted = settings.windowSize().orElse(new double[] {WIDTH, HEIGHT});
        return new double[] {Math.min(wanted[0], screen.getWidth() - 20), Math.min(wanted[1], screen.getHeight() - 40)};
    }

    /** Puts the remembered divider positions on {@code pane}, named {@code which}. */
    void restore(String which, SplitPane pane) {
        settings.dividers(which).filter(d -> d.length == pane.getDividers().size())
                .ifPresent(pane::setDividerPositions);
    }

    /**
     * Keeps the window size and the dividers of the named panes, and writes every setting of the
     * session out (the settings are not written at each change; this is called at close).
     */
    void keep(Stage stage, String[] names, SplitPane... panes) {
        if (stage.getScene() != null && !stage.isMaximized() && !stage.isFullScreen()) {
            settings.windowSize(stage.getScene().getWidth(), stage.getScene().getHeight());
        }
        for (int i = 0; i < panes.length; i++) {
            settings.dividers(names[i], panes[i].getDividerPositions());
        }
        settings.flush();
    }
}
