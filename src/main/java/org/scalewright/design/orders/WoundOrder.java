package org.scalewright.design.orders;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import org.scalewright.model.Note;
import org.scalewright.model.NumberText;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;

/**
 * The wound strings of a scale as an order a string maker can wind from: one row per string
 * design, identical strings of several notes grouped with their count.
 *
 * <p>Strings are identical when core, wraps, metal and every length agree to the precision the
 * order is printed with: diameters to {@value #DIAMETER_DECIMALS_MM} decimals of a millimetre,
 * lengths to {@value #LENGTH_DECIMALS_MM}. The precision planned is the precision printed.
 *
 * @param rows one row per string design, ordered by its lowest key
 */
public record WoundOrder(List<WoundOrderRow> rows) {

    /** Decimals of a millimetre to which diameters are printed and compared. */
    public static final int DIAMETER_DECIMALS_MM = 3;
    /** Decimals of a millimetre to which lengths are printed and compared. */
    public static final int LENGTH_DECIMALS_MM = 1;

    public WoundOrder {
        rows = List.copyOf(rows);
    }

    /** @return the wound-string order of an analysed scale (empty when it has no wound strings) */
    public static WoundOrder of(ScaleAnalysis analysis) {
        Map<String, List<Note>> groups = new LinkedHashMap<>();
        Map<Integer, String> names = new LinkedHashMap<>();
        for (NoteResult r : analysis.notes()) {
            Note n = analysis.scale().note(r.key()).orElseThrow();
            if (n.isWound()) {
                names.put(n.key(), r.noteName());
                groups.computeIfAbsent(identity(row(n, List.of(r.noteName()))), k -> new ArrayList<>()).add(n);
            }
        }
        List<WoundOrderRow> rows = new ArrayList<>();
        for (List<Note> g : groups.values()) {
            Note first = g.get(0);
            WoundOrderRow one = row(first, List.of(names.get(first.key())));
            List<Integer> keys = g.stream().map(Note::key).toList();
            rows.add(new WoundOrderRow(keys, keys.stream().map(names::get).toList(),
                    g.stream().mapToInt(Note::strings).sum(), one.coreDiameter(), one.coreSize(), one.wrapInner(),
                    one.wrapOuter(), one.metal(), one.outsideDiameter(), one.speakingLength(), one.woundLength(),
                    one.bareFront(), one.bareBack(), one.bareEnds(), one.stretchedLength(), one.windingStart(),
                    one.windingStartFrom()));
        }
        return new WoundOrder(rows);
    }

    /** @return the order row of one wound note, made as many times as it has strings */
    static WoundOrderRow row(Note n, List<String> noteName) {
        Note.BareEnds bare = n.bareEnds();
        WoundOrderRow.BareEndsFrom from;
        if (n.bareFront().isPresent() || n.bareBack().isPresent()) {
            from = WoundOrderRow.BareEndsFrom.GIVEN;
        } else if (n.woundLength().isPresent()) {
            from = bare.any() ? WoundOrderRow.BareEndsFrom.SPLIT : WoundOrderRow.BareEndsFrom.GIVEN;
        } else {
            from = WoundOrderRow.BareEndsFrom.NONE;
        }
        double wound = n.woundLength().orElse(n.speakingLength() - bare.front() - bare.back());
        return new WoundOrderRow(List.of(n.key()), noteName, n.strings(), n.wire().diameter(),
                n.wire().musicWireSize(), n.wrap().inner(), n.wrap().outer(), n.wrap().metal(),
                n.outsideDiameter(), n.speakingLength(), wound, bare.front(), bare.back(), from,
                n.stretchedLength(), windingStart(n, bare.back()),
                n.backLength().isPresent() && from != WoundOrderRow.BareEndsFrom.SPLIT
                        ? WoundOrderRow.WindingStartFrom.BACK_LENGTH : WoundOrderRow.WindingStartFrom.ESTIMATE);
    }

    /**
     * Where the winding starts, measured from the hitch pin: the back length (hitch pin to the
     * bridge pin) plus the bare core at the back end. The back length is the sheet's where it gives
     * one; else, with the stretched length, it is taken as half of stretched less speaking length
     * (the sheet does not say how the rest divides between the front and the back) — an estimate
     * to be checked on the instrument before winding.
     *
     * @param n        a note
     * @param bareBack bare core at the back end inside the speaking length, m, &ge; 0
     * @return the distance, m; empty where neither the back nor the stretched length is known
     */
    public static OptionalDouble windingStart(Note n, double bareBack) {
        if (n.backLength().isPresent()) {
            return OptionalDouble.of(n.backLength().getAsDouble() + bareBack);
        }
        if (n.stretchedLength().isEmpty()) {
            return OptionalDouble.empty();
        }
        double back = Math.max(0, n.stretchedLength().getAsDouble() - n.speakingLength()) / 2;
        return OptionalDouble.of(back + bareBack);
    }

    /** @return what makes two strings the same string: their printed diameters, metal and lengths */
    private static String identity(WoundOrderRow r) {
        return String.join("|", d(r.coreDiameter()), d(r.wrapInner()), d(r.wrapOuter()), d(r.outsideDiameter()),
                r.metal().name(), len(r.speakingLength()), len(r.woundLength()), len(r.bareFront()),
                len(r.bareBack()), r.bareEnds().name(), r.coreSize().isPresent() ? NumberText.plain(
                        r.coreSize().getAsDouble()) : "", r.stretchedLength().isPresent()
                        ? len(r.stretchedLength().getAsDouble()) : "", r.windingStart().isPresent()
                        ? len(r.windingStart().getAsDouble()) : "", r.windingStartFrom().name());
    }

    private static String d(double metres) {
        return NumberText.rounded(metres * 1e3, DIAMETER_DECIMALS_MM);
    }

    private static String len(double metres) {
        return NumberText.rounded(metres * 1e3, LENGTH_DECIMALS_MM);
    }

    /** @return the number of wound strings to make: the sum of the rows' counts */
    public int totalStrings() {
        return rows.stream().mapToInt(WoundOrderRow::count).sum();
    }

    /** @return the number of notes with wound strings */
    public int notes() {
        return rows.stream().mapToInt(r -> r.keys().size()).sum();
    }
}
