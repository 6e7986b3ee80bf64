package org.scalewright.model;

/**
 * Exact conversion factors between SI and the customary units the trade uses.
 * Source: NIST Special Publication 811 (2008), Appendix B.8 and B.9.
 */
public final class UnitConversions {
    /** 1 in = 0.0254 m (exact, NIST SP 811 B.8). */
    public static final double METRES_PER_INCH = 0.0254;
    /** 1 lbf = 4.448 221 615 260 5 N (NIST SP 811 B.8). */
    public static final double NEWTONS_PER_LBF = 4.4482216152605;
    /** 1 kgf = 9.806 65 N (exact, NIST SP 811 B.8). */
    public static final double NEWTONS_PER_KGF = 9.80665;
    /** 1 ksi = 6.894 757 MPa (NIST SP 811 B.8). */
    public static final double PASCALS_PER_KSI = 6.894757293168e6;

    private UnitConversions() {
    }

    /** @param newtons force in N @return force in lbf */
    public static double newtonsToLbf(double newtons) {
        return newtons / NEWTONS_PER_LBF;
    }

    /** @param lbf force in lbf @return force in N */
    public static double lbfToNewtons(double lbf) {
        return lbf * NEWTONS_PER_LBF;
    }

    /** @param newtons force in N @return force in kgf */
    public static double newtonsToKgf(double newtons) {
        return newtons / NEWTONS_PER_KGF;
    }
}
