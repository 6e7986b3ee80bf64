package org.scalewright.app.tool;

import java.util.function.Function;
import java.util.function.Predicate;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableRow;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.scene.layout.HBox;

/**
 * Small layout pieces shared by the wire check and diagnosis panels: labelled entry fields,
 * result columns, row marks, and a result table whose row choice selects the key.
 */
public final class ToolLayout {
    private ToolLayout() {
    }

    /** @return a label and a node side by side */
    public static HBox field(String label, Node... nodes) {
        Label l = new Label(label);
        l.getStyleClass().add("tool-label");
        HBox box = new HBox(4, l);
        box.getChildren().addAll(nodes);
        box.setAlignment(Pos.CENTER_LEFT);
        return box;
    }

    /** @return a narrow text field bound both ways to {@code property} */
    public static TextField entry(String id, javafx.beans.property.StringProperty property, int columns, Runnable onEnter) {
        TextField t = new TextField();
        t.setId(id);
        t.setPrefColumnCount(columns);
        t.textProperty().bindBidirectional(property);
        t.setOnAction(e -> onEnter.run());
        return t;
    }

    /** @return a text column; numbers are right-aligned */
    public static <R> TableColumn<R, String> column(String title, double width, boolean number, Function<R, String> text) {
        TableColumn<R, String> c = new TableColumn<>(title);
        c.setCellValueFactory(cd -> new ReadOnlyStringWrapper(text.apply(cd.getValue())));
        c.setPrefWidth(width);
        c.setSortable(false);
        if (number) {
            c.getStyleClass().add("number-cell");
        }
        return c;
    }

    /**
     * Gives a result table the look of the note table (danger and caution rows tinted) and makes a
     * click or Enter on a row select its key in the session.
     */
    public static <R> void results(TableView<R> table, Predicate<R> danger, Predicate<R> caution,
                            java.util.function.Consumer<R> select) {
        table.getStyleClass().add("note-table");
        table.setFixedCellSize(22);
        org.scalewright.app.session.ColumnFit.keepFitted(table, 12, 12);
        table.setColumnResizePolicy(TableView.UNCONSTRAINED_RESIZE_POLICY);
        table.setRowFactory(v -> new TableRow<>() {
            @Override
            protected void updateItem(R item, boolean empty) {
                super.updateItem(item, empty);
                getStyleClass().removeAll("flag-danger", "flag-caution");
                if (!empty && item != null) {
                    if (danger.test(item)) {
                        getStyleClass().add("flag-danger");
                    } else if (caution.test(item)) {
                        getStyleClass().add("flag-caution");
                    }
                }
            }
        });
        table.setOnMouseClicked(e -> select.accept(table.getSelectionModel().getSelectedItem()));
        table.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.ENTER || e.getCode() == KeyCode.SPACE) {
                select.accept(table.getSelectionModel().getSelectedItem());
            }
        });
    }

    /** @return a wrapping label for a paragraph of results */
    public static Label paragraph(String id) {
        Label l = new Label();
        l.setId(id);
        l.setWrapText(true);
        l.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        l.setMaxWidth(Double.MAX_VALUE);
        return l;
    }

    public static Insets padding() {
        return new Insets(4, 6, 4, 6);
    }
}
