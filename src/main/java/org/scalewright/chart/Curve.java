package org.scalewright.chart;

import org.scalewright.model.DisplayUnits;
import org.scalewright.physics.NoteResult;

/** The three curves drawn over key number. */
public enum Curve {
    /** Tension per string, in the display force unit. */
    TENSION("Tension per string") {
        @Override
        public double value(NoteResult r, DisplayUnits units) {
            return units.force().fromNewtons(r.tension());
        }

        @Override
        public String axisLabel(DisplayUnits units) {
            return "tension per string, " + units.force().symbol();
        }
    },
    /** Core stress as percent of the wire's breaking strength. */
    BREAK_PERCENT("Percent of breaking strength") {
        @Override
        public double value(NoteResult r, DisplayUnits units) {
            return r.breakPct();
        }

        @Override
        public String axisLabel(DisplayUnits units) {
            return "% of breaking strength";
        }
    },
    /** Inharmonicity coefficient B, drawn on a logarithmic axis. */
    INHARMONICITY("Inharmonicity B") {
        @Override
        public double value(NoteResult r, DisplayUnits units) {
            return r.inharmonicity();
        }

        @Override
        public String axisLabel(DisplayUnits units) {
            return "inharmonicity B (log scale)";
        }
    };

    private final String title;

    Curve(String title) {
        this.title = title;
    }

    /** @return the curve's title in plain words */
    public String title() {
        return title;
    }

    /** @return the value drawn for one note, in display units */
    public abstract double value(NoteResult r, DisplayUnits units);

    /** @return the value axis label in display units */
    public abstract String axisLabel(DisplayUnits units);

    /** @return true when the value can be drawn (finite; positive on the logarithmic axis) */
    public boolean drawable(double v) {
        return Double.isFinite(v) && (this != INHARMONICITY || v > 0);
    }
}
