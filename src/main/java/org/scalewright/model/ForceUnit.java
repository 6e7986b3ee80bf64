package org.scalewright.model;


/**
 * A unit of force used for display (charts, tables). Inside the engine every force is in
 * newtons. Factors from NIST SP 811 (2008), B.8, via {@link UnitConversions}.
 */
public enum ForceUnit {
    /** Newtons. */
    N("N", 1.0),
    /** Pounds-force: 1 lbf = 4.448 221 615 260 5 N. */
    LBF("lbf", UnitConversions.NEWTONS_PER_LBF),
    /** Kilograms-force: 1 kgf = 9.806 65 N. */
    KGF("kgf", UnitConversions.NEWTONS_PER_KGF);

    private final String symbol;
    private final double newtons;

    ForceUnit(String symbol, double newtons) {
        this.symbol = symbol;
        this.newtons = newtons;
    }

    /** @return the display symbol: {@code N}, {@code lbf} or {@code kgf} */
    public String symbol() {
        return symbol;
    }

    /** @param n a force in newtons @return the same force in this unit */
    public double fromNewtons(double n) {
        return n / newtons;
    }

    /** @param value a force in this unit @return the same force in newtons */
    public double toNewtons(double value) {
        return value * newtons;
    }
}
