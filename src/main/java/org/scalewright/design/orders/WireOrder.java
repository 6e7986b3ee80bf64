package org.scalewright.design.orders;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.TreeMap;
import org.scalewright.model.Note;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.StringPhysics;

/**
 * How much of each plain-wire size to buy to string a scale (the rule in {@link WireAllowances}),
 * thickest first. The totals are the sums of the rows.
 *
 * @param rows       one row per plain-wire diameter, thickest first
 * @param allowances the allowances used
 */
public record WireOrder(List<WireOrderRow> rows, WireAllowances allowances) {

    public WireOrder {
        rows = List.copyOf(rows);
        if (allowances == null) {
            throw new IllegalArgumentException("wire order needs its allowances, was null");
        }
    }

    /**
     * @param analysis   the analysed scale (its plain-wire notes are ordered; wound strings are not)
     * @param allowances the allowances per string
     * @return the order, one row per plain-wire diameter
     */
    public static WireOrder of(ScaleAnalysis analysis, WireAllowances allowances) {
        double rho = analysis.settings().materials().steelDensity();
        // group by diameter to 0.1 µm, so the same wire given as size or diameter is one row
        Map<Long, List<Note>> byDiameter = new TreeMap<>(Comparator.reverseOrder());
        for (NoteResult r : analysis.notes()) {
            Note n = analysis.scale().note(r.key()).orElseThrow();
            if (!n.isWound()) {
                byDiameter.computeIfAbsent(Math.round(n.wire().diameter() * 1e7), k -> new ArrayList<>()).add(n);
            }
        }
        List<WireOrderRow> rows = new ArrayList<>();
        for (List<Note> notes : byDiameter.values()) {
            rows.add(row(notes, allowances, rho));
        }
        return new WireOrder(rows, allowances);
    }

    private static WireOrderRow row(List<Note> notes, WireAllowances a, double rho) {
        double d = notes.get(0).wire().diameter();
        OptionalDouble size = OptionalDouble.empty();
        int strings = 0;
        int pieces = 0;
        int estimated = 0;
        double length = 0;
        for (Note n : notes) {
            if (size.isEmpty()) {
                size = n.wire().musicWireSize();
            }
            int s = n.strings();
            strings += s;
            pieces += a.looped() ? s / 2 + s % 2 : s;
            double perString;
            if (n.stretchedLength().isPresent()) {
                perString = n.stretchedLength().getAsDouble();
            } else {
                perString = n.speakingLength() + a.lengthAllowance();
                estimated += s;
            }
            length += s * (perString + a.pinAllowance());
        }
        double mu = StringPhysics.plainMassPerLength(d, rho);
        return new WireOrderRow(d, size, keyRanges(notes), notes.size(), strings, pieces, estimated, length, mu,
                mu * length);
    }

    /** @return key numbers as ranges of consecutive keys, e.g. {@code 29-30, 41} */
    static String keyRanges(List<Note> notes) {
        StringBuilder b = new StringBuilder();
        int i = 0;
        while (i < notes.size()) {
            int j = i;
            while (j + 1 < notes.size() && notes.get(j + 1).key() == notes.get(j).key() + 1) {
                j++;
            }
            if (b.length() > 0) {
                b.append(", ");
            }
            b.append(notes.get(i).key());
            if (j > i) {
                b.append('-').append(notes.get(j).key());
            }
            i = j + 1;
        }
        return b.toString();
    }

    /** @return the number of plain strings: the sum of the rows */
    public int totalStrings() {
        return rows.stream().mapToInt(WireOrderRow::strings).sum();
    }

    /** @return the number of pieces to cut: the sum of the rows */
    public int totalPieces() {
        return rows.stream().mapToInt(WireOrderRow::pieces).sum();
    }

    /** @return the total length of plain wire to buy, m: the sum of the rows */
    public double totalLength() {
        return rows.stream().mapToDouble(WireOrderRow::length).sum();
    }

    /** @return the total mass of plain wire, kg: the sum of the rows */
    public double totalMass() {
        return rows.stream().mapToDouble(WireOrderRow::mass).sum();
    }
}
