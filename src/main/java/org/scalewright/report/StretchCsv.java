package org.scalewright.report;

import org.scalewright.io.CsvSheet;
import java.util.ArrayList;
import java.util.List;
import org.scalewright.design.stretch.StretchCurve;
import org.scalewright.design.stretch.StretchPoint;
import org.scalewright.model.NumberText;

/**
 * The tuning stretch as CSV ({@code stretch.csv}): {@code key, note, stretch_cents} for the
 * chosen octave type, then the pitches, B, and the stretch of any further octave types.
 */
public final class StretchCsv {
    private StretchCsv() {
    }

    /**
     * @param chosen the curve whose stretch is {@code stretch_cents}
     * @param others further curves of the same scale (other octave types), each a
     *               {@code stretch_M_N_cents} column; may be empty
     */
    public static CsvSheet sheet(StretchCurve chosen, List<StretchCurve> others, List<String> comments) {
        List<String> h = new ArrayList<>(List.of("key", "note", "stretch_cents", "octave_type", "inharmonicity_b",
                "equal_tempered_hz", "tuned_hz"));
        for (StretchCurve o : others) {
            if (o.points().size() != chosen.points().size()) {
                throw new IllegalArgumentException("stretch curves must cover the same keys");
            }
            h.add("stretch_" + o.octave().fileLabel() + "_cents");
        }
        List<List<String>> rows = new ArrayList<>();
        for (int i = 0; i < chosen.points().size(); i++) {
            StretchPoint p = chosen.points().get(i);
            List<String> c = new ArrayList<>(List.of(Integer.toString(p.key()), p.noteName(),
                    cents(p), octaveCell(chosen), NumberText.scientific(p.inharmonicity(), 4),
                    NumberText.rounded(p.equalTemperedHz(), 4),
                    p.tunedHz().isPresent() ? NumberText.rounded(p.tunedHz().getAsDouble(), 4) : ""));
            for (StretchCurve o : others) {
                c.add(cents(o.points().get(i)));
            }
            rows.add(c);
        }
        List<String> com = new ArrayList<>(comments);
        com.add("tuning stretch for " + chosen.octave().label() + " octaves (lower partial "
                + chosen.octave().lowerPartial() + " = upper partial " + chosen.octave().upperPartial()
                + "), keys 37-49 (A3-A4) at equal temperament, A4 = " + NumberText.number(chosen.a4()) + " Hz");
        com.add("stretch_cents = deviation from equal temperament, sharp positive; B at each note's working pitch");
        for (String p : chosen.problems()) {
            com.add(p);
        }
        return new CsvSheet(com, h, rows);
    }

    /** @return e.g. {@code 2:1 (m=1)}: with the words, a spreadsheet cannot take it for a time of day */
    static String octaveCell(StretchCurve c) {
        return c.octave().label() + " (m=" + c.octave().upperPartial() + ")";
    }

    private static String cents(StretchPoint p) {
        return p.stretchCents().isPresent() ? NumberText.rounded(p.stretchCents().getAsDouble(), 3) : "";
    }
}
