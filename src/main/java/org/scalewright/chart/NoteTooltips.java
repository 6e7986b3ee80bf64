package org.scalewright.chart;

import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;
import org.jfree.chart.labels.XYToolTipGenerator;
import org.jfree.data.xy.XYDataset;
import org.scalewright.model.DisplayUnits;
import org.scalewright.physics.NoteResult;

/**
 * Hover text for a point: the note and its values in display units. The items of the one
 * series are the notes last given to {@link #show}, in order.
 */
final class NoteTooltips implements XYToolTipGenerator {
    private String scaleName = "";
    private List<NoteResult> notes = List.of();
    private DisplayUnits units = DisplayUnits.METRIC;

    void show(String name, List<NoteResult> drawn, DisplayUnits u) {
        this.scaleName = name;
        this.notes = List.copyOf(drawn);
        this.units = u;
    }

    @Override
    public String generateToolTip(XYDataset dataset, int series, int item) {
        if (item < 0 || item >= notes.size()) {
            return null;
        }
        return text(scaleName, notes.get(item), units);
    }

    /** @return the hover text of one note */
    static String text(String scaleName, NoteResult r, DisplayUnits u) {
        String text = String.format(Locale.ROOT,
                "%s, key %d %s%s: %.1f Hz, %s, %.0f %s per string, %.1f %% of breaking strength, B = %.2e, "
                        + "headroom %.0f cents",
                scaleName, r.key(), r.noteName(), r.section().isEmpty() ? "" : " (" + r.section() + ")",
                r.frequency(), r.wound() ? "wound" : "plain", u.force().fromNewtons(r.tension()), u.force().symbol(),
                r.breakPct(), r.inharmonicity(), r.headroomCents());
        if (r.isFlagged()) {
            text += "; flagged: " + r.flags().stream().map(f -> f.kind().word()).distinct()
                    .collect(Collectors.joining(", "));
        }
        return text;
    }
}
