package org.scalewright.design.stretch;

import java.util.OptionalDouble;
import org.scalewright.physics.Pitch;

/**
 * The stretched tuning of one key.
 *
 * @param key             key number
 * @param noteName        note name, sharps
 * @param inharmonicity   the note's B at its working pitch (NaN when the analysis has none)
 * @param equalTemperedHz the key's equal-tempered pitch under the scale's pitch standard, Hz
 * @param tunedHz         the stretched pitch, Hz, or empty when it cannot be found (the octave
 *                        partner toward the middle of the keyboard is missing or has no B)
 */
public record StretchPoint(int key, String noteName, double inharmonicity, double equalTemperedHz,
                           OptionalDouble tunedHz) {

    public StretchPoint {
        tunedHz = tunedHz == null ? OptionalDouble.empty() : tunedHz;
    }

    /** @return true when the stretched pitch is known */
    public boolean known() {
        return tunedHz.isPresent();
    }

    /** @return the deviation of the stretched pitch from equal temperament, cents (sharp positive), or empty */
    public OptionalDouble stretchCents() {
        return tunedHz.isPresent() ? OptionalDouble.of(Pitch.cents(equalTemperedHz, tunedHz.getAsDouble()))
                : OptionalDouble.empty();
    }
}
