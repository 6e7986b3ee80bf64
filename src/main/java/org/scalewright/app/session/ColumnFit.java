package org.scalewright.app.session;

import javafx.scene.Node;
import javafx.scene.control.Labeled;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.Text;

/**
 * Widens a table's columns to their header and their widest cell, so that no figure or wire
 * is cut short with an ellipsis; a table wider than its place scrolls sideways instead.
 */
public final class ColumnFit {
    /** Room for a cell's padding and the column line beside its text, px (modena: 2 px a side). */
    static final double CELL_PADDING = 10;
    /** Room for a header label's padding and lines, px (modena: 6 px a side). */
    static final double HEADER_PADDING = 16;

    private ColumnFit() {
    }

    /** Fits the columns now and whenever the table's rows are replaced or added to. */
    public static <R> void keepFitted(TableView<R> table, double fontSize, double headerSize) {
        table.getItems().addListener((javafx.collections.ListChangeListener<R>) c -> fit(table, fontSize, headerSize));
        fit(table, fontSize, headerSize);
    }

    /**
     * Sets each visible column's width to at least what its header and cells need (never
     * narrower than it was made).
     *
     * @param fontSize   the size of the cells' text, px (the window's CSS sets 12 px)
     * @param headerSize the size of the headers' bold text, px (the note table's CSS sets 11 px)
     */
    public static <R> void fit(TableView<R> table, double fontSize, double headerSize) {
        Text probe = new Text();
        Font cells = Font.font(Font.getDefault().getFamily(), fontSize);
        Font header = Font.font(Font.getDefault().getFamily(), FontWeight.BOLD, headerSize);
        for (TableColumn<R, ?> c : table.getColumns()) {
            // a column drawn with a header label of its own is as wide as that label needs
            double wanted = HEADER_PADDING + (c.getGraphic() != null ? headerWidth(probe, header, c.getGraphic())
                    : width(probe, header, c.getText()));
            for (int i = 0; i < table.getItems().size(); i++) {
                Object v = c.getCellData(i);
                if (v != null) {
                    wanted = Math.max(wanted, CELL_PADDING + width(probe, cells, v.toString()));
                }
            }
            Object made = c.getProperties().computeIfAbsent("scalewright.madeWidth", k -> c.getPrefWidth());
            c.setPrefWidth(Math.max((Double) made, Math.ceil(wanted)));
        }
    }

    private static double headerWidth(Text probe, Font font, Node graphic) {
        return graphic instanceof Labeled l ? width(probe, font, l.getText()) : 0;
    }

    private static double width(Text probe, Font font, String text) {
        if (text == null || text.isEmpty()) {
            return 0;
        }
        probe.setFont(font);
        double w = 0;
        for (String line : text.split("\n")) {
            probe.setText(line);
            w = Math.max(w, probe.getLayoutBounds().getWidth());
        }
        return w;
    }
}
