package org.scalewright.design.rescale;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.scalewright.model.InvalidInput;
import org.junit.jupiter.api.Test;

/** Target curves: the ways of making them and the join between sections. */
class TargetCurveTest {
    private static final int[] KEYS = {30, 31, 32, 33, 34, 35, 36, 37, 38, 39, 40};

    private static double[] line(double a, double perKey) {
        double[] v = new double[KEYS.length];
        for (int i = 0; i < v.length; i++) {
            v[i] = a + perKey * i;
        }
        return v;
    }

    /** Hand-worked: a straight line from 700 N at key 30 to 800 N at key 40 is 750 N at key 35. */
    @Test
    void straightLineBetweenAnchors() {
        TargetCurve c = new TargetSpec.Line(30, 700, 40, 800, false).build(KEYS, line(1, 0));
        assertEquals(700, c.at(30), 1e-12);
        assertEquals(750, c.at(35), 1e-12);
        assertEquals(800, c.at(40), 1e-12);
    }

    /** Hand-worked: log-linear from 400 to 900 N over keys 30–40 is the geometric mean 600 N at key 35. */
    @Test
    void logLinearLineBetweenAnchorsIsGeometricHalfWay() {
        TargetCurve c = new TargetSpec.Line(30, 400, 40, 900, true).build(KEYS, line(1, 0));
        assertEquals(600, c.at(35), 1e-9);
        assertEquals(c.at(31) / c.at(30), c.at(40) / c.at(39), 1e-12);
    }

    @Test
    void lineThroughPresentValuesAtTheAnchorNotes() {
        TargetCurve c = TargetSpec.Line.throughPresent(32, 38, false).build(KEYS, line(700, 10));
        assertEquals(720, c.at(32), 1e-12);
        assertEquals(780, c.at(38), 1e-12);
        assertEquals(700, c.at(30), 1e-12, "extended beyond the anchors");
        assertThrows(InvalidInput.class, () -> TargetSpec.Line.throughPresent(20, 38, false)
                .build(KEYS, line(700, 10)));
    }

    @Test
    void splineRunsThroughItsControlPoints() {
        List<ControlPoint> pts = List.of(new ControlPoint(30, 700), new ControlPoint(33, 760), new ControlPoint(36, 740),
                new ControlPoint(38, 780), new ControlPoint(40, 720));
        for (boolean akima : new boolean[] {false, true}) {
            TargetCurve c = new TargetSpec.Spline(pts, akima).build(KEYS, line(1, 0));
            for (ControlPoint p : pts) {
                assertEquals(p.value(), c.at(p.key()), 1e-9, (akima ? "Akima " : "cubic ") + p);
            }
        }
        TargetCurve two = new TargetSpec.Spline(List.of(new ControlPoint(30, 700), new ControlPoint(40, 800)), false)
                .build(KEYS, line(1, 0));
        assertEquals(750, two.at(35), 1e-12);
        assertThrows(InvalidInput.class, () -> new TargetSpec.Spline(pts.subList(0, 3), false)
                .build(KEYS, line(1, 0)), "points must span the planned keys");
        assertThrows(InvalidInput.class, () -> new TargetSpec.Spline(pts.subList(0, 4), true));
    }

    /** A robust smooth trend is not dragged by one bumped note (the LOESS robustness iterations). */
    @Test
    void loessIgnoresABumpedNote() {
        java.util.Random rnd = new java.util.Random(5);
        int[] keys = new int[30];
        double[] v = new double[30];
        for (int i = 0; i < 30; i++) {
            keys[i] = 30 + i;
            v[i] = (700 + 5 * i) * (1 + 0.01 * rnd.nextGaussian());
        }
        v[12] *= 1.25;
        TargetCurve c = TargetSpec.loess(0.5).build(keys, v);
        assertEquals(700 + 5 * 12, c.at(42), 0.02 * 760, "the bump is left out of the trend");
        assertEquals(700, c.at(30), 0.02 * 700);
    }

    /** On a short run of keys the bandwidth is widened so a fit never rests on a bumped note alone. */
    @Test
    void loessOnAShortRunStaysFiniteAndSaysItWidened() {
        double[] v = line(700, 5);
        v[5] *= 1.3;
        TargetCurve c = TargetSpec.loess(0.3).build(KEYS, v);
        for (int k = 30; k <= 40; k++) {
            assertTrue(Double.isFinite(c.at(k)) && c.at(k) > 0);
        }
        assertTrue(c.at(35) < 0.95 * v[5], "not the bumped value itself: " + c.at(35));
        assertTrue(c.description().contains("widened"), c.description());
    }

    @Test
    void givenCurveMustCoverThePlannedKeys() {
        TargetCurve file = TargetCurve.throughPoints(new int[] {30, 35}, new double[] {700, 750}, "file");
        assertEquals(720, file.at(32), 1e-12, "straight between the keys given");
        assertThrows(InvalidInput.class, () -> new TargetSpec.Given(file).build(KEYS, line(700, 1)));
        TargetCurve part = new TargetSpec.Given(file).build(new int[] {31, 34}, new double[] {1, 1});
        assertEquals(31, part.firstKey());
        assertEquals(34, part.lastKey());
    }

    /**
     * Hand-worked: 100 N over keys 1–10 and 120 N over keys 11–20, joined half-way with a blend of
     * 3 keys, meet at √(100 · 120) = 109.54 N on both sides of the join and are unchanged 3 keys away.
     */
    @Test
    void joinMeetsHalfWayAndLeavesKeysBeyondTheBlendAlone() {
        TargetCurve lower = new TargetCurve(1, filled(10, 100), "lower");
        TargetCurve upper = new TargetCurve(11, filled(10, 120), "upper");
        TargetCurve j = TargetCurve.join(lower, upper, 3, 0.5);
        assertEquals(1, j.firstKey());
        assertEquals(20, j.lastKey());
        assertEquals(Math.sqrt(100 * 120), j.at(10), 1e-9);
        assertEquals(Math.sqrt(100 * 120), j.at(11), 1e-9);
        assertEquals(100, j.at(7), 1e-12);
        assertEquals(120, j.at(14), 1e-12);
        TargetCurve onlyLower = TargetCurve.join(lower, upper, 3, 1.0);
        assertEquals(120, onlyLower.at(10), 1e-9, "the lower curve bends all the way to the upper");
        assertEquals(120, onlyLower.at(11), 1e-12);
    }

    /** Two sloping curves whose continuations meet already are left as they are. */
    @Test
    void joinOfCurvesThatAlreadyRunOnChangesNothing() {
        double[] all = new double[20];
        for (int i = 0; i < 20; i++) {
            all[i] = 1000 * Math.pow(0.97, i);
        }
        TargetCurve whole = new TargetCurve(1, all, "whole");
        TargetCurve j = TargetCurve.join(whole.part(1, 10), whole.part(11, 20), 4, 0.5);
        for (int k = 1; k <= 20; k++) {
            assertEquals(whole.at(k), j.at(k), 1e-9);
        }
    }

    @Test
    void perSectionTargetsAreJoinedContinuously() {
        var results = new java.util.ArrayList<org.scalewright.physics.NoteResult>();
        var present = org.scalewright.physics.ScaleAnalyzer.analyze(TestScales.random(3),
                org.scalewright.io.BuiltInData.defaultSettings());
        for (var r : present.notes()) {
            if (!r.wound()) {
                results.add(r);
            }
        }
        TargetCurve c = Targets.buildPerSection(results, TargetQuantity.TENSION, TargetSpec.loess(0.5), 4);
        assertEquals(results.get(0).key(), c.firstKey());
        assertEquals(88, c.lastKey());
        // at each change of section the step of the joined target is no bigger than the larger end slope next to it
        for (int i = 1; i < results.size(); i++) {
            if (!results.get(i).section().equals(results.get(i - 1).section())) {
                int k = results.get(i).key();
                double jump = Math.abs(Math.log(c.at(k) / c.at(k - 1)));
                double slopes = Math.max(Math.abs(Math.log(c.at(k - 1) / c.at(k - 2))),
                        Math.abs(Math.log(c.at(k + 1) / c.at(k))));
                assertTrue(jump <= slopes + 0.01, "join at key " + k + ": " + jump + " vs " + slopes);
            }
        }
        assertThrows(IllegalArgumentException.class, () -> Targets.buildPerSection(results, TargetQuantity.TENSION,
                new TargetSpec.Line(40, 700, 50, 700, false), 4));
    }

    @Test
    void controlPointsSampledFromACurveGiveItBackThroughASpline() {
        double[] v = new double[41];
        for (int i = 0; i < v.length; i++) {
            v[i] = 800 - 3 * i;
        }
        TargetCurve c = new TargetCurve(40, v, "straight");
        List<ControlPoint> pts = c.controlPoints(5);
        assertEquals(List.of(40, 50, 60, 70, 80), pts.stream().map(ControlPoint::key).toList());
        int[] keys = java.util.stream.IntStream.rangeClosed(40, 80).toArray();
        TargetCurve again = new TargetSpec.Spline(pts, false).build(keys, v);
        for (int k = 40; k <= 80; k++) {
            assertEquals(c.at(k), again.at(k), 1e-9, "a cubic spline through points on a line is the line");
        }
        assertEquals(2, new TargetCurve(1, new double[] {5, 6}, "two").controlPoints(9).size());
    }

    @Test
    void badCurvesAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> new TargetCurve(1, new double[] {700, -1}, "bad"));
        assertThrows(IllegalArgumentException.class, () -> new TargetCurve(1, new double[0], "bad"));
        assertThrows(InvalidInput.class, () -> new TargetSpec.Loess(0, 4));
        assertThrows(IllegalArgumentException.class, () -> new ControlPoint(3, 0));
        assertThrows(IllegalArgumentException.class, () -> new TargetCurve(1, filled(3, 1), "x").at(5));
    }

    private static double[] filled(int n, double v) {
        double[] a = new double[n];
        java.util.Arrays.fill(a, v);
        return a;
    }
}
