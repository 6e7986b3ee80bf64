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
 * turn. Its mass per unit string length is ρ_w · (π w²/4) · (helix length of one turn)/w. The
 * helix length is integrated numerically here (Commons Math Gauss–Legendre quadrature of the
 * speed |dr/dt| of the parametrised helix x = r cos t, y = r sin t, z = w t/(2π)).
 *
 * <p>DESIGN §3 takes each turn's centre line as π (D + w), i.e. it leaves out the pitch. The
 * helix is longer by the factor √(1 + x²) ≈ 1 + x²/2 with x = w / (π (D + w)) (hand-worked: the
 * turn unrolls to a right triangle with legs π (D + w) and w). So the engine's wrap mass must be
 * the helix mass divided by exactly that factor, and the shortfall is x²/2 of the wrap's mass:
 * about 0.1–0.2 % for tenor wraps (w ≈ D/4), up to about 1 % for the heaviest bass wraps
 * (w ≈ D).
 */
class WoundMassTest {
    private static final Materials M = new Materials(7850, 8960, 7870, 200e9);
    private static final UnivariateIntegrator GAUSS = new IterativeLegendreGaussIntegrator(5, 1e-14, 1e-14);

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

    @Test
    @DisplayName("the numerical helix length matches the unrolled turn √((π D)² + p²) (hand-worked)")
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
    @DisplayName("single-wound mass: engine = steel core + helix wrap without its pitch (numerical helix, Commons Math)")
    void singleWound(double coreMm, double wrapMm, WrapMetal metal) {
        double d = coreMm * 1e-3;
        double w = wrapMm * 1e-3;
        double rho = M.densityOf(metal);
        double core = 7850 * Math.PI * d * d / 4;
        double helixWrap = helixWrapMass(d, w, rho);
        double x = w / (Math.PI * (d + w));
        double engine = StringPhysics.massPerLength(d, Wrap.single(w, metal), M);

        // the engine's wrap is the helix wrap without the pitch factor √(1 + x²)
        assertEquals(helixWrap / Math.sqrt(1 + x * x), engine - core, helixWrap * 1e-12);
        double shortfall = (core + helixWrap) / engine - 1;
        double predicted = (helixWrap - (engine - core)) / engine;
        assertEquals(predicted, shortfall, 1e-12);
        assertEquals(x * x / 2 * (engine - core) / engine, shortfall, shortfall * 0.01, "≈ x²/2 of the wrap's share");
        assertTrue(shortfall > 0, "the pitch-free model is always a little light");
        assertTrue(shortfall < 0.012, "within 1.2 % for realistic sizes, was " + 100 * shortfall + " %");
        if (w <= d * 0.3) {
            assertTrue(shortfall < 0.002, "tenor-size wraps within 0.2 %, was " + 100 * shortfall + " %");
        }
    }

    @ParameterizedTest(name = "core {0} mm, wraps {1} + {2} mm {3}")
    @CsvSource({"1.4, 0.6, 1.3, COPPER", "1.6, 0.8, 1.6, COPPER", "1.5, 0.5, 1.0, COPPER", "1.3, 0.3, 0.7, IRON"})
    @DisplayName("double-wound mass: the second wrap's helix lies on core + 2 × first wrap (numerical helix, Commons Math)")
    void doubleWound(double coreMm, double w1Mm, double w2Mm, WrapMetal metal) {
        double d = coreMm * 1e-3;
        double w1 = w1Mm * 1e-3;
        double w2 = w2Mm * 1e-3;
        double rho = M.densityOf(metal);
        double core = 7850 * Math.PI * d * d / 4;
        double inner = helixWrapMass(d, w1, rho);
        double outer = helixWrapMass(d + 2 * w1, w2, rho);
        double x1 = w1 / (Math.PI * (d + w1));
        double x2 = w2 / (Math.PI * (d + 2 * w1 + w2));
        double engine = StringPhysics.massPerLength(d, new Wrap(w1, w2, metal), M);

        assertEquals(core + inner / Math.sqrt(1 + x1 * x1) + outer / Math.sqrt(1 + x2 * x2), engine, engine * 1e-12);
        double shortfall = (core + inner + outer) / engine - 1;
        assertTrue(shortfall > 0 && shortfall < 0.008, "within 0.8 %, was " + 100 * shortfall + " %");
        // and the second wrap really adds mass over the single-wound string of the same core and first wrap
        assertTrue(engine > StringPhysics.massPerLength(d, Wrap.single(w1, metal), M));
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
