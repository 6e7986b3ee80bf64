package org.scalewright.chart;

import java.util.function.Function;
import java.util.function.ToDoubleBiFunction;
import org.scalewright.model.DisplayUnits;
import org.scalewright.physics.NoteResult;

/** The three curves drawn over key number. */
public enum Curve {
    /** Tension per string, in the display force unit. */
    TENSION("Tension per string", (r, u) -> u.force().fromNewtons(r.tension()),
            u -> "tension per string, " + u.force().symbol()),
    /** Core stress as percent of the wire's breaking strength. */
    BREAK_PERCENT("Percent of breaking strength", (r, u) -> r.breakPct(), u -> "% of breaking strength"),
    /** Inharmonicity coefficient B, drawn on a logarithmic axis. */
    INHARMONICITY("Inharmonicity B", (r, u) -> r.inharmonicity(), u -> "inharmonicity B (log scale)");

    private final String title;
    private final ToDoubleBiFunction<NoteResult, DisplayUnits> value;
    private final Function<DisplayUnits, String> axisLabel;

    Curve(String title, ToDoubleBiFunction<NoteResult, DisplayUnits> value, Function<DisplayUnits, String> axisLabel) {
        this.title = title;
        this.value = value;
        this.axisLabel = axisLabel;
    }

    /** @return the curve's title in plain words */
    public String title() {
        return title;
    }

    /** @return the value drawn for one note, in display units */
    public double value(NoteResult r, DisplayUnits units) {
        return value.applyAsDouble(r, units);
    }

    /** @return the value axis label in display units */
    public String axisLabel(DisplayUnits units) {
        return axisLabel.apply(units);
    }

    /** @return true when the value can be drawn (finite; positive on the logarithmic axis) */
    public boolean drawable(double v) {
        return Double.isFinite(v) && (this != INHARMONICITY || v > 0);
    }
}
