package org.scalewright.app.rescale;

import java.util.Locale;
import org.scalewright.app.session.DisplayFormat;
import org.scalewright.design.rescale.KeyChange;
import org.scalewright.model.DisplayUnits;
import org.scalewright.model.Note;

/**
 * One line of the rescaling panel's change table, as text in the display units.
 *
 * @param key       key number
 * @param note      note name
 * @param wire      old → new wire (one value when unchanged)
 * @param tension   per-string tension old → new
 * @param breakPct  percent of breaking strength old → new
 * @param deviation deviation of the new tension from the target, % (signed)
 * @param changed   true when the wire or wrap changes
 */
record RescaleChangeRow(int key, String note, String wire, String tension, String breakPct, String deviation,
                        boolean changed) {

    static RescaleChangeRow of(KeyChange c, DisplayUnits u) {
        String before = wire(c.before(), u);
        String after = wire(c.after(), u);
        return new RescaleChangeRow(c.key(), c.afterResult().noteName(),
                before.equals(after) ? before : before + " → " + after,
                DisplayFormat.force(c.beforeResult().tension(), u) + " → " + DisplayFormat.force(c.afterResult().tension(), u),
                DisplayFormat.fixed(c.beforeResult().breakPct(), 1) + " → " + DisplayFormat.fixed(c.afterResult().breakPct(), 1),
                String.format(Locale.ROOT, "%+.1f", c.deviationPct()), c.changed());
    }

    /** @return a plain wire as {@code #14.5} or a diameter; a wound string as core/wrap[+wrap] */
    static String wire(Note n, DisplayUnits u) {
        String core = n.wire().musicWireSize().isPresent() ? "#" + DisplayFormat.size(n.wire().musicWireSize().getAsDouble())
                : DisplayFormat.diameter(n.wire().diameter(), u);
        if (!n.isWound()) {
            return core;
        }
        String w = core + "/" + DisplayFormat.diameter(n.wrap().inner(), u);
        if (n.wrap().isDouble()) {
            w += "+" + DisplayFormat.diameter(n.wrap().outer(), u);
        }
        return w;
    }
}
