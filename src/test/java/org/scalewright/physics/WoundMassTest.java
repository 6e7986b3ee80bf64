package org.scalewright.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.analysis.integration.UnivariateIntegrator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.scalewright.model.Materials;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;

/**
 * Wound-string mass per length against the helix the wrap wire really follows.
 *
 * <p>A close-wound round wrap wire of diameter w laid on a diameter D (the core, or the core
 * plus the first wrap) has its centre line on a helix of radius r = (D + w)/2 advancing w per
 * turn (geometry of a close-wound helix). Its mass per unit string length is
 * ρ_w · (π w²/4) · (helix length of one turn)/w. The helix length is integrated numerically here
 * (Commons Math Gauss–Legendre quadrature of the speed |dr/dt| of the parametrised helix
 * x = r cos t, y = r sin t, z = w t/(2π)), independently of the engine's closed form
 * ρ_w π² w D h/4, h = √(1 + (w/(π D))²), D = 2r (DESIGN §3).
 *
 * <p>Tolerance: the quadrature is good to 1e-14 of the turn length (checked against the
 * unrolled turn), so the engine must agree to 1e-12 of μ. The helical factor raises μ over the
 * pitch-free formula the engine used before by x²/2 of the wrap's share (x = w/(π D)): about
 * 0.1–0.2 % for tenor wraps (w ≈ D/4), up to about 1 % for the heaviest bass wraps (w ≈ D).
 */
class WoundMassTest {
    private static final Materials M = new Materials(7850, 8960, 7870, 200e9);
    private static final UnivariateIntegrator GAUSS = new IterativeLegendreGaussIntegrator(5, 1e-14, 1e-14);
    private static final double AGREEMENT = 1e-12; // relative, from the quadrature's 1e-14

    /** @return the length of one turn of the helix of radius r and pitch p, numerically, m */
    static double helixTurnLength(double r, double p) {
        UnivariateFunction speed = t -> {
            double dx = -r * Math.sin(t);
            double dy = r * Math.cos(t);
            double dz = p / (2 * Math.PI);
            return Math.sqrt(dx * dx + dy * dy + dz * dz);
        };
        return GAUSS.integrate(10_000, speed, 0, 2 * Math.PI);
    }

    /** @return mass per string length of one close-wound wrap of wire w on diameter under, by the helix, kg/m */
    static double helixWrapMass(double under, double w, double rho) {
        return rho * Math.PI * w * w / 4 * helixTurnLength((under + w) / 2, w) / w;
    }

    /** @return the pitch-free wrap mass the engine used before: each turn π D long, kg/m */
    static double pitchFreeWrapMass(double under, double w, double rho) {
        return rho * Math.PI * Math.PI * w * (under + w) / 4;
    }

    @Test
    @DisplayName("the numerical helix length matches the unrolled turn √((π D)² + p²) (helix geometry)")
    void helixLengthQuadrature() {
        for (double[] rp : new double[][] {{0.6e-3, 0.3e-3}, {1.5e-3, 1.6e-3}, {1e-3, 0}}) {
            double r = rp[0];
            double p = rp[1];
            assertEquals(Math.hypot(2 * Math.PI * r, p), helixTurnLength(r, p), 1e-15);
        }
    }

    @ParameterizedTest(name = "core {0} mm, wrap {1} mm {2}")
    @CsvSource({"1.0, 0.25, COPPER", "1.0, 0.30, COPPER", "0.9, 0.30, IRON", "1.1, 0.50, COPPER",
            "1.3, 0.90, COPPER", "1.2, 1.20, COPPER", "1.1, 0.6, STEEL"})
    @DisplayName("single-wound mass: engine = steel core + numerical helix wrap (Commons Math quadrature)")
    void singleWound(double coreMm, double wrapMm, WrapMetal metal) {
        double d = coreMm * 1e-3;
        double w = wrapMm * 1e-3;
        double rho = M.densityOf(metal);
        double core = 7850 * Math.PI * d * d / 4;
        double helixWrap = helixWrapMass(d, w, rho);
        double engine = StringPhysics.massPerLength(d, Wrap.single(w, metal), M);

        assertEquals(core + helixWrap, engine, engine * AGREEMENT);
        assertEquals(helixWrap, StringPhysics.wrapLayerMassPerLength(d, w, rho), helixWrap * AGREEMENT);
        // what the helical factor adds over the pitch-free formula: x²/2 of the wrap's share
        double pitchFree = core + pitchFreeWrapMass(d, w, rho);
        double raise = engine / pitchFree - 1;
        double x = w / (Math.PI * (d + w));
        assertEquals(x * x / 2 * (pitchFree - core) / pitchFree, raise, raise * 0.01, "≈ x²/2 of the wrap's share");
        assertTrue(raise > 0, "the helix is always longer than its pitch-free turn");
        assertTrue(raise < 0.012, "within 1.2 % for realistic sizes, was " + 100 * raise + " %");
        if (w <= d * 0.3) {
            assertTrue(raise < 0.002, "tenor-size wraps within 0.2 %, was " + 100 * raise + " %");
        }
    }

    @ParameterizedTest(name = "core {0} mm, wraps {1} + {2} mm {3}")
    @CsvSource({"1.4, 0.6, 1.3, COPPER", "1.6, 0.8, 1.6, COPPER", "1.5, 0.5, 1.0, COPPER", "1.3, 0.3, 0.7, IRON"})
    @DisplayName("double-wound mass: the second wrap's helix lies on core + 2 × first wrap (Commons Math quadrature)")
    void doubleWound(double coreMm, double w1Mm, double w2Mm, WrapMetal metal) {
        double d = coreMm * 1e-3;
        double w1 = w1Mm * 1e-3;
        double w2 = w2Mm * 1e-3;
        double rho = M.densityOf(metal);
        double core = 7850 * Math.PI * d * d / 4;
        double inner = helixWrapMass(d, w1, rho);
        double outer = helixWrapMass(d + 2 * w1, w2, rho);
        double engine = StringPhysics.massPerLength(d, new Wrap(w1, w2, metal), M);

        assertEquals(core + inner + outer, engine, engine * AGREEMENT);
        double pitchFree = core + pitchFreeWrapMass(d, w1, rho) + pitchFreeWrapMass(d + 2 * w1, w2, rho);
        double raise = engine / pitchFree - 1;
        assertTrue(raise > 0 && raise < 0.008, "within 0.8 %, was " + 100 * raise + " %");
        // and the second wrap really adds mass over the single-wound string of the same core and first wrap
        assertTrue(engine > StringPhysics.massPerLength(d, Wrap.single(w1, metal), M));
    }

    @Test
    @DisplayName("helical factor: 1 without pitch, √2 when the advance equals the circumference (hand-worked)")
    void helicalFactor() {
        assertEquals(1.0, StringPhysics.helicalFactor(0, 2e-3), 0);
        assertEquals(Math.sqrt(2), StringPhysics.helicalFactor(Math.PI * 2e-3, 2e-3), 1e-15);
    }

    @Test
    @DisplayName("plain wire: μ = ρ π d²/4 and a wound string without wrap is plain wire")
    void plainWire() {
        double d = 1.025e-3;
        assertEquals(7850 * Math.PI * d * d / 4, StringPhysics.massPerLength(d, null, M), 1e-18);
        assertEquals(StringPhysics.plainMassPerLength(d, 7850), StringPhysics.massPerLength(d, null, M), 0.0);
        // iron is lighter than copper: same sizes, lighter string
        assertTrue(StringPhysics.massPerLength(d, Wrap.single(0.4e-3, WrapMetal.IRON), M)
                < StringPhysics.massPerLength(d, Wrap.single(0.4e-3, WrapMetal.COPPER), M));
    }
}
