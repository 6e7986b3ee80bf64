package org.scalewright.model;

/**
 * The pitch standard: the frequency of A4 (key 49).
 *
 * @param a4 frequency of A4, Hz, in (0, 1000)
 */
public record PitchStandard(double a4) {
    /** A4 = 440 Hz, the standard tuning frequency of ISO 16:1975. */
    public static final PitchStandard ISO_16 = new PitchStandard(440.0);

    public PitchStandard {
        Checks.positive("A4 frequency", a4, "Hz", 1);
        if (a4 >= 1000) {
            throw new IllegalArgumentException("A4 frequency must be < 1000 Hz, was " + a4);
        }
    }
}
