package org.scalewright.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Conversion factors against NIST Special Publication 811 (2008), Appendix B.8/B.9, whose
 * tables give the factors to 7 significant digits (exact ones marked exact there); the exact
 * factors are also derived from their definitions (1 lb = 0.453 592 37 kg exactly, standard
 * gravity g_n = 9.806 65 m/s² exactly, both in SP 811).
 */
class UnitConversionsTest {
    private static final double LB_KG = 0.45359237;   // NIST SP 811, B.8 "pound (avoirdupois)", exact
    private static final double G_N = 9.80665;        // NIST SP 811, standard acceleration of gravity, exact

    @Test
    @DisplayName("inch = 2.54 E-02 m exactly (NIST SP 811 B.8)")
    void inch() {
        assertEquals(2.54e-2, UnitConversions.METRES_PER_INCH, 0.0);
    }

    @Test
    @DisplayName("pound-force = 4.448 222 E+00 N (NIST SP 811 B.8), = 0.453 592 37 kg × 9.806 65 m/s²")
    void poundForce() {
        assertEquals(4.448222, UnitConversions.NEWTONS_PER_LBF, 0.0000005);
        assertEquals(LB_KG * G_N, UnitConversions.NEWTONS_PER_LBF, 1e-13);
        assertEquals(1000.0, UnitConversions.lbfToNewtons(UnitConversions.newtonsToLbf(1000.0)), 1e-10);
        assertEquals(224.8089, UnitConversions.newtonsToLbf(1000.0), 0.00005); // 1 kN in lbf, hand-worked 1000/4.448222
    }

    @Test
    @DisplayName("kilogram-force = 9.806 65 E+00 N exactly (NIST SP 811 B.8)")
    void kilogramForce() {
        assertEquals(9.80665, UnitConversions.NEWTONS_PER_KGF, 0.0);
        assertEquals(100.0, UnitConversions.newtonsToKgf(980.665), 1e-12);
    }

    @Test
    @DisplayName("kip per square inch = 6.894 757 E+06 Pa (NIST SP 811 B.8) = 1000 lbf / in²")
    void ksi() {
        assertEquals(6.894757e6, UnitConversions.PASCALS_PER_KSI, 0.5);
        double derived = 1000 * LB_KG * G_N / (0.0254 * 0.0254);
        assertEquals(derived, UnitConversions.PASCALS_PER_KSI, 1e-6);
    }

    @Test
    @DisplayName("length units: 1 in = 25.4 mm, round trips exact to rounding, symbols")
    void lengthUnits() {
        assertEquals(0.0254, LengthUnit.IN.toMetres(1.0), 0.0);
        assertEquals(0.001, LengthUnit.MM.toMetres(1.0), 0.0);
        assertEquals(25.4, LengthUnit.MM.fromMetres(LengthUnit.IN.toMetres(1.0)), 1e-12);
        assertEquals(1.0, LengthUnit.IN.fromMetres(LengthUnit.MM.toMetres(25.4)), 1e-15);
        for (double v : new double[] {0.001, 0.033, 0.0345, 1, 12.5, 647.7, 2100}) {
            for (LengthUnit u : LengthUnit.values()) {
                assertEquals(v, u.fromMetres(u.toMetres(v)), Math.ulp(v) * 4, u + " " + v);
            }
        }
        // a millimetre value converts like the decimal literal in metres (division by the exact 1000)
        assertEquals(1.3e-3, LengthUnit.MM.toMetres(1.3), 0.0);
        assertEquals(0.925e-3, LengthUnit.MM.toMetres(0.925), 0.0);
        assertEquals(1.3, LengthUnit.MM.fromMetres(1.3e-3), 0.0);
        assertEquals("mm", LengthUnit.MM.symbol());
        assertEquals("in", LengthUnit.IN.symbol());
        assertSame(LengthUnit.IN, LengthUnit.ofSymbol("IN"));
        assertSame(LengthUnit.MM, LengthUnit.ofSymbol("mm"));
        assertNull(LengthUnit.ofSymbol("cm"));
    }
}
