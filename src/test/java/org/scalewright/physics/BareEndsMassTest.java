package org.scalewright.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Materials;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;

/**
 * The effective mass per length of a wound string with bare core at its ends (DESIGN §3):
 * the closed form against Rayleigh's weighted mean (2/L) ∫ μ(x) sin²(πx/L) dx integrated
 * numerically (Commons Math Gauss–Legendre, to 1e-13), its preconditions, and how
 * {@link NoteCalculator} uses it. Its accuracy as a tension is {@code BareEndsEigenTest}'s.
 */
class BareEndsMassTest {
    private static final AnalysisSettings S = BuiltInData.defaultSettings();
    private static final Materials M = S.materials();

    /** @return (2/L) ∫₀ᴸ μ(x) sin²(πx/L) dx for μ = muC on the bare ends, muW between, numerically, kg/m */
    private static double rayleighMean(double muW, double muC, double length, double a, double b) {
        UnivariateFunction weight = x -> Math.pow(Math.sin(Math.PI * x / length), 2);
        var gauss = new IterativeLegendreGaussIntegrator(8, 1e-15, 1e-15);
        double sum = 0;
        double[] edges = {0, a, length - b, length};
        double[] mus = {muC, muW, muC};
        for (int i = 0; i < 3; i++) {
            if (edges[i + 1] > edges[i]) {
                sum += mus[i] * gauss.integrate(100_000, weight, edges[i], edges[i + 1]);
            }
        }
        return 2 / length * sum;
    }

    @ParameterizedTest(name = "L = {0} m, bare {1} + {2} mm")
    @CsvSource({"1.40, 40, 40", "1.40, 80, 0", "1.40, 0, 80", "1.20, 350, 350", "1.0, 500, 500", "1.0, 1000, 0",
            "0.9, 0, 0", "1.48, 3, 12"})
    @DisplayName("closed form = the sin²-weighted mean of μ(x), integrated numerically (Commons Math)")
    void closedFormMatchesTheIntegral(double length, double frontMm, double backMm) {
        double muW = 0.065;
        double muC = 0.0139;
        double a = frontMm * 1e-3;
        double b = backMm * 1e-3;
        double expected = rayleighMean(muW, muC, length, a, b);
        assertEquals(expected, StringPhysics.effectiveMassPerLength(muW, muC, length, a, b), expected * 1e-13);
    }

    @Test
    @DisplayName("no bare core gives μ_w; all of it bare gives μ_core; bare ends weigh little, the middle much")
    void limits() {
        assertEquals(0.05, StringPhysics.effectiveMassPerLength(0.05, 0.01, 1.2, 0, 0), 0);
        assertEquals(0.01, StringPhysics.effectiveMassPerLength(0.05, 0.01, 1.2, 1.2, 0), 1e-15);
        assertEquals(0.01, StringPhysics.effectiveMassPerLength(0.05, 0.01, 1.2, 0.6, 0.6), 1e-15);
        // a quarter of the length bare at each end: 2 (1/8 − 1/(4π)) × 2 = 0.1817 of the difference (hand-worked)
        double quarter = StringPhysics.effectiveMassPerLength(0.05, 0.01, 1.2, 0.3, 0.3);
        assertEquals(0.05 - 0.04 * (0.5 - 1 / Math.PI), quarter, 1e-15);
    }

    @Test
    @DisplayName("preconditions name the parameter and its value")
    void preconditions() {
        assertMessage("bare core at the front must be >= 0 mm, was -5",
                () -> StringPhysics.effectiveMassPerLength(0.05, 0.01, 1.2, -0.005, 0));
        assertMessage("bare core at the back must be >= 0 mm, was -1",
                () -> StringPhysics.effectiveMassPerLength(0.05, 0.01, 1.2, 0, -0.001));
        assertMessage("speaking length must be > 0 mm, was 0",
                () -> StringPhysics.effectiveMassPerLength(0.05, 0.01, 0, 0, 0));
        assertMessage("wound mass per length must be > 0 g/m, was -50",
                () -> StringPhysics.effectiveMassPerLength(-0.05, 0.01, 1.2, 0, 0));
        assertMessage("core mass per length must be > 0 g/m, was NaN",
                () -> StringPhysics.effectiveMassPerLength(0.05, Double.NaN, 1.2, 0, 0));
        assertMessage("bare core at the front and back together must be <= the speaking length 1200 mm, was 1300 mm",
                () -> StringPhysics.effectiveMassPerLength(0.05, 0.01, 1.2, 0.7, 0.6));
    }

    private static void assertMessage(String message, Runnable call) {
        var e = assertThrows(IllegalArgumentException.class, call::run);
        assertEquals(message, e.getMessage());
    }

    private static Note bassNote(double length, Double windingM) {
        return new Note(3, 1, length, CoreWire.ofDiameter(1.6e-3), new Wrap(1.13e-3, 0.98e-3, WrapMetal.COPPER),
                OptionalDouble.empty(), 0, OptionalDouble.empty(), OptionalDouble.empty(),
                windingM == null ? OptionalDouble.empty() : OptionalDouble.of(windingM), "bass", "");
    }

    @Test
    @DisplayName("NoteCalculator: a winding as long as the speaking length or longer leaves no bare core")
    void windingAtLeastTheSpeakingLength() {
        double noWinding = NoteCalculator.compute(bassNote(1.446, null), PitchStandard.ISO_16, S)
                .tension();
        for (double winding : new double[] {1.446, 1.483}) {
            NoteResult r = NoteCalculator.compute(bassNote(1.446, winding), PitchStandard.ISO_16, S);
            assertEquals(noWinding, r.tension(), 0, "winding " + winding);
        }
    }

    @Test
    @DisplayName("NoteCalculator: only the wound length given, the bare core is split equally between the ends")
    void shorterWindingSplitsTheBareCoreEqually() {
        double length = 1.446;
        double winding = 1.300;
        Note n = bassNote(length, winding);
        NoteResult r = NoteCalculator.compute(n, PitchStandard.ISO_16, S);
        double d = 1.6e-3;
        double muW = StringPhysics.massPerLength(d, n.wrap(), M);
        double muC = StringPhysics.plainMassPerLength(d, M.steelDensity());
        double half = (length - winding) / 2;
        double muEff = StringPhysics.effectiveMassPerLength(muW, muC, length, half, half);
        assertEquals(muEff, r.massPerLength(), muEff * 1e-15);
        double k = StringPhysics.stiffness(d, length, M.youngsModulus());
        double t = StringPhysics.tension(length, muEff, r.frequency(), k);
        assertEquals(t, r.tension(), t * 1e-15);
        // unequal splits of the same bare length weigh more bare core nearer the middle, so less mass: the split matters
        assertTrue(StringPhysics.effectiveMassPerLength(muW, muC, length, 2 * half, 0) < muEff);
        // and a plain string ignores a wound length
        Note plain = Note.plain(40, 3, 0.8, CoreWire.ofDiameter(1.0e-3));
        assertEquals(StringPhysics.plainMassPerLength(1.0e-3, M.steelDensity()), NoteCalculator.massForFundamental(plain, M), 0);
    }
}
