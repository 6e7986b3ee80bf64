package org.scalewright.app.stretch;

import java.util.List;
import java.util.Locale;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import org.scalewright.app.session.DisplayFormat;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.design.stretch.OctaveType;
import org.scalewright.design.stretch.StretchCurve;
import org.scalewright.design.stretch.StretchPoint;
import org.scalewright.design.stretch.TuningStretch;
import org.scalewright.physics.ScaleAnalysis;

/**
 * The tuning stretch the working scale's inharmonicity asks for, for the chosen octave type:
 * recomputed whenever the scale (wire, lengths, A4) or the octave type changes.
 */
public final class StretchViewModel {
    private final ScaleSession session;
    private final ObjectProperty<OctaveType> octave = new SimpleObjectProperty<>(OctaveType.TWO_ONE);
    private final ReadOnlyObjectWrapper<StretchCurve> curve = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyStringWrapper summary = new ReadOnlyStringWrapper("");
    private final BooleanProperty showAll = new SimpleBooleanProperty(false);
    private final ReadOnlyObjectWrapper<List<StretchCurve>> drawn = new ReadOnlyObjectWrapper<>(List.of());

    public StretchViewModel(ScaleSession session) {
        this.session = session;
        session.analysisProperty().addListener((o, a, b) -> refresh());
        octave.addListener((o, a, b) -> refresh());
        showAll.addListener((o, a, b) -> refresh());
        refresh();
    }

    /** @return the octave type tuned beatless */
    ObjectProperty<OctaveType> octaveProperty() {
        return octave;
    }

    /** @return the stretch of the working scale, or null when it has no notes */
    ReadOnlyObjectProperty<StretchCurve> curveProperty() {
        return curve.getReadOnlyProperty();
    }

    StretchCurve curve() {
        return curve.get();
    }

    /** @return whether the chart draws every octave type, not only the chosen one */
    BooleanProperty showAllProperty() {
        return showAll;
    }

    /** @return the curves the chart draws: the chosen octave type, or all three; empty with no scale */
    ReadOnlyObjectProperty<List<StretchCurve>> drawnProperty() {
        return drawn.getReadOnlyProperty();
    }

    /** @return the stretch at both ends and any problems, in words */
    ReadOnlyStringProperty summaryProperty() {
        return summary.getReadOnlyProperty();
    }

    /** @return the scale's title, for the chart */
    String title() {
        return session.scale().title();
    }

    private void refresh() {
        ScaleAnalysis a = session.analysis();
        OctaveType o = octave.get() == null ? OctaveType.TWO_ONE : octave.get();
        if (a == null || a.notes().isEmpty()) {
            curve.set(null);
            drawn.set(List.of());
            summary.set("No scale open: the stretch is drawn once a sheet is open.");
            return;
        }
        StretchCurve c = TuningStretch.of(a, o);
        curve.set(c);
        summary.set(describe(c));
        if (showAll.get()) {
            List<StretchCurve> all = new java.util.ArrayList<>();
            for (OctaveType t : OctaveType.values()) {
                all.add(t == o ? c : TuningStretch.of(a, t));
            }
            drawn.set(List.copyOf(all));
        } else {
            drawn.set(List.of(c));
        }
    }

    static String describe(StretchCurve c) {
        StringBuilder b = new StringBuilder();
        b.append(c.octave().label()).append(" octaves at A4 = ")
                .append(DisplayFormat.decimals(c.a4(), 1, 2)).append(" Hz, A3–A4 (keys 37–49) held at equal temperament");
        List<StretchPoint> known = c.points().stream().filter(StretchPoint::known).toList();
        if (!known.isEmpty()) {
            StretchPoint lo = known.get(0);
            StretchPoint hi = known.get(known.size() - 1);
            b.append(String.format(Locale.ROOT, ": %+.1f cents at %s (key %d), %+.1f cents at %s (key %d).",
                    lo.stretchCents().getAsDouble(), lo.noteName(), lo.key(),
                    hi.stretchCents().getAsDouble(), hi.noteName(), hi.key()));
        } else {
            b.append('.');
        }
        for (String p : c.problems()) {
            b.append(' ').append(p);
        }
        return b.toString();
    }
}
