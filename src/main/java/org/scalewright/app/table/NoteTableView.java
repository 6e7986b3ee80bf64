package org.scalewright.app.table;

import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import javafx.beans.binding.Bindings;
import javafx.beans.value.ChangeListener;
import javafx.scene.control.Label;
import javafx.scene.control.SelectionMode;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TablePosition;
import javafx.scene.control.TableRow;
import javafx.scene.control.TableView;
import javafx.scene.control.Tooltip;
import javafx.scene.input.Clipboard;
import javafx.scene.input.ClipboardContent;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import javafx.scene.input.KeyEvent;
import javafx.scene.input.MouseEvent;
import org.scalewright.app.session.ColumnFit;
import org.scalewright.physics.FlagKind;

/**
 * The note table: one row per note, the specification columns editable like a spreadsheet
 * (type to start, Enter / Tab to commit and move, Escape to cancel, Delete to clear an
 * optional cell), computed columns read-only, flagged rows marked, reference differences
 * shown on demand. It binds to a {@link NoteTableViewModel}; it computes nothing itself.
 */
public final class NoteTableView {
    private final NoteTableViewModel model;
    private final TableView<NoteRow> table = new TableView<>();
    private final Map<NoteColumn, TableColumn<NoteRow, String>> columns = new EnumMap<>(NoteColumn.class);
    private boolean syncing;

    public NoteTableView(NoteTableViewModel model) {
        this.model = model;
        table.setId("note-table");
        table.getStyleClass().add("note-table");
        table.setItems(model.rows());
        table.setEditable(true);
        table.getSelectionModel().setCellSelectionEnabled(true);
        // blocks of cells are chosen with Shift or the mouse, for the clipboard
        table.getSelectionModel().setSelectionMode(SelectionMode.MULTIPLE);
        table.setPlaceholder(new Label("No sheet open: File > Open… (Ctrl+O)"));
        table.setTableMenuButtonVisible(true);
        table.setFixedCellSize(22); // every row one line: no per-row height measuring
        for (NoteColumn c : NoteColumn.values()) {
            table.getColumns().add(column(c));
        }
        for (NoteColumn c : NoteColumn.values()) {
            if (c.group() == NoteColumn.Group.DIFFERENCE) {
                columns.get(c).visibleProperty().bind(model.showDifferencesProperty());
            }
        }
        // the remark and the lengths measured for the string maker are shown from the table's
        // column menu (the + at the top right)
        for (NoteColumn c : NoteColumn.values()) {
            if (c.shownWhenChosen()) {
                columns.get(c).visibleProperty().bindBidirectional(model.shownProperty(c));
            }
        }
        table.setRowFactory(t -> new FlaggedRow());
        table.addEventFilter(KeyEvent.KEY_PRESSED, this::onKeyPressed);
        table.addEventHandler(KeyEvent.KEY_TYPED, this::onKeyTyped);
        model.unitsProperty().addListener((o, a, b) -> {
            table.refresh();
            ColumnFit.fit(table, 12, 11);
        });
        ColumnFit.keepFitted(table, 12, 11);
        table.getSelectionModel().selectedIndexProperty().addListener((o, a, b) -> selectionChanged());
        model.selectedKeyProperty().addListener((o, a, b) -> selectKey(b));
    }

    public TableView<NoteRow> node() {
        return table;
    }

    /** @return the table column showing {@code c} (for tests and the view's layout) */
    public TableColumn<NoteRow, String> tableColumn(NoteColumn c) {
        return columns.get(c);
    }

    private TableColumn<NoteRow, String> column(NoteColumn c) {
        TableColumn<NoteRow, String> col = new TableColumn<>();
        Label header = new Label();
        header.getStyleClass().add("column-title");
        header.textProperty().bind(model.header(c));
        // the column's own text names it in the column chooser (the + at the top right); the
        // header shows the two-line label instead (workstation.css)
        col.textProperty().bind(Bindings.createStringBinding(() -> c.chooserName(model.header(c).get()),
                model.header(c)));
        // the explanation is made into a tooltip when the pointer first comes over the header:
        // a tooltip for every column at start costs the window tens of milliseconds to open
        header.addEventHandler(MouseEvent.MOUSE_ENTERED, e -> {
            if (header.getTooltip() == null) {
                header.setTooltip(new Tooltip(c.explanation()));
            }
        });
        col.setGraphic(header);
        col.setId("col-" + c.name().toLowerCase(java.util.Locale.ROOT));
        col.setUserData(c);
        col.setSortable(false);
        col.setReorderable(false);
        col.setEditable(c.editable());
        col.setCellValueFactory(f -> {
            NoteRow row = f.getValue();
            return Bindings.createStringBinding(() -> model.text(row, c), row.stateProperty());
        });
        col.setCellFactory(x -> {
            SheetCell cell = new SheetCell();
            cell.getStyleClass().add(c.editable() ? "editable-cell" : "computed-cell");
            if (c.group() == NoteColumn.Group.COMPUTED || c.group() == NoteColumn.Group.DIFFERENCE
                    || c == NoteColumn.STRINGS || c == NoteColumn.KEY) {
                cell.getStyleClass().add("number-cell");
            }
            return cell;
        });
        col.setOnEditCommit(e -> model.edit(e.getRowValue().key(), c, e.getNewValue()));
        col.setPrefWidth(width(c));
        columns.put(c, col);
        return col;
    }

    private static double width(NoteColumn c) {
        return switch (c) {
            case KEY -> 36;
            case NOTE -> 40;
            case STRINGS -> 46;
            case SECTION -> 56;
            case LENGTH, PITCH -> 56;
            case WIRE -> 62;
            case WRAP1, WRAP2, OD, OD1 -> 48;
            case METAL -> 54;
            case STRETCHED, BACK, WOUND, BARE_FRONT, BARE_BACK, STRIKE -> 60;
            case TENSION, NOTE_TENSION -> 58;
            case STRESS, BREAK_PCT -> 50;
            case INHARMONICITY -> 62;
            case HEADROOM -> 70;
            case FLAGS -> 210;
            case DIFF_TENSION, DIFF_BREAK, DIFF_B -> 66;
            case REMARK -> 200;
        };
    }

    private void onKeyPressed(KeyEvent e) {
        if (table.getEditingCell() != null) {
            return;
        }
        if (COPY.match(e) || PASTE.match(e)) {
            if (COPY.match(e)) {
                copyBlock();
            } else {
                pasteBlock();
            }
            e.consume();
            return;
        }
        TablePosition<NoteRow, ?> p = SheetCell.focused(table);
        if (p == null) {
            return;
        }
        if ((e.getCode() == KeyCode.ENTER || e.getCode() == KeyCode.F2) && SheetCell.editable(p.getTableColumn())) {
            table.edit(p.getRow(), castColumn(p));
            e.consume();
        } else if ((e.getCode() == KeyCode.DELETE || e.getCode() == KeyCode.BACK_SPACE)
                && SheetCell.editable(p.getTableColumn())) {
            NoteColumn c = (NoteColumn) p.getTableColumn().getUserData();
            model.edit(table.getItems().get(p.getRow()).key(), c, "");
            e.consume();
        } else if (e.getCode() == KeyCode.TAB) {
            if (e.isShiftDown()) {
                table.getSelectionModel().selectLeftCell();
            } else {
                table.getSelectionModel().selectRightCell();
            }
            e.consume();
        }
    }

    private void onKeyTyped(KeyEvent e) {
        if (table.getEditingCell() != null || e.isControlDown() || e.isAltDown() || e.isMetaDown()) {
            return;
        }
        String ch = e.getCharacter();
        if (ch == null || ch.isEmpty() || Character.isISOControl(ch.charAt(0)) || ch.charAt(0) == ' ') {
            return;
        }
        TablePosition<NoteRow, ?> p = SheetCell.focused(table);
        if (p != null && SheetCell.editable(p.getTableColumn())) {
            table.getProperties().put(SheetCell.START_TEXT, ch);
            table.edit(p.getRow(), castColumn(p));
            e.consume();
        }
    }

    private static final KeyCodeCombination COPY = new KeyCodeCombination(KeyCode.C, KeyCombination.SHORTCUT_DOWN);
    private static final KeyCodeCombination PASTE = new KeyCodeCombination(KeyCode.V, KeyCombination.SHORTCUT_DOWN);

    /** Ctrl+C: the chosen block (its bounding rectangle) as tab-separated text; headings when every row is chosen. */
    private void copyBlock() {
        List<TablePosition> cells = table.getSelectionModel().getSelectedCells();
        if (cells.isEmpty()) {
            return;
        }
        List<TableColumn<NoteRow, ?>> shown = table.getVisibleLeafColumns();
        int r0 = Integer.MAX_VALUE;
        int r1 = -1;
        int c0 = Integer.MAX_VALUE;
        int c1 = -1;
        for (TablePosition p : cells) {
            int c = shown.indexOf(p.getTableColumn());
            r0 = Math.min(r0, p.getRow());
            r1 = Math.max(r1, p.getRow());
            c0 = Math.min(c0, c);
            c1 = Math.max(c1, c);
        }
        if (c0 < 0) {
            return;
        }
        List<Integer> rows = java.util.stream.IntStream.rangeClosed(r0, r1).boxed().toList();
        boolean wholeColumns = r0 == 0 && r1 == table.getItems().size() - 1 && table.getItems().size() > 1;
        char mark = java.text.DecimalFormatSymbols.getInstance(java.util.Locale.getDefault(
                java.util.Locale.Category.FORMAT)).getDecimalSeparator();
        ClipboardContent content = new ClipboardContent();
        content.putString(model.clipboard().copy(rows, noteColumns(shown.subList(c0, c1 + 1)), wholeColumns, mark));
        Clipboard.getSystemClipboard().setContent(content);
    }

    /** Ctrl+V: a block from the clipboard, its top left at the focused cell, as one edit. */
    private void pasteBlock() {
        TablePosition<NoteRow, ?> p = SheetCell.focused(table);
        String text = Clipboard.getSystemClipboard().getString();
        if (p == null) {
            return;
        }
        List<TableColumn<NoteRow, ?>> shown = table.getVisibleLeafColumns();
        int c = shown.indexOf(p.getTableColumn());
        model.clipboard().paste(p.getRow(), noteColumns(shown.subList(Math.max(c, 0), shown.size())), text);
    }

    private static List<NoteColumn> noteColumns(List<TableColumn<NoteRow, ?>> shown) {
        return shown.stream().map(t -> (NoteColumn) t.getUserData()).toList();
    }

    @SuppressWarnings("unchecked")
    private static TableColumn<NoteRow, String> castColumn(TablePosition<NoteRow, ?> p) {
        return (TableColumn<NoteRow, String>) p.getTableColumn();
    }

    private void selectionChanged() {
        if (syncing) {
            return;
        }
        int i = table.getSelectionModel().getSelectedIndex();
        if (i >= 0 && i < table.getItems().size()) {
            syncing = true;
            try {
                model.selectedKeyProperty().set(table.getItems().get(i).key());
            } finally {
                syncing = false;
            }
        }
    }

    private void selectKey(Integer key) {
        if (syncing || key == null) {
            return;
        }
        int i = model.indexOf(key);
        if (i < 0) {
            return;
        }
        syncing = true;
        try {
            TablePosition<NoteRow, ?> p = SheetCell.focused(table);
            TableColumn<NoteRow, ?> col = p != null ? p.getTableColumn() : columns.get(NoteColumn.WIRE);
            table.getSelectionModel().clearAndSelect(i, col);
            table.getFocusModel().focus(i, col);
            table.scrollTo(Math.max(0, i - 3));
        } finally {
            syncing = false;
        }
    }

    /** A row marked by its flags: a style class per worst flag and the flag details on hover. */
    private static final class FlaggedRow extends TableRow<NoteRow> {
        private static final String[] MARKS = {"flag-danger", "flag-caution", "flag-other"};
        private final ChangeListener<NoteRow.State> restyle = (o, a, b) -> mark(getItem(), isEmpty());
        private NoteRow watched;
        private Tooltip tip; // made for the first flagged note the row shows

        @Override
        protected void updateItem(NoteRow row, boolean empty) {
            super.updateItem(row, empty);
            if (watched != row) {
                if (watched != null) {
                    watched.stateProperty().removeListener(restyle);
                }
                watched = row;
                if (row != null) {
                    row.stateProperty().addListener(restyle);
                }
            }
            mark(row, empty);
        }

        private void mark(NoteRow row, boolean empty) {
            getStyleClass().removeAll(MARKS);
            setTooltip(null);
            if (empty || row == null || !row.result().isFlagged()) {
                return;
            }
            getStyleClass().add(worst(row));
            if (tip == null) {
                tip = new Tooltip();
            }
            tip.setText(row.result().noteName() + " (key " + row.key() + ")\n" + NoteColumn.flagDetails(row));
            setTooltip(tip);
        }

        private static String worst(NoteRow row) {
            FlagKind.Severity worst = row.result().flags().stream().map(f -> f.kind().severity())
                    .min(Comparator.naturalOrder()).orElse(FlagKind.Severity.NOTICE);
            return switch (worst) {
                case DANGER -> MARKS[0];
                case CAUTION -> MARKS[1];
                case NOTICE -> MARKS[2];
            };
        }
    }
}
