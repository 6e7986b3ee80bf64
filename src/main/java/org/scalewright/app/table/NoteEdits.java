package org.scalewright.app.table;

import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.scalewright.app.session.DisplayFormat;
import org.scalewright.app.session.TypedEntry;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.CoreWire;
import org.scalewright.model.DisplayUnits;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.Note;
import org.scalewright.model.WireSize;
import org.scalewright.model.WireSizeTable;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;

/**
 * Turns the text typed into a cell of the note table into a changed note. Lengths are read
 * in the display length unit unless the text names its own ({@code 1.1 mm}, {@code 0.043 in});
 * in the wire column a number of 5 or more (or one written {@code #17}) is a music-wire size
 * number, a smaller one a diameter. A bad entry throws {@link IllegalArgumentException}
 * whose message says what was expected.
 */
final class NoteEdits {
    /** Wire entries at or above this number are size numbers; no piano wire is 5 mm thick. */
    static final double SIZE_NUMBER_FROM = 5;

    private final WireSizeTable sizes;

    NoteEdits(WireSizeTable sizes) {
        this.sizes = sizes;
    }

    /**
     * @return the note with the column's value replaced by the entry
     * @throws IllegalArgumentException when the entry is not a valid value for the column
     */
    Note apply(Note note, NoteColumn column, String text, DisplayUnits units) {
        String t = text == null ? "" : text.trim();
        return switch (column) {
            case SECTION -> note.withSection(t);
            case REMARK -> note.withRemark(t);
            case STRINGS -> note.withStrings(strings(t));
            case LENGTH, STRETCHED, BACK, WOUND, BARE_FRONT, BARE_BACK ->
                    MeasuredLengthEdits.apply(note, Map.of(column, t), Set.of(), units);
            case WIRE -> note.withWire(wire(t, units));
            case WRAP1 -> wrap1(note, t, units);
            case WRAP2 -> wrap2(note, t, units);
            case OD -> od(note, t, units);
            case OD1 -> od1(note, t, units);
            case METAL -> metal(note, t);
            case STRIKE -> note.withStrikePoint(MeasuredLengthEdits.optional("strike point", t, units));
            default -> throw new IllegalArgumentException(column.header(units) + " is computed and cannot be edited");
        };
    }

    private static int strings(String t) {
        try {
            int n = Integer.parseInt(t);
            if (n >= 1 && n <= 3) {
                return n;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new IllegalArgumentException("strings per note must be 1, 2 or 3, was '" + t + "'");
    }

    private CoreWire wire(String t, DisplayUnits units) {
        if (t.isEmpty()) {
            throw new IllegalArgumentException("a wire is required: a size number (" + sizes.rangeText()
                    + ") or a diameter in " + units.length().symbol());
        }
        boolean marked = t.startsWith("#");
        String body = marked ? t.substring(1).trim() : t;
        Quantity q;
        try {
            q = quantity(body, units);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("expected a size number (" + sizes.rangeText()
                    + ") or a diameter in " + units.length().symbol() + ", was '" + t + "'");
        }
        if (marked || (q.unit().isEmpty() && q.value() >= SIZE_NUMBER_FROM)) {
            Optional<WireSize> s = sizes.bySize(q.value());
            if (s.isEmpty()) {
                throw new IllegalArgumentException("wire size " + DisplayFormat.size(q.value())
                        + " is not a music-wire size (" + sizes.rangeText() + " in half steps); "
                        + "enter a size number or a diameter in " + units.length().symbol());
            }
            return CoreWire.ofSize(s.get().size(), s.get().diameter());
        }
        return CoreWire.ofDiameter(positive("wire diameter", q, units));
    }

    private static Note wrap1(Note note, String t, DisplayUnits units) {
        if (t.isEmpty()) {
            return note.withWrap(null);
        }
        double inner = length("first wrap diameter", t, units);
        Wrap old = note.wrap();
        return note.withWrap(old == null ? Wrap.single(inner, WrapMetal.COPPER)
                : new Wrap(inner, old.outer(), old.metal()).inFormOf(old, note.wire().diameter()));
    }

    private static Note wrap2(Note note, String t, DisplayUnits units) {
        Wrap old = note.wrap();
        if (t.isEmpty()) {
            return old == null ? note
                    : note.withWrap(new Wrap(old.inner(), 0, old.metal()).inFormOf(old, note.wire().diameter()));
        }
        if (old == null) {
            throw new IllegalArgumentException("a second wrap needs a first wrap: enter wrap 1 first");
        }
        return note.withWrap(new Wrap(old.inner(), length("second wrap diameter", t, units), old.metal())
                .inFormOf(old, note.wire().diameter()));
    }

    /**
     * The outside diameter as measured: the wraps follow from the core (single wound w1 = (OD − d)/2;
     * double wound, keeping OD1, w2 = (OD − OD1)/2) and the note is then given by OD. On plain wire
     * it makes a single-wound copper string; blank, the note becomes plain wire, as with wrap 1.
     */
    private static Note od(Note note, String t, DisplayUnits units) {
        Wrap old = note.wrap();
        if (t.isEmpty()) {
            return old == null ? note : note.withWrap(null);
        }
        double od = length("outside diameter", t, units);
        double core = note.wire().diameter();
        if (!(od > core)) {
            throw new IllegalArgumentException("the outside diameter " + shown(od, units)
                    + " must be larger than the core, " + shown(core, units));
        }
        WrapMetal metal = old == null ? WrapMetal.COPPER : old.metal();
        if (old == null || !old.isDouble()) {
            return note.withWrap(Wrap.fromOd(core, 0, od, metal));
        }
        double od1 = old.firstLayerDiameter(core);
        if (!(od > od1)) {
            throw new IllegalArgumentException("the outside diameter " + shown(od, units)
                    + " must be larger than the diameter over the first layer, " + shown(od1, units));
        }
        return note.withWrap(Wrap.fromOd(core, od1, od, metal));
    }

    /**
     * The diameter over the first layer of a double-wound string: both wraps follow from core,
     * OD1 and the OD, which stays. Blank, the string becomes single wound with the same OD.
     */
    private static Note od1(Note note, String t, DisplayUnits units) {
        Wrap old = note.wrap();
        double core = note.wire().diameter();
        if (t.isEmpty()) {
            return old == null || !old.isDouble() ? note
                    : note.withWrap(Wrap.fromOd(core, 0, old.outsideDiameter(core), old.metal()));
        }
        if (old == null) {
            throw new IllegalArgumentException("a diameter over the first layer needs a wound string: enter the OD first");
        }
        double od1 = length("diameter over the first layer", t, units);
        double od = old.outsideDiameter(core);
        if (!(od1 > core && od1 < od)) {
            throw new IllegalArgumentException("the diameter over the first layer " + shown(od1, units)
                    + " must lie between the core, " + shown(core, units) + ", and the OD, " + shown(od, units));
        }
        return note.withWrap(Wrap.fromOd(core, od1, od, old.metal()));
    }

    private static String shown(double metres, DisplayUnits units) {
        return DisplayFormat.diameter(metres, units) + " " + units.length().symbol();
    }

    private static Note metal(Note note, String t) {
        Wrap old = note.wrap();
        if (old == null) {
            if (t.isEmpty()) {
                return note;
            }
            throw new IllegalArgumentException("plain wire has no wrap metal: enter wrap 1 first");
        }
        if (t.isEmpty()) {
            throw new IllegalArgumentException("a wound string needs a wrap metal: copper, iron or steel");
        }
        String lower = t.toLowerCase(Locale.ROOT);
        for (WrapMetal m : WrapMetal.values()) {
            if (m.sheetName().startsWith(lower)) {
                return note.withWrap(old.withMetal(m));
            }
        }
        throw new IllegalArgumentException("wrap metal must be copper, iron or steel, was '" + t + "'");
    }

    /**
     * @return a refusal as the table says it: without the key the model puts first, as the table
     *         names the key and column itself
     */
    static String refusal(IllegalArgumentException e) {
        return e.getMessage().replaceFirst("^key -?\\d+: ", "");
    }

    /** @return a required length typed in a cell, m, &gt; 0 */
    static double length(String what, String t, DisplayUnits units) {
        if (t.isEmpty()) {
            throw new IllegalArgumentException(what + " is required (a number in " + units.length().symbol() + ")");
        }
        return positive(what, quantity(t, units), units);
    }

    private static double positive(String what, Quantity q, DisplayUnits units) {
        LengthUnit unit = q.unit().orElse(units.length());
        if (!(q.value() > 0)) {
            throw new IllegalArgumentException(what + " must be > 0 " + unit.symbol() + ", was "
                    + DisplayFormat.decimals(q.value(), 0, 4));
        }
        return withinSheetLimits(what, unit.toMetres(q.value()), unit);
    }

    /**
     * @return {@code metres} when a sheet may hold it ({@link ScaleSheetReader#SMALLEST_LENGTH} to
     *         {@link ScaleSheetReader#LARGEST_LENGTH}), so that what is typed is saved in a sheet that opens again
     * @throws IllegalArgumentException otherwise, with the limits in the unit typed
     */
    static double withinSheetLimits(String what, double metres, LengthUnit unit) {
        if (metres < ScaleSheetReader.SMALLEST_LENGTH || metres > ScaleSheetReader.LARGEST_LENGTH) {
            throw new IllegalArgumentException(what + " must be " + DisplayFormat.decimals(unit.fromMetres(
                    ScaleSheetReader.SMALLEST_LENGTH), 0, 5) + " to " + DisplayFormat.decimals(unit.fromMetres(
                    ScaleSheetReader.LARGEST_LENGTH), 0, 1) + " " + unit.symbol() + ", was "
                    + DisplayFormat.decimals(unit.fromMetres(metres), 0, 6));
        }
        return metres;
    }

    /** A number with the unit it was written with, if any. */
    record Quantity(double value, Optional<LengthUnit> unit) {
    }

    /** @return a number typed with or without a length unit */
    static Quantity quantity(String t, DisplayUnits units) {
        String s = t.trim();
        Optional<LengthUnit> unit = Optional.empty();
        for (LengthUnit u : LengthUnit.values()) {
            if (s.toLowerCase(Locale.ROOT).endsWith(u.symbol())) {
                unit = Optional.of(u);
                s = s.substring(0, s.length() - u.symbol().length()).trim();
                break;
            }
        }
        try {
            return new Quantity(TypedEntry.parse(s, "length", ""), unit);
        } catch (InvalidInput e) {
            throw new IllegalArgumentException("expected a number in " + units.length().symbol() + ", was '" + t + "'");
        }
    }
}
