package org.scalewright.app.table;

import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.Tooltip;
import javafx.scene.input.KeyCode;

/** The flags list: every flag of the working scale; clicking one (or Enter) selects its note. */
public final class FlagsView {
    private final ListView<FlagsViewModel.Item> list = new ListView<>();

    public FlagsView(FlagsViewModel model) {
        list.setId("flags-list");
        list.getStyleClass().add("flags-list");
        list.setItems(model.items());
        list.setPlaceholder(new Label("No flags: every note is inside the stress bands, with no large "
                + "tension step, no plain size out of order and no implausible value."));
        list.setCellFactory(v -> new ListCell<>() {
            private final Tooltip tip = new Tooltip();

            @Override
            protected void updateItem(FlagsViewModel.Item item, boolean empty) {
                super.updateItem(item, empty);
                getStyleClass().removeAll("flag-danger", "flag-caution");
                if (empty || item == null) {
                    setText(null);
                    setTooltip(null);
                    return;
                }
                setText(item.key() + " " + item.noteName() + "  " + item.kind() + " — " + item.detail());
                tip.setText(item.detail());
                setTooltip(tip);
                switch (item.severity()) {
                    case DANGER -> getStyleClass().add("flag-danger");
                    case CAUTION -> getStyleClass().add("flag-caution");
                    case NOTICE -> { }
                }
            }
        });
        list.setOnMouseClicked(e -> model.jumpTo(list.getSelectionModel().getSelectedItem()));
        list.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.ENTER || e.getCode() == KeyCode.SPACE) {
                model.jumpTo(list.getSelectionModel().getSelectedItem());
            }
        });
    }

    public ListView<FlagsViewModel.Item> node() {
        return list;
    }
}
