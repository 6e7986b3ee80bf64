package org.scalewright.design.wirecheck;

import java.util.ArrayList;
import java.util.List;
import org.scalewright.model.KeyNames;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.NoteCalculator;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.StrengthTable;

/**
 * Two strength tables compared note by note on the same wire at the same pitch: the percent of
 * breaking strength under each.
 *
 * @param first  the first table
 * @param second the second table
 * @param rows   one row per note, bass to treble
 */
public record StrengthComparison(StrengthTable first, StrengthTable second, List<Row> rows) {

    /**
     * One note under both tables.
     *
     * @param key            key number
     * @param noteName       note name
     * @param diameter       plain wire or core diameter, m
     * @param strengthFirst  breaking strength under the first table, Pa
     * @param strengthSecond breaking strength under the second table, Pa
     * @param pctFirst       percent of breaking strength under the first table, %
     * @param pctSecond      percent of breaking strength under the second table, %
     */
    public record Row(int key, String noteName, double diameter, double strengthFirst, double strengthSecond,
                      double pctFirst, double pctSecond) {
        /** @return how much stronger the second table is at this diameter, % (negative: weaker) */
        public double secondStrongerPct() {
            return 100.0 * (strengthSecond / strengthFirst - 1);
        }
    }

    public StrengthComparison {
        rows = List.copyOf(rows);
    }

    /**
     * @param scale    the scale (its wire and pitch standard)
     * @param pitch    the pitch standard to compare at
     * @param settings materials and bands (its own strength table is not used)
     * @param first    the first table
     * @param second   the second table
     * @return both tables' percent of breaking strength for every note of the scale
     */
    public static StrengthComparison compare(Scale scale, PitchStandard pitch, AnalysisSettings settings,
                                             StrengthTable first, StrengthTable second) {
        if (first == null || second == null) {
            throw new IllegalArgumentException("comparing strength tables needs two tables");
        }
        AnalysisSettings a = settings.withStrength(first);
        AnalysisSettings b = settings.withStrength(second);
        List<Row> rows = new ArrayList<>(scale.notes().size());
        for (Note n : scale.notes()) {
            NoteResult ra = NoteCalculator.compute(n, pitch, a);
            NoteResult rb = NoteCalculator.compute(n, pitch, b);
            rows.add(new Row(n.key(), KeyNames.name(n.key()), n.wire().diameter(), ra.breakingStrength(),
                    rb.breakingStrength(), ra.breakPct(), rb.breakPct()));
        }
        return new StrengthComparison(first, second, rows);
    }

    /** @return the smallest {@link Row#secondStrongerPct()} over the notes, % */
    public double minSecondStrongerPct() {
        return rows.stream().mapToDouble(Row::secondStrongerPct).min().orElse(0);
    }

    /** @return the largest {@link Row#secondStrongerPct()} over the notes, % */
    public double maxSecondStrongerPct() {
        return rows.stream().mapToDouble(Row::secondStrongerPct).max().orElse(0);
    }
}
