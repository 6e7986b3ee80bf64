package org.scalewright.app.table;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.StringBinding;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.value.ObservableBooleanValue;
import javafx.beans.value.ObservableValue;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.DisplayUnits;
import org.scalewright.model.KeyNames;
import org.scalewright.model.Note;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;

/**
 * The note table's state: one row per note with its computed values and the reference's,
 * kept up to date with the session, and the editing of cells. While the keys stay the same
 * the row objects stay and only their states change, so the table keeps its selection and
 * scroll position and redraws only what changed.
 */
public final class NoteTableViewModel {
    private final ScaleSession session;
    private final NoteEdits edits = new NoteEdits(BuiltInData.musicWireSizes());
    private final ObservableList<NoteRow> rows = FXCollections.observableArrayList();
    private final Map<NoteColumn, StringBinding> headers = new EnumMap<>(NoteColumn.class);
    private final NoteClipboard clipboard;
    private final Map<NoteColumn, BooleanProperty> shown = new EnumMap<>(NoteColumn.class);

    public NoteTableViewModel(ScaleSession session) {
        this.session = session;
        this.clipboard = new NoteClipboard(session, this, edits);
        session.analysisProperty().addListener((o, a, b) -> refresh());
        session.referenceAnalysisProperty().addListener((o, a, b) -> refresh());
        for (NoteColumn c : NoteColumn.values()) {
            headers.put(c, Bindings.createStringBinding(() -> c.headerLines(session.units()),
                    session.unitsProperty()));
            if (c.shownWhenChosen()) {
                shown.put(c, new SimpleBooleanProperty(false));
            }
        }
        refresh();
    }

    public ObservableList<NoteRow> rows() {
        return rows;
    }

    /** @return whether the difference-from-reference columns are shown */
    public ObservableBooleanValue showDifferencesProperty() {
        return session.showDifferencesProperty();
    }

    /**
     * @param c a column {@linkplain NoteColumn#shownWhenChosen() shown when chosen}
     * @return whether it is shown (false at first)
     */
    public BooleanProperty shownProperty(NoteColumn c) {
        BooleanProperty p = shown.get(c);
        if (p == null) {
            throw new IllegalArgumentException(c + " is always shown");
        }
        return p;
    }

    /** @return copying and pasting blocks of cells */
    public NoteClipboard clipboard() {
        return clipboard;
    }

    /** @return the display units, which the cells follow */
    public ObservableValue<org.scalewright.model.DisplayUnits> unitsProperty() {
        return session.unitsProperty();
    }

    /** @return the selected key, shared with the curves and the tools */
    public ObjectProperty<Integer> selectedKeyProperty() {
        return session.selectedKeyProperty();
    }

    /** @return the two-line header of a column, following the display units */
    public StringBinding header(NoteColumn c) {
        return headers.get(c);
    }

    /** @return the text a cell shows */
    String text(NoteRow row, NoteColumn c) {
        return c.text(row, session.units());
    }

    /** @return the row index of a key, or -1 */
    public int indexOf(int key) {
        for (int i = 0; i < rows.size(); i++) {
            if (rows.get(i).key() == key) {
                return i;
            }
        }
        return -1;
    }

    /**
     * Applies an entry typed into a cell. An entry equal to what the cell shows changes
     * nothing; a bad entry changes nothing and says why in the session's message line.
     *
     * @return true when the scale changed
     */
    public boolean edit(int key, NoteColumn column, String text) {
        Note note = session.scale().note(key).orElse(null);
        int i = indexOf(key);
        if (note == null || i < 0) {
            session.complain("key " + key + " is not in the scale");
            return false;
        }
        String label = column.word();
        if (!column.editable()) {
            session.complain(label + " is computed from the other columns and cannot be edited");
            return false;
        }
        if (text != null && text.trim().equals(text(rows.get(i), column))) {
            return false;
        }
        Note changed;
        try {
            changed = edits.apply(note, column, text, session.units());
        } catch (IllegalArgumentException e) {
            session.complain("key " + key + " (" + KeyNames.name(key) + "), " + label + ": "
                    + NoteEdits.refusal(e));
            return false;
        }
        String description = label + " of key " + key + " " + KeyNames.name(key);
        return session.edit(description, s -> s.withNote(changed));
    }

    private void refresh() {
        ScaleAnalysis a = session.analysis();
        ScaleAnalysis ref = session.referenceAnalysisProperty().get();
        List<NoteRow.State> next = new ArrayList<>(a.notes().size());
        List<Note> notes = a.scale().notes();
        for (int i = 0; i < notes.size(); i++) {
            NoteResult r = a.notes().get(i);
            next.add(new NoteRow.State(notes.get(i), r, ref == null ? null : ref.result(r.key()).orElse(null)));
        }
        if (next.size() != rows.size() || !sameKeys(next)) {
            rows.setAll(next.stream().map(NoteRow::new).toList());
            return;
        }
        for (int i = 0; i < next.size(); i++) {
            rows.get(i).update(next.get(i));
        }
    }

    private boolean sameKeys(List<NoteRow.State> next) {
        for (int i = 0; i < next.size(); i++) {
            if (next.get(i).note().key() != rows.get(i).key()) {
                return false;
            }
        }
        return true;
    }
}
