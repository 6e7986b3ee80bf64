package org.scalewright.physics;

import org.scalewright.model.Checks;
import org.scalewright.model.Note;

/**
 * What a string that broke at a known pitch says about its wire: the stress in its core at that
 * pitch, beside the strength table's figure for that diameter.
 *
 * <p>The stress is the stiff-string tension at the break pitch over the core's area (DESIGN §3):
 * σ = (4 L² μ f² − K) / (π d²/4). For plain wire that is 4 L² f² ρ less the small stiffness term
 * K/A = π² E d² / (16 L²), whatever the diameter; for a wound string the core carries the whole
 * tension, the winding only adds mass, so the core's stress is the tension over the core's area.
 * A string that breaks during a pitch raise at a pitch read off a tuning device is the best
 * measure of its wire's real strength: a ratio well under 1 says the wire was weaker than the
 * table (or damaged at a bearing point), about 1 or more that it broke where the table says wire
 * of that size breaks.
 *
 * @param key           key number of the string
 * @param breakHz       the pitch at which it broke, Hz
 * @param stress        stress in the core at that pitch, Pa
 * @param tableStrength the strength table's breaking strength for the core's diameter, Pa
 * @param ratio         stress over table strength (1 = broke exactly at the table's figure)
 * @param stiffnessTerm the stiffness term K/A taken off 4 L² μ f² / A, Pa (for plain wire
 *                      π² E d² / (16 L²): a few hundredths of a MPa in the treble)
 */
public record StressAtBreak(int key, double breakHz, double stress, double tableStrength, double ratio,
                            double stiffnessTerm) {

    /**
     * @param note     the broken string's note as strung (speaking length, wire, winding)
     * @param breakHz  the pitch at which it broke, Hz, &gt; 0 and finite
     * @param settings materials (densities, Young's modulus) and the strength table
     * @return the stress at break and its ratio to the table's strength
     * @throws IllegalArgumentException naming the pitch when it is not positive and finite
     */
    public static StressAtBreak of(Note note, double breakHz, AnalysisSettings settings) {
        Checks.positive("pitch at break", breakHz, "Hz", 1);
        NoteResult r = NoteCalculator.computeAt(note, breakHz, settings);
        double stiffness = r.stiffness() / StringPhysics.area(r.coreDiameter());
        return new StressAtBreak(note.key(), breakHz, r.stress(), r.breakingStrength(),
                r.stress() / r.breakingStrength(), stiffness);
    }
}
