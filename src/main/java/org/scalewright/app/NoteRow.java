package org.scalewright.app;

import org.scalewright.model.Note;
import org.scalewright.physics.NoteResult;

/**
 * One row of the note table: the note as specified, its computed result, and the result of
 * the same key in the reference scale (null when the reference has no such key or none is set).
 */
record NoteRow(Note note, NoteResult result, NoteResult reference) {
    int key() {
        return note.key();
    }
}
