package org.scalewright.app.session;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;

class EditHistoryTest {
    private static Scale at(double a4) {
        return new Scale("t", new PitchStandard(a4), List.of(), null);
    }

    @Test
    void undoAndRedoStepThroughTheEdits() {
        EditHistory h = new EditHistory(at(440));
        assertFalse(h.canUndo());
        assertTrue(h.push(at(441), "one"));
        assertTrue(h.push(at(442), "two"));
        assertEquals("two", h.undoDescription());
        assertEquals(at(441), h.undo());
        assertEquals(at(440), h.undo());
        assertFalse(h.canUndo());
        assertEquals("one", h.redoDescription());
        assertEquals(at(441), h.redo());
        assertEquals(at(442), h.redo());
        assertFalse(h.canRedo());
        assertThrows(IllegalStateException.class, h::redo);
    }

    @Test
    void anEditThatChangesNothingIsNotRecorded() {
        EditHistory h = new EditHistory(at(440));
        assertFalse(h.push(at(440), "same"));
        assertFalse(h.canUndo());
        assertFalse(h.isDirty());
    }

    @Test
    void aNewEditDropsWhatCouldHaveBeenRedone() {
        EditHistory h = new EditHistory(at(440));
        h.push(at(441), "one");
        h.undo();
        h.push(at(443), "other");
        assertFalse(h.canRedo());
        assertEquals(at(440), h.undo());
    }

    @Test
    void dirtyFollowsTheSavedState() {
        EditHistory h = new EditHistory(at(440));
        assertFalse(h.isDirty());
        h.push(at(441), "one");
        assertTrue(h.isDirty());
        h.markSaved();
        assertFalse(h.isDirty());
        h.undo();
        assertTrue(h.isDirty(), "the state before the save differs from the file");
        h.redo();
        assertFalse(h.isDirty());
        h.undo();
        h.push(at(445), "branch");
        assertTrue(h.isDirty(), "the saved state can no longer be reached");
    }
}
