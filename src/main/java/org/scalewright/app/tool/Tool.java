package org.scalewright.app.tool;

import java.util.function.Supplier;
import javafx.scene.Node;

/**
 * One tool of the workstation: a titled tab whose panel is built when the tab is first chosen,
 * so that the window opens without laying out panels nobody has opened yet.
 *
 * @param title the tab's title
 * @param id    the tab's id, for tests and styling
 * @param panel builds the tool's panel over its view model (called once, on the JavaFX thread)
 */
public record Tool(String title, String id, Supplier<Node> panel) {
}
