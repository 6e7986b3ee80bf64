package org.scalewright.app.table;

import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import org.scalewright.model.Note;
import org.scalewright.physics.NoteResult;

/**
 * One row of the note table, for one key. The row object stays while the sheet is open; its
 * {@link #stateProperty() state} is replaced when an edit changes the note or its results,
 * so that the table redraws only the cells that changed and keeps its selection.
 */
public final class NoteRow {
    /**
     * What a row shows.
     *
     * @param note      the note as specified
     * @param result    its computed result
     * @param reference the result of the same key in the reference scale, or null
     */
    public record State(Note note, NoteResult result, NoteResult reference) {
    }

    private final int key;
    private final ReadOnlyObjectWrapper<State> state;

    NoteRow(State initial) {
        this.key = initial.note().key();
        this.state = new ReadOnlyObjectWrapper<>(initial);
    }

    int key() {
        return key;
    }

    public State state() {
        return state.get();
    }

    ReadOnlyObjectProperty<State> stateProperty() {
        return state.getReadOnlyProperty();
    }

    public Note note() {
        return state.get().note();
    }

    public NoteResult result() {
        return state.get().result();
    }

    NoteResult reference() {
        return state.get().reference();
    }

    /** @return true when {@code next} differs from the state shown (which it then replaces) */
    boolean update(State next) {
        if (next.equals(state.get())) {
            return false;
        }
        state.set(next);
        return true;
    }
}
