package org.scalewright.app.rescale;

import org.scalewright.app.session.DisplayFormat;
import org.scalewright.design.rescale.KeyChange;
import org.scalewright.model.DisplayUnits;
import org.scalewright.model.Note;
import org.scalewright.model.NumberText;
import org.scalewright.model.WireNotation;

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
                NumberText.signed(c.deviationPct(), 1), c.changed());
    }

    /** @return the wire in the program's one notation ({@link WireNotation}), in the display length unit */
    static String wire(Note n, DisplayUnits u) {
        return WireNotation.of(n, u.length());
    }
}
