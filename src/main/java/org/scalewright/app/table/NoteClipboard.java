package org.scalewright.app.table;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.io.BadInputException;
import org.scalewright.io.PastedBlock;
import org.scalewright.io.SheetProblem;
import org.scalewright.model.KeyNames;
import org.scalewright.model.Note;
import org.scalewright.model.Scale;

/**
 * Blocks of the note table through the clipboard, without JavaFX: a block copied as tab-separated text
 * (the headings first when whole columns are copied), and a block pasted from a spreadsheet applied as
 * one edit, undone in one step. A pasted block is read in the table's entry units, as typed entries are,
 * with decimal commas taken ({@link PastedBlock}); when any cell cannot be taken, the first such cell is
 * told with its row and column and nothing changes.
 */
public final class NoteClipboard {
    private static final Pattern NUMBER = Pattern.compile("[+-]?\\d+\\.\\d+");

    private final ScaleSession session;
    private final NoteTableViewModel table;
    private final NoteEdits edits;

    NoteClipboard(ScaleSession session, NoteTableViewModel table, NoteEdits edits) {
        this.session = session;
        this.table = table;
        this.edits = edits;
    }

    /**
     * @param rows        the block's rows, in table order (indexes into {@link NoteTableViewModel#rows})
     * @param columns     the block's columns, in the order shown
     * @param headings    true to write the columns' headings (name and unit) first
     * @param decimalMark the decimal mark of the spreadsheet the text goes to ({@code .} or {@code ,})
     * @return the block as tab-separated lines, each ending in a line break
     */
    public String copy(List<Integer> rows, List<NoteColumn> columns, boolean headings, char decimalMark) {
        StringBuilder b = new StringBuilder();
        if (headings) {
            List<String> h = new ArrayList<>();
            for (NoteColumn c : columns) {
                h.add(c.header(session.units()).strip());
            }
            line(b, h);
        }
        for (int i : rows) {
            NoteRow row = table.rows().get(i);
            List<String> cells = new ArrayList<>();
            for (NoteColumn c : columns) {
                String text = table.text(row, c);
                cells.add(decimalMark != '.' && NUMBER.matcher(text).matches() ? text.replace('.', decimalMark) : text);
            }
            line(b, cells);
        }
        return b.toString();
    }

    private static void line(StringBuilder b, List<String> cells) {
        for (int i = 0; i < cells.size(); i++) {
            if (i > 0) {
                b.append('\t');
            }
            String c = cells.get(i);
            boolean quote = c.indexOf('\t') >= 0 || c.indexOf('\n') >= 0 || c.indexOf('"') >= 0;
            b.append(quote ? "\"" + c.replace("\"", "\"\"") + "\"" : c);
        }
        b.append('\n');
    }

    /**
     * Pastes a block with its top left cell at {@code firstRow} and the first of {@code columns}.
     *
     * @param firstRow the row index of the block's first row
     * @param columns  the table's columns from the block's first on, in the order shown
     * @param text     the clipboard's text
     * @return true when the scale changed (one edit); false, with the reason in the message line, when not
     */
    public boolean paste(int firstRow, List<NoteColumn> columns, String text) {
        if (text == null || text.isBlank()) {
            session.complain("nothing to paste: the clipboard holds no text");
            return false;
        }
        List<List<String>> block;
        try {
            block = PastedBlock.read(text, c -> c < columns.size() && !columns.get(c).takesNumbers());
        } catch (BadInputException e) {
            SheetProblem p = e.problems().get(0);
            session.complain("nothing pasted: " + place(firstRow, columns, p.line() - 1, column(p)) + ": "
                    + p.message());
            return false;
        }
        int height = block.size();
        int width = block.stream().mapToInt(List::size).max().orElse(0);
        if (firstRow + height > table.rows().size() || width > columns.size()) {
            session.complain("nothing pasted: the block of " + height + " × " + width + " cells reaches past the "
                    + "table (" + (table.rows().size() - firstRow) + " rows and " + columns.size()
                    + " columns from the chosen cell)");
            return false;
        }
        Map<Integer, Note> changed = new LinkedHashMap<>();
        int cells = 0;
        for (int r = 0; r < height; r++) {
            NoteRow row = table.rows().get(firstRow + r);
            Note note = changed.getOrDefault(row.key(), row.note());
            // lengths that depend on each other are taken together, as a sheet's row is
            Map<NoteColumn, String> measured = new EnumMap<>(NoteColumn.class);
            Set<NoteColumn> measuredAsShown = EnumSet.noneOf(NoteColumn.class);
            for (int c = 0; c < width; c++) {
                NoteColumn col = columns.get(c);
                String cell = c < block.get(r).size() ? block.get(r).get(c) : "";
                if (!col.editable()) {
                    session.complain("nothing pasted: " + place(firstRow, columns, r, c) + ": " + col.word()
                            + " is computed from the other columns and cannot be pasted into");
                    return false;
                }
                boolean asShown = cell.equals(table.text(row, col));
                if (MeasuredLengthEdits.COLUMNS.contains(col)) {
                    try {
                        MeasuredLengthEdits.read(col, cell, session.units());
                    } catch (IllegalArgumentException e) {
                        session.complain("nothing pasted: " + place(firstRow, columns, r, c) + ": " + e.getMessage());
                        return false;
                    }
                    measured.put(col, cell);
                    if (asShown) {
                        measuredAsShown.add(col);
                    }
                    continue;
                }
                if (asShown) {
                    continue;
                }
                try {
                    note = edits.apply(note, col, cell, session.units());
                    cells++;
                } catch (IllegalArgumentException e) {
                    session.complain("nothing pasted: " + place(firstRow, columns, r, c) + ": " + NoteEdits.refusal(e));
                    return false;
                }
            }
            try {
                Note after = MeasuredLengthEdits.apply(note, measured, measuredAsShown, session.units());
                cells += after.equals(note) ? 0 : 1;
                note = after;
            } catch (IllegalArgumentException e) {
                session.complain("nothing pasted: row " + (r + 1) + " of the block (key " + row.key() + " "
                        + KeyNames.name(row.key()) + "): " + NoteEdits.refusal(e));
                return false;
            }
            changed.put(row.key(), note);
        }
        if (cells == 0) {
            session.inform("the pasted block holds what the table holds already");
            return false;
        }
        String description = "paste of " + height + " × " + width + " cells at key " + table.rows().get(firstRow).key();
        return session.edit(description, s -> withNotes(s, changed));
    }

    private static Scale withNotes(Scale s, Map<Integer, Note> notes) {
        Scale out = s;
        for (Note n : notes.values()) {
            out = out.withNote(n);
        }
        return out;
    }

    private static int column(SheetProblem p) {
        try {
            return Integer.parseInt(p.column()) - 1;
        } catch (NumberFormatException e) {
            return 0;
        }
    }

    /** @return the cell of the block in words: its row and column, and where that is in the table */
    private String place(int firstRow, List<NoteColumn> columns, int r, int c) {
        String where = "row " + (r + 1) + ", column " + (c + 1) + " of the block";
        if (firstRow + r < table.rows().size() && c < columns.size()) {
            int key = table.rows().get(firstRow + r).key();
            where += " (key " + key + " " + KeyNames.name(key) + ", " + columns.get(c).word() + ")";
        }
        return where;
    }
}
