package org.scalewright.design.rescale;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.io.ScaleSheetWriter;
import org.scalewright.model.CoreWire;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.model.WireSize;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.NoteCalculator;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

/**
 * The plain-wire planner: against enumeration of every size sequence on small cases, and
 * properties over random scales.
 */
class PlainPlannerTest {
    private static final AnalysisSettings SETTINGS = BuiltInData.defaultSettings();

    /** Five plain keys planned between an unplanned plain neighbour below and above, four sizes. */
    @Test
    void optimumEqualsBruteForceOverEverySizeSequence() {
        Random rnd = new Random(4);
        List<WireSize> table = BuiltInData.musicWireSizes().sizes();
        int feasible = 0;
        for (int trial = 0; trial < 60; trial++) {
            int first = 40 + rnd.nextInt(30);
            List<Note> notes = new ArrayList<>();
            for (int key = first - 1; key <= first + 5; key++) {
                double length = 0.05 * Math.pow(2, (88 - key) * 0.9 / 12) * (1 + 0.06 * rnd.nextGaussian());
                int pick = key == first - 1 ? 12 + rnd.nextInt(11) : key == first + 5 ? rnd.nextInt(9) : 6 + rnd.nextInt(8);
                WireSize w = table.get(pick);
                notes.add(TestScales.note(key, 3, length, CoreWire.ofSize(w.size(), w.diameter()), null, "s"));
            }
            Scale scale = new Scale("", PitchStandard.ISO_16, notes, null);
            ScaleAnalysis present = ScaleAnalyzer.analyze(scale, SETTINGS);
            KeyRange range = new KeyRange(first, first + 4);
            List<CoreWire> sizes = new ArrayList<>();
            java.util.TreeSet<Integer> picked = new java.util.TreeSet<>();
            while (picked.size() < 4) {
                picked.add(2 + rnd.nextInt(table.size() - 2));
            }
            for (int j : picked) {
                sizes.add(CoreWire.ofSize(table.get(j).size(), table.get(j).diameter()));
            }
            double[] tv = new double[5];
            for (int i = 0; i < 5; i++) {
                tv[i] = 650 + 150 * rnd.nextDouble();
            }
            TargetCurve target = new TargetCurve(first, tv, "random");
            double max = 48 + 20 * rnd.nextDouble();
            PlainPlanOptions o = new PlainPlanOptions(sizes, max, rnd.nextDouble() * 0.01,
                    rnd.nextBoolean() ? 0 : rnd.nextDouble() * 2);
            double brute = bruteForce(present, range, target, o);
            if (brute == Double.POSITIVE_INFINITY) {
                assertThrows(PlanNotPossible.class, () -> PlainPlanner.plan(present, range, target, o), "trial " + trial);
                continue;
            }
            Proposal p = PlainPlanner.plan(present, range, target, o);
            double[] d = p.changes().stream().mapToDouble(c -> c.after().wire().diameter()).toArray();
            assertEquals(brute, objective(present, range, target, o, d), 1e-12, "trial " + trial);
            feasible++;
        }
        assertTrue(feasible >= 20 && feasible < 60, "both feasible and impossible cases tried, feasible: " + feasible);
    }

    /** Enumerates all 4^5 sequences; returns the least objective of the allowed ones. */
    private static double bruteForce(ScaleAnalysis present, KeyRange range, TargetCurve target, PlainPlanOptions o) {
        int m = o.sizes().size();
        double best = Double.POSITIVE_INFINITY;
        double[] d = new double[5];
        for (int code = 0; code < Math.pow(m, 5); code++) {
            int c = code;
            for (int k = 0; k < 5; k++) {
                d[k] = o.sizes().get(c % m).diameter();
                c /= m;
            }
            best = Math.min(best, objective(present, range, target, o, d));
        }
        return best;
    }

    /**
     * The objective written out independently of the planner: squared relative deviation, a cost
     * per change, the step cost on steps over the limit (also against the unplanned neighbours),
     * +∞ for a size that grows toward the treble (also against the neighbours) or a string over the maximum.
     */
    private static double objective(ScaleAnalysis present, KeyRange range, TargetCurve target, PlainPlanOptions o,
                                    double[] d) {
        List<Note> notes = present.scale().notes();
        double below = notes.get(0).wire().diameter();
        double above = notes.get(notes.size() - 1).wire().diameter();
        double[] t = new double[7];
        t[0] = present.notes().get(0).tension();
        t[6] = present.notes().get(6).tension();
        double sum = 0;
        for (int k = 0; k < 5; k++) {
            Note n = notes.get(k + 1).withWire(CoreWire.ofDiameter(d[k]));
            NoteResult r = NoteCalculator.compute(n, present.scale().pitch(), SETTINGS);
            if (r.breakPct() > o.maxBreakPct() || (k > 0 ? d[k] > d[k - 1] + 1e-12 : d[k] > below + 1e-12)) {
                return Double.POSITIVE_INFINITY;
            }
            t[k + 1] = r.tension();
            double dev = r.tension() / target.at(n.key()) - 1;
            sum += dev * dev + (k > 0 && Math.abs(d[k] - d[k - 1]) > 1e-12 ? o.changeCost() : 0);
        }
        if (d[4] < above - 1e-12) {
            return Double.POSITIVE_INFINITY;
        }
        double limit = SETTINGS.neighbourStepPct() / 100;
        for (int i = 1; i < 7; i++) {
            double excess = Math.abs(t[i] / t[i - 1] - 1) - limit;
            sum += excess > 0 ? o.stepCost() * excess : 0;
        }
        return sum;
    }

    @Test
    void randomScalesKeepSizesFallingEveryStringUnderTheMaximumAndTheSheetReadsBackToTheReport() throws Exception {
        for (long seed = 1; seed <= 12; seed++) {
            Scale scale = TestScales.random(seed);
            ScaleAnalysis present = ScaleAnalyzer.analyze(scale, SETTINGS);
            KeyRange range = new KeyRange(1, 88);
            double max = 62;
            TargetCurve target = PlainPlanner.target(present, range, TargetSpec.loess(0.4), seed % 2 == 0);
            List<CoreWire> sizes = seed % 3 == 0 ? PlainPlanOptions.diameters(BuiltInData.metricPlainWire())
                    : PlainPlanOptions.sizesOf(BuiltInData.musicWireSizes());
            Proposal p;
            try {
                p = PlainPlanner.plan(present, range, target, PlainPlanOptions.of(sizes, max));
            } catch (PlanNotPossible e) {
                // allowed only when some string is over the maximum whatever its size
                assertTrue(e.getMessage().contains("speaking length"), e.getMessage());
                continue;
            }
            double previous = Double.POSITIVE_INFINITY;
            for (KeyChange c : p.changes()) {
                assertFalse(c.after().isWound());
                assertTrue(c.after().wire().diameter() <= previous + 1e-12, "size grows at key " + c.key());
                previous = c.after().wire().diameter();
                assertTrue(c.afterResult().breakPct() <= max, "key " + c.key() + " over the maximum");
                assertTrue(sizes.stream().anyMatch(s -> Math.abs(s.diameter() - c.after().wire().diameter()) < 1e-12));
            }
            assertTrue(p.allUnderMax());
            assertEquals(88 - TestScales.lastWound(scale), p.changes().size());
            assertTrue(p.notes().get(0).contains("wound strings, skipped"));
            assertEquals(scale.notesIn(new KeyRange(1, TestScales.lastWound(scale))),
                    p.proposedScale().notesIn(new KeyRange(1, TestScales.lastWound(scale))), "wound keys untouched");
            readsBackToTheReport(p);
        }
    }

    /** Writing the proposed scale as a sheet and reading it back gives the figures the proposal reports. */
    static void readsBackToTheReport(Proposal p) throws Exception {
        String text = ScaleSheetWriter.toText(p.proposedScale());
        Scale back = ScaleSheetReader.standard().read(Path.of("plan.csv"),
                text.getBytes(java.nio.charset.StandardCharsets.UTF_8));
        ScaleAnalysis again = ScaleAnalyzer.analyze(back, p.after().settings());
        for (KeyChange c : p.changes()) {
            NoteResult r = again.result(c.key()).orElseThrow();
            assertEquals(c.afterResult().tension(), r.tension(), 1e-6 * r.tension(), "tension at key " + c.key());
            assertEquals(c.afterResult().breakPct(), r.breakPct(), 1e-6, "% of breaking strength at key " + c.key());
            assertEquals(c.afterResult().inharmonicity(), r.inharmonicity(), 1e-6 * r.inharmonicity());
        }
    }

    @Test
    void aMaximumBelowWhatTheLengthAllowsSaysTheSpeakingLengthLimitsIt() {
        Scale scale = TestScales.random(3);
        ScaleAnalysis present = ScaleAnalyzer.analyze(scale, SETTINGS);
        KeyRange range = new KeyRange(70, 80);
        TargetCurve target = PlainPlanner.target(present, range, TargetSpec.loess(0.5), false);
        PlanNotPossible e = assertThrows(PlanNotPossible.class, () -> PlainPlanner.plan(present, range, target,
                PlainPlanOptions.of(PlainPlanOptions.sizesOf(BuiltInData.musicWireSizes()), 20)));
        assertTrue(e.reasons().get(0).contains("speaking length"), e.reasons().get(0));
        assertTrue(e.reasons().get(0).contains("over the maximum 20.0 %"), e.reasons().get(0));
    }

    @Test
    void aRangeWithoutPlainKeysIsRefused() {
        ScaleAnalysis present = ScaleAnalyzer.analyze(TestScales.random(5), SETTINGS);
        assertThrows(PlanNotPossible.class, () -> PlainPlanner.target(present, new KeyRange(1, 10),
                TargetSpec.loess(0.5), false));
    }

    /** A hand-made case: equal lengths and pitch ratio so that the same size gives a fixed 15 % fall. */
    @Test
    void anUnavoidableFallInTensionIsExplainedByTheSpeakingLength() {
        List<Note> notes = new ArrayList<>();
        CoreWire w = CoreWire.ofSize(15, 0.035 * 0.0254);
        double[] lengths = {0.200, 0.195, 0.190, 0.160, 0.156, 0.152};
        for (int i = 0; i < lengths.length; i++) {
            notes.add(TestScales.note(60 + i, 3, lengths[i], w, null, "top"));
        }
        ScaleAnalysis present = ScaleAnalyzer.analyze(new Scale("", PitchStandard.ISO_16, notes, null), SETTINGS);
        KeyRange range = new KeyRange(60, 65);
        Proposal p = PlainPlanner.plan(present, range, PlainPlanner.target(present, range, TargetSpec.loess(1), false),
                PlainPlanOptions.of(PlainPlanOptions.sizesOf(BuiltInData.musicWireSizes()), 70));
        assertFalse(p.stepsWithinLimit());
        assertEquals(1, p.limits().size());
        assertTrue(p.limits().get(0).contains("speaking length drops"), p.limits().get(0));
        assertTrue(p.limits().get(0).contains("never grows toward the treble"), p.limits().get(0));
        // the flat target leaves the long keys over it and the short ones under; the notes say what holds them
        assertTrue(p.notes().stream().anyMatch(s -> s.contains("over the target") && s.contains("above has")),
                p.notes().toString());
        assertTrue(p.notes().stream().anyMatch(s -> s.contains("under the target") && s.contains("below has")),
                p.notes().toString());
    }
}
