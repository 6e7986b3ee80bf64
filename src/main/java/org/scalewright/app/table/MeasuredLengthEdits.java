package org.scalewright.app.table;

import java.util.Map;
import java.util.OptionalDouble;
import java.util.Set;
import org.scalewright.app.session.DisplayFormat;
import org.scalewright.model.DisplayUnits;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.Note;

/**
 * Entries of the lengths measured along a string that depend on each other: the speaking,
 * stretched and back length (back + speaking must leave a front length within the stretched
 * length), and a wound string's winding with its bare core at each end (the three make the
 * speaking length). Typed into one cell or pasted as a row, they are checked together and any
 * refusal is worded in the display unit.
 */
final class MeasuredLengthEdits {
    private MeasuredLengthEdits() {
    }

    /**
     * The speaking, stretched and back length. A new speaking length carries a given winding with
     * it, so the bare core at the ends stays as it was (as on a string made again).
     *
     * @param typed entries by column: {@link NoteColumn#LENGTH} (required), {@link NoteColumn#STRETCHED},
     *              {@link NoteColumn#BACK} (blank for none)
     * @throws IllegalArgumentException when an entry is not a length, or the lengths do not fit together
     */
    static Note lengths(Note note, Map<NoteColumn, String> typed, DisplayUnits units) {
        double speaking = typed.containsKey(NoteColumn.LENGTH)
                ? NoteEdits.length("speaking length", typed.get(NoteColumn.LENGTH).trim(), units) : note.speakingLength();
        OptionalDouble stretched = typed.containsKey(NoteColumn.STRETCHED)
                ? optional("stretched length", typed.get(NoteColumn.STRETCHED).trim(), units) : note.stretchedLength();
        OptionalDouble back = typed.containsKey(NoteColumn.BACK)
                ? optional("back length", typed.get(NoteColumn.BACK).trim(), units) : note.backLength();
        if (back.isPresent() && stretched.isPresent() && back.getAsDouble() + speaking >= stretched.getAsDouble()) {
            throw new IllegalArgumentException("the back length " + text(back.getAsDouble(), units)
                    + " and the speaking length " + text(speaking, units) + " leave nothing of the stretched length "
                    + text(stretched.getAsDouble(), units) + " for the front length to the tuning pin");
        }
        if (note.woundLength().isPresent()) {
            double bare = note.speakingLength() - note.woundLength().getAsDouble();
            if (!(speaking - bare > Note.WINDING_TOLERANCE)) {
                throw new IllegalArgumentException("the bare core at the ends, " + text(bare, units)
                        + ", would leave no winding in a speaking length of " + text(speaking, units));
            }
        }
        Note loose = note.withBackLength(OptionalDouble.empty()).withStretchedLength(OptionalDouble.empty());
        if (speaking != note.speakingLength()) {
            loose = loose.withSpeakingLength(speaking);
        }
        return loose.withStretchedLength(stretched).withBackLength(back);
    }

    /**
     * The wound length and the bare core at each end, typed together (a pasted row) or one of
     * them alone (a cell). The three must make the speaking length (within
     * {@link Note#WINDING_TOLERANCE}), so where all three end up given and not all were typed,
     * one follows from the others: the wound length when it was not typed, else the bare core at
     * the back, else at the front. Three typed at once are taken as typed, and checked.
     *
     * @param typed   entries by column: {@link NoteColumn#WOUND}, {@link NoteColumn#BARE_FRONT},
     *                {@link NoteColumn#BARE_BACK}; blank for none
     * @param asShown those of them that hold what the table shows: they count as typed but keep the
     *                note's own value (a shown value is rounded)
     * @return the note with its winding changed; the note itself when every entry is as shown
     * @throws IllegalArgumentException when an entry is not a length or the three cannot agree
     */
    static Note winding(Note note, Map<NoteColumn, String> typed, Set<NoteColumn> asShown, DisplayUnits units) {
        if (asShown.containsAll(typed.keySet())) {
            return note;
        }
        OptionalDouble wound = entry(typed, asShown, NoteColumn.WOUND, note.woundLength(),
                t -> optional("wound length", t, units));
        OptionalDouble front = entry(typed, asShown, NoteColumn.BARE_FRONT, note.bareFront(), t -> bare(t, units));
        OptionalDouble back = entry(typed, asShown, NoteColumn.BARE_BACK, note.bareBack(), t -> bare(t, units));
        if (wound.isPresent() && front.isPresent() && back.isPresent() && typed.size() < 3) {
            if (!typed.containsKey(NoteColumn.WOUND)) {
                double w = note.speakingLength() - front.getAsDouble() - back.getAsDouble();
                if (!(w > Note.WINDING_TOLERANCE)) {
                    throw new IllegalArgumentException("the bare core at the ends, "
                            + text(front.getAsDouble() + back.getAsDouble(), units) + ", leaves no winding in the "
                            + "speaking length " + text(note.speakingLength(), units));
                }
                wound = OptionalDouble.of(w);
            } else if (!typed.containsKey(NoteColumn.BARE_BACK)) {
                back = OptionalDouble.of(left(note, wound.getAsDouble(), front.getAsDouble(), true, units));
            } else {
                front = OptionalDouble.of(left(note, wound.getAsDouble(), back.getAsDouble(), false, units));
            }
        }
        return note.withWinding(wound, front, back);
    }

    /**
     * Reads one entry of these columns alone, so that a paste can name the cell a bad entry is in
     * before the row's lengths are checked together.
     *
     * @throws IllegalArgumentException when the entry is not a length the column takes
     */
    static void read(NoteColumn c, String text, DisplayUnits units) {
        String t = text.trim();
        switch (c) {
            case LENGTH -> NoteEdits.length("speaking length", t, units);
            case STRETCHED -> optional("stretched length", t, units);
            case BACK -> optional("back length", t, units);
            case WOUND -> optional("wound length", t, units);
            case BARE_FRONT, BARE_BACK -> bare(t, units);
            default -> throw new IllegalArgumentException(c + " is not a measured length");
        }
    }

    private static OptionalDouble entry(Map<NoteColumn, String> typed, Set<NoteColumn> asShown, NoteColumn c,
                                        OptionalDouble now, java.util.function.Function<String, OptionalDouble> read) {
        return !typed.containsKey(c) || asShown.contains(c) ? now : read.apply(typed.get(c).trim());
    }

    /**
     * @return the bare core the speaking length leaves at one end beside the winding and the other
     *         end, m; 0 where it falls short by no more than {@link Note#WINDING_TOLERANCE}
     */
    private static double left(Note note, double wound, double otherEnd, boolean otherIsFront, DisplayUnits units) {
        double left = note.speakingLength() - wound - otherEnd;
        if (left < -Note.WINDING_TOLERANCE) {
            throw new IllegalArgumentException("winding " + text(wound, units) + " and " + text(otherEnd, units)
                    + " of bare core at the " + (otherIsFront ? "front" : "back") + " are longer than the speaking "
                    + "length " + text(note.speakingLength(), units));
        }
        return Math.max(0, left);
    }

    /** @return a bare end typed: 0 or more, blank for none */
    private static OptionalDouble bare(String t, DisplayUnits units) {
        if (t.isEmpty()) {
            return OptionalDouble.empty();
        }
        NoteEdits.Quantity q = NoteEdits.quantity(t, units);
        LengthUnit unit = q.unit().orElse(units.length());
        if (!(q.value() >= 0)) {
            throw new IllegalArgumentException("bare core must be 0 or more " + unit.symbol() + ", was "
                    + DisplayFormat.decimals(q.value(), 0, 4));
        }
        return OptionalDouble.of(q.value() == 0 ? 0 : NoteEdits.withinSheetLimits("bare core", unit.toMetres(q.value()),
                unit));
    }

    /** @return a length typed, &gt; 0; blank for none */
    static OptionalDouble optional(String what, String t, DisplayUnits units) {
        return t.isEmpty() ? OptionalDouble.empty() : OptionalDouble.of(NoteEdits.length(what, t, units));
    }

    /** @return a length in the display unit with the unit: {@code 1470 mm}, {@code 57.87 in} */
    private static String text(double metres, DisplayUnits units) {
        double v = units.length().fromMetres(metres);
        return DisplayFormat.decimals(v, 0, units.length() == LengthUnit.MM ? 1 : 2) + " " + units.length().symbol();
    }
}
