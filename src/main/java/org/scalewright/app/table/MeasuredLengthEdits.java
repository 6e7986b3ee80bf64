package org.scalewright.app.table;

import java.util.EnumSet;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.function.Function;
import org.scalewright.app.session.DisplayFormat;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.DisplayUnits;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.Note;
import org.scalewright.model.WindingFit;

/**
 * Entries of the lengths measured along a string that depend on each other, typed into one cell
 * or pasted as a row, worked out together and refused in the display unit:
 * <ul>
 *   <li>speaking, stretched and back length: back + speaking must leave a front length within the
 *       stretched length;</li>
 *   <li>a wound string's winding and its bare core at each end: the three make the speaking
 *       length within {@link Note#WINDING_TOLERANCE}; a bare end alone needs the wound length.</li>
 * </ul>
 * Where all three of the winding end up given and not all were entered, one follows from the
 * others: the wound length when it was not entered, else the bare core at the back, else at the
 * front. A new speaking length carries a given winding with it (the bare ends stay) unless the
 * winding is entered too.
 */
final class MeasuredLengthEdits {
    /** The columns whose entries are worked out together here. */
    static final Set<NoteColumn> COLUMNS = EnumSet.of(NoteColumn.LENGTH, NoteColumn.STRETCHED, NoteColumn.BACK,
            NoteColumn.WOUND, NoteColumn.BARE_FRONT, NoteColumn.BARE_BACK);
    private static final Set<NoteColumn> WINDING = EnumSet.of(NoteColumn.WOUND, NoteColumn.BARE_FRONT,
            NoteColumn.BARE_BACK);

    private MeasuredLengthEdits() {
    }

    /**
     * @param typed   entries by column, of {@link #COLUMNS}; blank for none (the speaking length is required)
     * @param asShown those of them that hold what the table shows: they count as entered but keep
     *                the note's own value (a shown value is rounded)
     * @return the note with the entries taken; the note itself when every entry is as shown
     * @throws IllegalArgumentException when an entry is not a length the column takes, or the
     *                                  lengths do not fit together
     */
    static Note apply(Note note, Map<NoteColumn, String> typed, Set<NoteColumn> asShown, DisplayUnits units) {
        if (asShown.containsAll(typed.keySet())) {
            return note;
        }
        double speaking = entry(typed, asShown, NoteColumn.LENGTH, OptionalDouble.of(note.speakingLength()),
                t -> OptionalDouble.of(NoteEdits.length("speaking length", t, units))).getAsDouble();
        OptionalDouble stretched = entry(typed, asShown, NoteColumn.STRETCHED, note.stretchedLength(),
                t -> optional("stretched length", t, units));
        OptionalDouble backLength = entry(typed, asShown, NoteColumn.BACK, note.backLength(),
                t -> optional("back length", t, units));
        if (!Note.backLengthFits(backLength, speaking, stretched)) {
            throw new IllegalArgumentException("the back length " + text(backLength.getAsDouble(), units)
                    + " and the speaking length " + text(speaking, units) + " leave nothing of the stretched length "
                    + text(stretched.getAsDouble(), units) + " for the front length to the tuning pin");
        }
        if (!note.isWound() && typed.keySet().stream().filter(WINDING::contains)
                .anyMatch(c -> !typed.get(c).isBlank())) {
            throw new IllegalArgumentException("a winding and its bare ends belong to a wound string; this note is "
                    + "plain wire (give it a wrap 1 or an OD first)");
        }
        OptionalDouble wound = note.woundLength();
        if (note.isWound() && wound.isPresent() && speaking != note.speakingLength()) {
            // the winding moves with the speaking length, the bare core at the ends staying
            wound = OptionalDouble.of(wound.getAsDouble() + speaking - note.speakingLength());
        }
        wound = entry(typed, asShown, NoteColumn.WOUND, wound, t -> optional("wound length", t, units));
        OptionalDouble front = entry(typed, asShown, NoteColumn.BARE_FRONT, note.bareFront(), t -> bare(t, units));
        OptionalDouble back = entry(typed, asShown, NoteColumn.BARE_BACK, note.bareBack(), t -> bare(t, units));
        long windingTyped = typed.keySet().stream().filter(WINDING::contains).count();
        if (wound.isPresent() && front.isPresent() && back.isPresent()) {
            double mismatch = wound.getAsDouble() + front.getAsDouble() + back.getAsDouble() - speaking;
            boolean followRule = windingTyped < 3;
            // a row copied from the table in inches carries each length rounded to half a shown step
            boolean rounded = windingTyped == 3 && Math.abs(mismatch) > Note.WINDING_TOLERANCE
                    && Math.abs(mismatch) <= Note.WINDING_TOLERANCE + roundingSlack(units);
            if (followRule && !typed.containsKey(NoteColumn.WOUND) || rounded) {
                wound = OptionalDouble.of(speaking - front.getAsDouble() - back.getAsDouble());
            } else if (followRule && !typed.containsKey(NoteColumn.BARE_BACK)) {
                back = OptionalDouble.of(left(speaking, wound.getAsDouble(), front.getAsDouble(), true, units));
            } else if (followRule) {
                front = OptionalDouble.of(left(speaking, wound.getAsDouble(), back.getAsDouble(), false, units));
            }
        }
        if (note.isWound()) {
            checkWinding(speaking, wound, front, back, units);
        }
        return note.withWinding(OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty())
                .withBackLength(OptionalDouble.empty()).withStretchedLength(OptionalDouble.empty())
                .withSpeakingLength(speaking).withStretchedLength(stretched).withBackLength(backLength)
                .withWinding(wound, front, back);
    }

    /**
     * The rule a sheet's row is held to ({@link WindingFit}), worded in the display unit, and a
     * winding worked out here long enough to be written in a sheet.
     */
    private static void checkWinding(double speaking, OptionalDouble wound, OptionalDouble front, OptionalDouble back,
                                     DisplayUnits units) {
        if (wound.isPresent() && !(wound.getAsDouble() >= ScaleSheetReader.SMALLEST_LENGTH)) {
            throw new IllegalArgumentException("the bare core at the ends, " + text(speaking - wound.getAsDouble(),
                    units) + ", leaves no winding in the speaking length " + text(speaking, units));
        }
        WindingFit fit = WindingFit.of(true, speaking, wound, front, back);
        if (fit != WindingFit.FITS) {
            throw new IllegalArgumentException(fit.words(speaking, wound, front, back, m -> text(m, units)));
        }
    }

    /** @return how far lengths copied from the table may miss by rounding: half a shown step on each of four cells, m */
    private static double roundingSlack(DisplayUnits units) {
        double step = units.length().toMetres(Math.pow(10, -DisplayFormat.lengthDecimals(units)));
        return 4 * step / 2;
    }

    /**
     * Reads one entry of these columns alone, so that a paste can name the cell a bad entry is in
     * before the row's lengths are worked out together.
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
                                        OptionalDouble now, Function<String, OptionalDouble> read) {
        return !typed.containsKey(c) || asShown.contains(c) ? now : read.apply(typed.get(c).trim());
    }

    /**
     * @return the bare core the speaking length leaves at one end beside the winding and the other
     *         end, m; 0 where it falls short by no more than {@link Note#WINDING_TOLERANCE}
     */
    private static double left(double speaking, double wound, double otherEnd, boolean otherIsFront,
                               DisplayUnits units) {
        double left = speaking - wound - otherEnd;
        if (left < -Note.WINDING_TOLERANCE) {
            OptionalDouble end = OptionalDouble.of(otherEnd);
            OptionalDouble none = OptionalDouble.empty();
            throw new IllegalArgumentException(WindingFit.WINDING_AND_END_TOO_LONG.words(speaking,
                    OptionalDouble.of(wound), otherIsFront ? end : none, otherIsFront ? none : end, m -> text(m, units)));
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
        return DisplayFormat.decimals(units.length().fromMetres(metres), 0, DisplayFormat.lengthDecimals(units)) + " "
                + units.length().symbol();
    }
}
