package org.scalewright.model;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * How a scale sheet was laid out: its columns in order and the unit of each length column,
 * so that writing a scale keeps the columns and units it was read with.
 *
 * @param columns  the sheet's columns in file order
 * @param units    the unit of each length column present
 * @param comments the sheet's free comment lines before the header (without the {@code #}),
 *                 other than the {@code title:} and {@code a4_hz:} settings, written back as they were
 * @param decimals per number column, the fewest decimals any of its cells was typed with
 *                 ({@code 0.30, 1.25} → 2), so that written back the column keeps its look
 * @param lines    per key, the line of the file it was read from (empty for a scale not read from a
 *                 file), so that a problem found later in a note can name its place; where the rows
 *                 stood is not part of what the layout means, so two layouts are equal without it
 */
public record SheetLayout(List<SheetColumn> columns, Map<SheetColumn, LengthUnit> units, List<String> comments,
                          Map<SheetColumn, Integer> decimals, Map<Integer, Integer> lines) {

    public SheetLayout {
        columns = List.copyOf(columns);
        units = Map.copyOf(units);
        comments = comments == null ? List.of() : List.copyOf(comments);
        decimals = decimals == null ? Map.of() : Map.copyOf(decimals);
        lines = lines == null ? Map.of() : Map.copyOf(lines);
    }

    /** A layout that knows no lines. */
    public SheetLayout(List<SheetColumn> columns, Map<SheetColumn, LengthUnit> units, List<String> comments,
                       Map<SheetColumn, Integer> decimals) {
        this(columns, units, comments, decimals, Map.of());
    }

    /** @return this layout with the line each key was read from */
    public SheetLayout withLines(Map<Integer, Integer> newLines) {
        return new SheetLayout(columns, units, comments, decimals, newLines);
    }

    /** @return {@code line N: } for a key read from line N of a sheet, else the empty string */
    public String placeOf(int key) {
        Integer line = lines.get(key);
        return line == null ? "" : "line " + line + ": ";
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SheetLayout l && columns.equals(l.columns) && units.equals(l.units)
                && comments.equals(l.comments) && decimals.equals(l.decimals);
    }

    @Override
    public int hashCode() {
        return Objects.hash(columns, units, comments, decimals);
    }

    /** A layout whose number columns have no decimals to keep. */
    public SheetLayout(List<SheetColumn> columns, Map<SheetColumn, LengthUnit> units, List<String> comments) {
        this(columns, units, comments, Map.of());
    }

    /** A layout without comment lines. */
    public SheetLayout(List<SheetColumn> columns, Map<SheetColumn, LengthUnit> units) {
        this(columns, units, List.of());
    }

    /** @return this layout with other comment lines */
    public SheetLayout withComments(List<String> newComments) {
        return new SheetLayout(columns, units, newComments, decimals, lines);
    }

    /** @return this layout with the fewest decimals of each number column as read */
    public SheetLayout withDecimals(Map<SheetColumn, Integer> newDecimals) {
        return new SheetLayout(columns, units, comments, newDecimals, lines);
    }

    /** @return the fewest decimals the column's cells were typed with, 0 when not known */
    public int decimalsOf(SheetColumn column) {
        return decimals.getOrDefault(column, 0);
    }

    /**
     * The layout used for a scale that has none yet: every column but those written only where
     * notes need them ({@link SheetColumn#onlyWhereNeeded()}), lengths in millimetres.
     */
    public static SheetLayout metricDefault() {
        List<SheetColumn> cols = new ArrayList<>(List.of(SheetColumn.values()));
        cols.removeIf(SheetColumn::onlyWhereNeeded);
        Map<SheetColumn, LengthUnit> u = new EnumMap<>(SheetColumn.class);
        for (SheetColumn c : cols) {
            if (c.isLength()) {
                u.put(c, LengthUnit.MM);
            }
        }
        return new SheetLayout(cols, u);
    }

    /** @return the unit of a length column: its own, else that of the speaking length, else mm */
    public LengthUnit unitOf(SheetColumn column) {
        LengthUnit u = units.get(column);
        if (u != null) {
            return u;
        }
        if (column == SheetColumn.WRAP2 && units.containsKey(SheetColumn.WRAP1)) {
            return units.get(SheetColumn.WRAP1);
        }
        if (column == SheetColumn.OD1 && units.containsKey(SheetColumn.OD)) {
            return units.get(SheetColumn.OD);
        }
        if (column == SheetColumn.OD && units.containsKey(SheetColumn.OD1)) {
            return units.get(SheetColumn.OD1);
        }
        if ((column == SheetColumn.OD || column == SheetColumn.OD1) && units.containsKey(SheetColumn.WRAP1)) {
            return units.get(SheetColumn.WRAP1);
        }
        if (column == SheetColumn.BARE_FRONT && units.containsKey(SheetColumn.BARE_BACK)) {
            return units.get(SheetColumn.BARE_BACK);
        }
        if (column == SheetColumn.BARE_BACK && units.containsKey(SheetColumn.BARE_FRONT)) {
            return units.get(SheetColumn.BARE_FRONT);
        }
        return units.getOrDefault(SheetColumn.SPEAKING_LENGTH, LengthUnit.MM);
    }

    /** @return true when the sheet has this column */
    public boolean has(SheetColumn column) {
        return columns.contains(column);
    }

    /** @return a layout with the column appended (if absent), lengths in {@link #unitOf} */
    public SheetLayout with(SheetColumn column) {
        if (has(column)) {
            return this;
        }
        List<SheetColumn> cols = new ArrayList<>(columns);
        cols.add(column);
        Map<SheetColumn, LengthUnit> u = new EnumMap<>(SheetColumn.class);
        u.putAll(units);
        if (column.isLength()) {
            u.put(column, unitOf(column));
        }
        return new SheetLayout(cols, u, comments, decimals, lines);
    }
}
