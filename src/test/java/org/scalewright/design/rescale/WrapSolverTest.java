package org.scalewright.design.rescale;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.Materials;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;
import org.scalewright.physics.StringPhysics;

/**
 * The closed-form wrap against numerical root-finding: Commons Math's {@link BrentSolver}
 * (an independent general-purpose library) solving tension(w) = target with the engine's own
 * forward physics (DESIGN §3 mass per length and stiff-string tension).
 */
class WrapSolverTest {
    private static final Materials M = BuiltInData.materials();

    private static double tension(double core, Wrap wrap, double length, double f) {
        double k = StringPhysics.stiffness(core, length, M.youngsModulus());
        return StringPhysics.tension(length, StringPhysics.massPerLength(core, wrap, M), f, k);
    }

    private record Case(double core, double length, double f, double target, WrapMetal metal) {
    }

    private static Case randomCase(Random rnd) {
        double core = (0.9 + 0.8 * rnd.nextDouble()) * 1e-3;
        double length = 0.8 + 0.8 * rnd.nextDouble();
        double f = 27.5 * Math.pow(2, rnd.nextDouble() * 2.5);
        WrapMetal metal = WrapMetal.values()[rnd.nextInt(3)];
        double coreOnly = tension(core, null, length, f);
        double target = Math.max(coreOnly * 1.05, 600 + 1200 * rnd.nextDouble());
        return new Case(core, length, f, target, metal);
    }

    private static double brent(UnivariateFunction g) {
        return new BrentSolver(1e-15, 1e-15).solve(1000, g, 1e-7, 6e-3);
    }

    @Test
    void singleWrapMatchesBrentRoot() {
        Random rnd = new Random(1);
        for (int i = 0; i < 200; i++) {
            Case c = randomCase(rnd);
            double k = StringPhysics.stiffness(c.core, c.length, M.youngsModulus());
            double mu = WrapSolver.neededMassPerLength(c.target, c.length, c.f, k);
            Wrap w = WrapSolver.exact(c.core, mu, WindingRule.single(), c.metal, M).orElseThrow();
            double root = brent(w1 -> tension(c.core, Wrap.single(w1, c.metal), c.length, c.f) - c.target);
            assertEquals(root, w.inner(), 1e-12, "case " + i);
            assertEquals(0, w.outer());
            assertEquals(c.target, tension(c.core, w, c.length, c.f), 1e-9 * c.target);
        }
    }

    @Test
    void doubleWrapByRatioMatchesBrentRoot() {
        Random rnd = new Random(2);
        for (int i = 0; i < 200; i++) {
            Case c = randomCase(rnd);
            double r = 0.6 + 0.8 * rnd.nextDouble();
            double k = StringPhysics.stiffness(c.core, c.length, M.youngsModulus());
            double mu = WrapSolver.neededMassPerLength(c.target, c.length, c.f, k);
            Wrap w = WrapSolver.exact(c.core, mu, WindingRule.outerRatio(r), c.metal, M).orElseThrow();
            double root = brent(w1 -> tension(c.core, new Wrap(w1, r * w1, c.metal), c.length, c.f) - c.target);
            assertEquals(root, w.inner(), 1e-12, "case " + i);
            assertEquals(r * root, w.outer(), 1e-12, "case " + i);
        }
    }

    @Test
    void doubleWrapWithFixedInnerMatchesBrentRoot() {
        Random rnd = new Random(3);
        int solved = 0;
        for (int i = 0; i < 200; i++) {
            Case c = randomCase(rnd);
            double inner = (0.2 + 0.6 * rnd.nextDouble()) * 1e-3;
            double k = StringPhysics.stiffness(c.core, c.length, M.youngsModulus());
            double mu = WrapSolver.neededMassPerLength(c.target, c.length, c.f, k);
            var w = WrapSolver.exact(c.core, mu, WindingRule.fixedInner(inner), c.metal, M);
            boolean innerTooHeavy = tension(c.core, Wrap.single(inner, c.metal), c.length, c.f) >= c.target;
            assertEquals(innerTooHeavy, w.isEmpty(), "case " + i);
            if (w.isPresent()) {
                double root = brent(w2 -> tension(c.core, new Wrap(inner, w2, c.metal), c.length, c.f) - c.target);
                assertEquals(root, w.get().outer(), 1e-12, "case " + i);
                assertEquals(inner, w.get().inner());
                solved++;
            }
        }
        assertTrue(solved > 50, "enough solvable cases: " + solved);
    }

    @Test
    void aCoreHeavierThanTheTargetNeedsGivesNoWrap() {
        double core = 1.2e-3;
        double length = 1.0;
        double f = 100;
        double coreOnly = tension(core, null, length, f);
        double k = StringPhysics.stiffness(core, length, M.youngsModulus());
        double mu = WrapSolver.neededMassPerLength(coreOnly * 0.99, length, f, k);
        assertTrue(WrapSolver.exact(core, mu, WindingRule.single(), WrapMetal.COPPER, M).isEmpty());
    }

    /** Hand-worked: the positive root of x² + 3x − 10 = 0 is 2. */
    @Test
    void positiveRootOfTheQuadratic() {
        assertEquals(2.0, WrapSolver.positiveRoot(3, 10), 1e-15);
    }

    @Test
    void roundingOffersTheListedWiresEitherSide() {
        WrapWires wires = WrapWires.steps(0.05e-3);
        double[] around = wires.around(0.43e-3);
        assertEquals(2, around.length);
        assertEquals(0.40e-3, around[0], 1e-12);
        assertEquals(0.45e-3, around[1], 1e-12);
        assertEquals(1, wires.around(0.35e-3).length);
        assertEquals(0.05e-3, wires.around(0.01e-3)[0], 1e-12);
        WrapWires list = WrapWires.of(List.of(0.3e-3, 0.2e-3, 0.25e-3));
        assertEquals(0.2e-3, list.thinnest(), 1e-15);
        assertEquals(0.3e-3, list.around(0.5e-3)[0], 1e-15);
        double core = 1.1e-3;
        double k = StringPhysics.stiffness(core, 1.1, M.youngsModulus());
        double mu = WrapSolver.neededMassPerLength(1000, 1.1, 87.3, k);
        Wrap exact = WrapSolver.exact(core, mu, WindingRule.outerRatio(0.9), WrapMetal.COPPER, M).orElseThrow();
        for (Wrap w : WrapSolver.roundedCandidates(exact, core, mu, wires, M)) {
            assertEquals(0, Math.IEEEremainder(w.inner() * 1e7, 0.05e-3 * 1e7), 1e-6);
            assertEquals(0, Math.IEEEremainder(w.outer() * 1e7, 0.05e-3 * 1e7), 1e-6);
            assertTrue(w.isDouble());
        }
    }
}
