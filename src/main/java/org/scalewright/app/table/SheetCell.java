package org.scalewright.app.table;

import javafx.scene.control.TableCell;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TablePosition;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;

/**
 * A table cell that edits like a spreadsheet cell: a text field while editing; Enter commits
 * and moves down, Tab commits and moves right (Shift+Tab left), Escape cancels, leaving the
 * cell commits. The text a cell starts editing with can be set by the table (the key typed
 * to start the edit).
 */
final class SheetCell extends TableCell<NoteRow, String> {
    /** Table property holding the text an edit started by typing begins with. */
    static final String START_TEXT = "scalewright.startText";

    private TextField field;

    @Override
    public void startEdit() {
        if (!isEditable() || !getTableView().isEditable() || !getTableColumn().isEditable()) {
            return;
        }
        super.startEdit();
        if (!isEditing()) {
            return;
        }
        if (field == null) {
            field = new TextField();
            field.getStyleClass().add("sheet-editor");
            field.addEventFilter(KeyEvent.KEY_PRESSED, this::onKey);
            field.focusedProperty().addListener((o, was, is) -> {
                if (!is && isEditing()) {
                    commitEdit(field.getText());
                }
            });
        }
        Object start = getTableView().getProperties().remove(START_TEXT);
        field.setText(start != null ? start.toString() : getItem() == null ? "" : getItem());
        setText(null);
        setGraphic(field);
        field.requestFocus();
        if (start != null) {
            field.end();
        } else {
            field.selectAll();
        }
    }

    private void onKey(KeyEvent e) {
        TableView<NoteRow> table = getTableView();
        if (e.getCode() == KeyCode.ENTER) {
            commitEdit(field.getText());
            table.getSelectionModel().selectBelowCell();
            table.requestFocus();
            e.consume();
        } else if (e.getCode() == KeyCode.TAB) {
            commitEdit(field.getText());
            if (e.isShiftDown()) {
                table.getSelectionModel().selectLeftCell();
            } else {
                table.getSelectionModel().selectRightCell();
            }
            table.requestFocus();
            e.consume();
        } else if (e.getCode() == KeyCode.ESCAPE) {
            cancelEdit();
            table.requestFocus();
            e.consume();
        }
    }

    @Override
    public void commitEdit(String value) {
        if (!isEditing()) {
            return;
        }
        // TableCell.commitEdit fires the column's commit handler; the view model then
        // updates the row, which redraws this cell with the new value
        super.commitEdit(value);
        // a refused entry changes nothing in the row, so nothing redraws the cell, which would
        // keep showing the typed text while the figures use the old value: show what the row holds
        if (getIndex() >= 0 && getTableColumn() != null) {
            String held = getTableColumn().getCellData(getIndex());
            if (!java.util.Objects.equals(held, getText())) {
                updateItem(held, held == null);
            }
        }
    }

    @Override
    public void cancelEdit() {
        super.cancelEdit();
        setText(getItem());
        setGraphic(null);
    }

    @Override
    protected void updateItem(String item, boolean empty) {
        super.updateItem(item, empty);
        if (empty) {
            setText(null);
            setGraphic(null);
        } else if (isEditing() && field != null) {
            setText(null);
            setGraphic(field);
        } else {
            setText(item);
            setGraphic(null);
        }
    }

    /** @return the position of the cell the table's focus is on, or null */
    static TablePosition<NoteRow, ?> focused(TableView<NoteRow> table) {
        TablePosition<NoteRow, ?> p = table.getFocusModel().getFocusedCell();
        return p == null || p.getRow() < 0 || p.getTableColumn() == null ? null : p;
    }

    /** @return true when the column may be edited */
    static boolean editable(TableColumn<NoteRow, ?> c) {
        return c != null && c.isEditable();
    }
}
