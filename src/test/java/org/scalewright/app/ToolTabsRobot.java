package org.scalewright.app;

import javafx.scene.control.TabPane;
import org.testfx.api.FxRobot;
import org.testfx.util.WaitForAsyncUtils;

/** The window tests' way to a tool: its tab chosen by id, as a click on the tab would. */
final class ToolTabsRobot {
    private ToolTabsRobot() {
    }

    /** Chooses the tool tab with {@code id} ({@code rescale-tab}, {@code archive-tab} …) and waits for it to show. */
    static void open(FxRobot robot, String id) {
        TabPane tabs = robot.lookup("#tool-tabs").queryAs(TabPane.class);
        robot.interact(() -> tabs.getSelectionModel().select(tabs.getTabs().stream()
                .filter(t -> id.equals(t.getId())).findFirst().orElseThrow()));
        WaitForAsyncUtils.waitForFxEvents();
    }

    /** Chooses the tab with {@code id} in whichever tab pane holds it (a tool's own inner tabs) and waits. */
    static void openInner(FxRobot robot, String id) {
        TabPane pane = robot.lookup(n -> n instanceof TabPane t && t.getTabs().stream()
                .anyMatch(tab -> id.equals(tab.getId()))).queryAs(TabPane.class);
        robot.interact(() -> pane.getSelectionModel().select(pane.getTabs().stream()
                .filter(t -> id.equals(t.getId())).findFirst().orElseThrow()));
        WaitForAsyncUtils.waitForFxEvents();
    }
}
