package org.scalewright.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The check value of DESIGN §3 and the diameter-independence of plain-wire stress. */
class TradeCheckValueTest {
    private static final double RHO = 7850;   // steel, the engine's default (DESIGN §3)
    private static final double E = 200e9;

    @Test
    @DisplayName("0.254 mm plain wire, 647.7 mm, 406 Hz: 4 L² f² ρ = 2171 MPa (common practice, no source)")
    void tradeCheckValue() {
        double d = 0.254e-3;
        double l = 0.6477;
        double f = 406;
        double mu = StringPhysics.plainMassPerLength(d, RHO);
        double sigma = StringPhysics.stress(StringPhysics.flexibleTension(l, mu, f), d);
        // the trade figure is given to 4 digits: half a unit in the last digit
        assertEquals(2171e6, sigma, 0.5e6);
    }

    @Test
    @DisplayName("flexible-limit plain-wire stress 4 L² f² ρ is the same for every diameter")
    void flexibleStressIndependentOfDiameter() {
        double l = 0.6477;
        double f = 406;
        double expected = 4 * l * l * f * f * RHO;
        for (double dmm = 0.1; dmm <= 2.5; dmm += 0.05) {
            double d = dmm * 1e-3;
            double mu = StringPhysics.plainMassPerLength(d, RHO);
            double sigma = StringPhysics.stress(StringPhysics.flexibleTension(l, mu, f), d);
            assertEquals(expected, sigma, expected * 1e-12, "d = " + dmm + " mm");
        }
    }

    @Test
    @DisplayName("with stiffness, plain-wire stress is 4 L² f² ρ − K/A, K/A = π² E d² / (16 L²) (DESIGN §3, hand-worked)")
    void stiffStressIsFlexibleMinusKOverA() {
        double l = 0.6477;
        double f = 406;
        double flexible = 4 * l * l * f * f * RHO;
        double previous = Double.POSITIVE_INFINITY;
        for (double dmm = 0.7; dmm <= 1.6; dmm += 0.025) {
            double d = dmm * 1e-3;
            double mu = StringPhysics.plainMassPerLength(d, RHO);
            double k = StringPhysics.stiffness(d, l, E);
            double a = StringPhysics.area(d);
            double sigma = StringPhysics.stress(StringPhysics.tension(l, mu, f, k), d);
            assertEquals(flexible - k / a, sigma, flexible * 1e-12);
            // K/A worked by hand from K = π³ E d⁴ / (64 L²), A = π d² / 4
            assertEquals(Math.PI * Math.PI * E * d * d / (16 * l * l), k / a, k / a * 1e-12);
            assertTrue(sigma < previous, "stiffer (thicker) wire carries less stress at the same length and pitch");
            previous = sigma;
        }
    }

    @Test
    @DisplayName("the stiffness correction is small but not negligible in the top octave (DESIGN §3: about 2 %)")
    void stiffnessCorrectionInTheTreble() {
        // a plain string of top-octave size chosen for the test: 0.8 mm, 52 mm speaking length, at C8
        double d = 0.8e-3;
        double l = 0.052;
        double mu = StringPhysics.plainMassPerLength(d, RHO);
        double k = StringPhysics.stiffness(d, l, E);
        double flexible = StringPhysics.flexibleTension(l, mu, 4186.009);
        double stiff = StringPhysics.tension(l, mu, 4186.009, k);
        double relative = (flexible - stiff) / flexible;
        assertTrue(relative > 0.005 && relative < 0.05, "relative correction " + relative);
        assertEquals(k / stiff, StringPhysics.inharmonicity(k, stiff), 0.0);
    }
}
