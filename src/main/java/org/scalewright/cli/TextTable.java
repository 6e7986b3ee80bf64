package org.scalewright.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;

/**
 * A plain-text table with aligned columns for the terminal: text left, numbers right. Each cell is one
 * line without control characters ({@link TerminalText#cell}), so a title or remark cannot act on the
 * terminal or break the columns.
 */
public final class TextTable {
    private final List<String> header;
    private final boolean[] rightAligned;
    private final List<List<String>> rows = new ArrayList<>();

    /** @param columns column headings; a heading starting with '&gt;' is right-aligned (the '&gt;' is dropped) */
    public TextTable(String... columns) {
        header = new ArrayList<>();
        rightAligned = new boolean[columns.length];
        for (int i = 0; i < columns.length; i++) {
            rightAligned[i] = columns[i].startsWith(">");
            header.add(TerminalText.cell(rightAligned[i] ? columns[i].substring(1) : columns[i]));
        }
    }

    /** Adds a row of as many cells as there are columns. */
    public TextTable row(Object... cells) {
        if (cells.length != header.size()) {
            throw new IllegalArgumentException("row has " + cells.length + " cells, table " + header.size());
        }
        List<String> r = new ArrayList<>(cells.length);
        for (Object c : cells) {
            r.add(TerminalText.cell(String.valueOf(c)));
        }
        rows.add(r);
        return this;
    }

    /** Prints the table. */
    public void print(PrintWriter out) {
        int[] w = new int[header.size()];
        for (int i = 0; i < w.length; i++) {
            w[i] = header.get(i).length();
            for (List<String> r : rows) {
                w[i] = Math.max(w[i], r.get(i).length());
            }
        }
        line(out, header, w);
        StringBuilder rule = new StringBuilder();
        for (int i = 0; i < w.length; i++) {
            rule.append(i == 0 ? "" : "  ").append("-".repeat(w[i]));
        }
        out.println(rule);
        for (List<String> r : rows) {
            line(out, r, w);
        }
    }

    private void line(PrintWriter out, List<String> cells, int[] w) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < w.length; i++) {
            String c = cells.get(i);
            String pad = " ".repeat(w[i] - c.length());
            b.append(i == 0 ? "" : "  ").append(rightAligned[i] ? pad + c : c + (i == w.length - 1 ? "" : pad));
        }
        out.println(b.toString().stripTrailing());
    }
}
