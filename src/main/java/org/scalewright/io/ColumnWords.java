package org.scalewright.io;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The plain words, with the unit, that head a column of a table written as a spreadsheet
 * ({@code tension_n} → "tension per string (N)"), from the bundled {@code data/column-words.csv}.
 */
public final class ColumnWords {
    private static volatile Map<String, String> words;

    private ColumnWords() {
    }

    /**
     * @param column a CSV column name
     * @return its header in plain words: the name's own entry; else the entry of the name without its unit
     *         ending, and the unit in brackets; else the name with spaces for underscores (and the unit)
     */
    public static String of(String column) {
        Map<String, String> w = table();
        String whole = w.get(column);
        if (whole != null) {
            return whole;
        }
        for (Map.Entry<String, String> e : w.entrySet()) {
            String ending = e.getKey();
            if (ending.startsWith("_") && column.endsWith(ending) && column.length() > ending.length()) {
                String stem = column.substring(0, column.length() - ending.length());
                return w.getOrDefault(stem, stem.replace('_', ' ')) + " (" + e.getValue() + ")";
            }
        }
        return column.replace('_', ' ');
    }

    private static Map<String, String> table() {
        Map<String, String> w = words;
        if (w == null) {
            Map<String, String> read = new LinkedHashMap<>();
            CsvTable t = BuiltInData.table("column-words.csv");
            for (CsvTable.Row r : t.rows()) {
                read.put(CsvTable.cell(r, 0), CsvTable.cell(r, 1));
            }
            words = w = ordered(read);
        }
        return w;
    }

    /** Unit endings longest first, so {@code _g_m} is tried before {@code _m}. */
    private static Map<String, String> ordered(Map<String, String> read) {
        Map<String, String> out = new LinkedHashMap<>();
        read.entrySet().stream().filter(e -> e.getKey().startsWith("_"))
                .sorted((a, b) -> b.getKey().length() - a.getKey().length())
                .forEach(e -> out.put(e.getKey(), e.getValue()));
        read.forEach(out::putIfAbsent);
        return java.util.Collections.unmodifiableMap(out);
    }
}
