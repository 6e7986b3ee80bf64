package org.scalewright.model;

/**
 * A unit of length used at the edges of the program (scale sheets, display).
 * Inside the engine every length is in metres.
 */
public enum LengthUnit {
    /** Millimetres; column suffix {@code _mm}. */
    MM("mm", 1, 1000),
    /** Inches; column suffix {@code _in}. 1 in = 0.0254 m exactly (NIST SP 811, B.8). */
    IN("in", UnitConversions.METRES_PER_INCH, 1);

    private final String suffix;
    // one unit = metres / per metres; both factors are applied so that millimetres convert by an exact
    // division by 1000 (1.3 mm → 0.0013 m exactly as the literal 1.3e-3, not 1.3 × 1e-3 = 0.0013000000000000002)
    private final double metres;
    private final double per;

    LengthUnit(String suffix, double metres, double per) {
        this.suffix = suffix;
        this.metres = metres;
        this.per = per;
    }

    /** @return the column suffix and display symbol, {@code mm} or {@code in} */
    public String symbol() {
        return suffix;
    }

    /** @param value a length in this unit @return the same length in metres */
    public double toMetres(double value) {
        return value * metres / per;
    }

    /** @param metresValue a length in metres @return the same length in this unit */
    public double fromMetres(double metresValue) {
        return metresValue * per / metres;
    }

    /** @return the unit whose suffix is {@code symbol} (case-insensitive), or null */
    public static LengthUnit ofSymbol(String symbol) {
        for (LengthUnit u : values()) {
            if (u.suffix.equalsIgnoreCase(symbol)) {
                return u;
            }
        }
        return null;
    }
}
