package org.scalewright.model;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.function.UnaryOperator;

/**
 * A string scale: the notes of one instrument, ordered by key number, with its pitch standard.
 *
 * @param title  a name for the scale ("" when none)
 * @param pitch  the pitch standard the scale is tuned to
 * @param notes  the notes, unique keys, kept sorted from bass to treble
 * @param layout the sheet layout to write it back with
 */
public record Scale(String title, PitchStandard pitch, List<Note> notes, SheetLayout layout) {

    public Scale {
        title = title == null ? "" : title;
        if (pitch == null) {
            pitch = PitchStandard.ISO_16;
        }
        if (layout == null) {
            layout = SheetLayout.metricDefault();
        }
        List<Note> sorted = new ArrayList<>(notes);
        sorted.sort(Comparator.comparingInt(Note::key));
        Set<Integer> seen = new HashSet<>();
        for (Note n : sorted) {
            if (!seen.add(n.key())) {
                throw new IllegalArgumentException("key " + n.key() + " appears more than once in the scale");
            }
        }
        notes = List.copyOf(sorted);
    }

    /** @return the note of a key, if the scale has it */
    public Optional<Note> note(int key) {
        for (Note n : notes) {
            if (n.key() == key) {
                return Optional.of(n);
            }
        }
        return Optional.empty();
    }

    /** @return a copy with the note of the same key replaced (or added) */
    public Scale withNote(Note note) {
        List<Note> list = new ArrayList<>(notes.size() + 1);
        boolean replaced = false;
        for (Note n : notes) {
            if (n.key() == note.key()) {
                list.add(note);
                replaced = true;
            } else {
                list.add(n);
            }
        }
        if (!replaced) {
            list.add(note);
        }
        return new Scale(title, pitch, list, layout);
    }

    /** @return a copy with every note in the range changed by {@code change} */
    public Scale mapNotes(KeyRange range, UnaryOperator<Note> change) {
        List<Note> list = new ArrayList<>(notes.size());
        for (Note n : notes) {
            list.add(range.contains(n.key()) ? change.apply(n) : n);
        }
        return new Scale(title, pitch, list, layout);
    }

    /** @return a copy with all notes replaced */
    public Scale withNotes(List<Note> newNotes) {
        return new Scale(title, pitch, newNotes, layout);
    }

    /** @return a copy tuned to another pitch standard */
    public Scale withPitch(PitchStandard newPitch) {
        return new Scale(title, newPitch, notes, layout);
    }

    /** @return a copy with another sheet layout */
    public Scale withLayout(SheetLayout newLayout) {
        return new Scale(title, pitch, notes, newLayout);
    }

    /** @return a copy with another title */
    public Scale withTitle(String newTitle) {
        return new Scale(newTitle, pitch, notes, layout);
    }

    /** @return the notes whose keys lie in the range, bass to treble */
    public List<Note> notesIn(KeyRange range) {
        return notes.stream().filter(n -> range.contains(n.key())).toList();
    }
}
