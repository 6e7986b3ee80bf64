package org.scalewright.app.tool;

/** One tool of the workstation: a titled part of the window. */
public interface Tool {
    /** @return the tab's title */
    String title();

    /** @return the tab's id, for tests and styling */
    String id();

    /** @return the tool's view */
    javafx.scene.Node node();
}
