package org.scalewright.app.session;

import java.util.ArrayList;
import java.util.List;
import org.scalewright.model.Scale;

/**
 * The edits of one open sheet as a list of immutable scales: undo and redo step through it,
 * a new edit drops what could have been redone. Remembers which state was last saved.
 */
final class EditHistory {
    /** One state and the edit that led to it. */
    record Step(Scale scale, String description) {
    }

    private final List<Step> steps = new ArrayList<>();
    private int index;
    private int savedIndex;

    EditHistory(Scale initial) {
        reset(initial);
    }

    /** Forgets every edit; {@code initial} is the saved state. */
    void reset(Scale initial) {
        steps.clear();
        steps.add(new Step(initial, "open"));
        index = 0;
        savedIndex = 0;
    }

    Scale current() {
        return steps.get(index).scale();
    }

    /** @return false (and nothing recorded) when {@code next} equals the current scale */
    boolean push(Scale next, String description) {
        if (next.equals(current())) {
            return false;
        }
        while (steps.size() > index + 1) {
            steps.remove(steps.size() - 1);
        }
        if (savedIndex > index) {
            savedIndex = -1; // the saved state can no longer be reached
        }
        steps.add(new Step(next, description));
        index++;
        return true;
    }

    boolean canUndo() {
        return index > 0;
    }

    boolean canRedo() {
        return index < steps.size() - 1;
    }

    /** @return the description of the edit undo would take back, or "" */
    String undoDescription() {
        return canUndo() ? steps.get(index).description() : "";
    }

    /** @return the description of the edit redo would make again, or "" */
    String redoDescription() {
        return canRedo() ? steps.get(index + 1).description() : "";
    }

    Scale undo() {
        if (!canUndo()) {
            throw new IllegalStateException("nothing to undo");
        }
        index--;
        return current();
    }

    Scale redo() {
        if (!canRedo()) {
            throw new IllegalStateException("nothing to redo");
        }
        index++;
        return current();
    }

    void markSaved() {
        savedIndex = index;
    }

    /** @return true when the current state differs from the last saved one */
    boolean isDirty() {
        return index != savedIndex && !(savedIndex >= 0 && steps.get(savedIndex).scale().equals(current()));
    }
}
