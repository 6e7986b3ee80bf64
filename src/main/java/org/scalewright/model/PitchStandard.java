package org.scalewright.model;

/**
 * The pitch standard: the frequency of A4 (key 49).
 *
 * <p>A value a user gives (a {@code --a4} option, a sheet's {@code # a4_hz:} comment, the
 * window's A4 fields) goes through {@link #of(double)}, the one place that says which pitch
 * standards are accepted: {@value #LOWEST_HZ} to {@value #HIGHEST_HZ} Hz, which covers every
 * historical and modern standard (common practice, no source). The constructor itself only
 * requires a positive, finite frequency, so the engine can try a pitch standard outside that
 * range (a diagnosis remedy, a test).
 *
 * @param a4 frequency of A4, Hz, finite and &gt; 0
 */
public record PitchStandard(double a4) {
    /** The lowest pitch standard a user may give, Hz. */
    public static final double LOWEST_HZ = 300;
    /** The highest pitch standard a user may give, Hz. */
    public static final double HIGHEST_HZ = 600;
    /** A4 = 440 Hz, the standard tuning frequency of ISO 16:1975. */
    public static final PitchStandard ISO_16 = new PitchStandard(440.0);

    public PitchStandard {
        Checks.positive("A4 frequency", a4, "Hz", 1);
    }

    /**
     * The pitch standard a user asked for.
     *
     * @param hz frequency of A4, Hz, {@value #LOWEST_HZ} to {@value #HIGHEST_HZ}
     * @return the pitch standard
     * @throws InvalidInput when {@code hz} is outside that range or not a number; the message is
     *                      the one both front ends show:
     *                      {@code pitch standard A4 must be 300 to 600 Hz, was 1200}
     */
    public static PitchStandard of(double hz) {
        if (!(hz >= LOWEST_HZ && hz <= HIGHEST_HZ)) {
            throw new InvalidInput("pitch standard A4 must be " + Checks.format(LOWEST_HZ) + " to "
                    + Checks.format(HIGHEST_HZ) + " Hz, was " + Checks.format(hz));
        }
        return new PitchStandard(hz);
    }
}
