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
    /** Room for the cell's padding and the column lines beside the text, px. */
    static final double PADDING = 20;

    private ColumnFit() {
    }

    /** Fits the columns now and whenever the table's rows are replaced or added to. */
    public static <R> void keepFitted(TableView<R> table, double fontSize) {
        table.getItems().addListener((javafx.collections.ListChangeListener<R>) c -> fit(table, fontSize));
        fit(table, fontSize);
    }

    /**
     * Sets each visible column's width to at least what its header and cells need (never
     * narrower than it was made).
     *
     * @param fontSize the size of the cells' text, px (the window's CSS sets 12 px, result tables 11 px)
     */
    public static <R> void fit(TableView<R> table, double fontSize) {
        Text probe = new Text();
        Font cells = Font.font(Font.getDefault().getFamily(), fontSize);
        Font header = Font.font(Font.getDefault().getFamily(), FontWeight.BOLD, Math.max(fontSize, 12));
        for (TableColumn<R, ?> c : table.getColumns()) {
            double wanted = Math.max(width(probe, header, c.getText()), headerWidth(probe, header, c.getGraphic()));
            probe.setFont(cells);
            for (int i = 0; i < table.getItems().size(); i++) {
                Object v = c.getCellData(i);
                if (v != null) {
                    wanted = Math.max(wanted, width(probe, cells, v.toString()));
                }
            }
            wanted += PADDING;
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
