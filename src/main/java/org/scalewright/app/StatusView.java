package org.scalewright.app;

import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Label;
import javafx.scene.control.ToggleButton;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

/** The status line: totals and flag count, the last message, section totals on demand. */
final class StatusView {
    private final VBox box = new VBox(2);

    StatusView(StatusViewModel model) {
        box.getStyleClass().add("status-line");
        box.setPadding(new Insets(3, 8, 3, 8));
        Label totals = new Label();
        totals.setId("status-totals");
        totals.textProperty().bind(model.totalsProperty());
        Label message = new Label();
        message.setId("status-message");
        message.textProperty().bind(model.messageProperty());
        model.messageIsProblemProperty().addListener((o, a, problem) -> {
            message.getStyleClass().remove("problem");
            if (problem) {
                message.getStyleClass().add("problem");
            }
        });
        // a message that does not fit beside the totals goes onto a line of its own below them
        // (and wraps only when longer than the whole window is wide), never cut short
        message.setWrapText(true);
        message.setMinHeight(Region.USE_PREF_SIZE);
        message.setAlignment(Pos.CENTER_LEFT);
        ToggleButton sectionsButton = new ToggleButton("Section totals");
        sectionsButton.setId("status-sections-button");
        sectionsButton.setFocusTraversable(false);
        sectionsButton.setMinWidth(Region.USE_PREF_SIZE);
        totals.setMinWidth(Region.USE_PREF_SIZE);
        sectionsButton.selectedProperty().bindBidirectional(model.showSectionsProperty());
        HBox totalsRow = new HBox(8, sectionsButton, totals);
        totalsRow.setAlignment(Pos.CENTER_LEFT);
        totalsRow.setMinWidth(Region.USE_PREF_SIZE);
        FlowPane first = new FlowPane(20, 2, totalsRow, message);
        first.setAlignment(Pos.CENTER_LEFT);
        message.maxWidthProperty().bind(first.widthProperty().subtract(4));
        Label sections = new Label();
        sections.setId("status-sections");
        sections.textProperty().bind(model.sectionsProperty());
        sections.visibleProperty().bind(model.showSectionsProperty());
        sections.managedProperty().bind(model.showSectionsProperty());
        sections.setWrapText(true);
        box.getChildren().addAll(first, sections);
    }

    VBox node() {
        return box;
    }
}
