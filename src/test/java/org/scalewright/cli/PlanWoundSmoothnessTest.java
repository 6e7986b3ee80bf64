package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.design.rescale.TargetCurve;
import org.scalewright.design.rescale.TargetQuantity;
import org.scalewright.design.rescale.TargetSpec;
import org.scalewright.design.rescale.TestScales;
import org.scalewright.design.rescale.WoundPlanner;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.io.ScaleSheetWriter;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Scale;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

/**
 * {@code plan-wound} with its defaults on the demo grand and on basses made here (test inputs, not
 * check values). The check values are the project's rules: no neighbour step in per-string tension
 * over the neighbour-step limit (8 %) inside the planned keys; never rougher than the input (largest
 * neighbour step, largest deviation from the target); the written sheet analyses to the plan's
 * figures (tension within 0.1 %).
 */
class PlanWoundSmoothnessTest {
    @TempDir
    Path dir;

    /** The largest neighbour step inside the keys (%), and the largest deviation from the target (%). */
    private static double[] roughness(ScaleAnalysis a, KeyRange keys, TargetCurve target) {
        List<NoteResult> in = a.notes().stream().filter(r -> keys.contains(r.key()) && r.wound()).toList();
        double step = 0;
        double dev = 0;
        for (int i = 0; i < in.size(); i++) {
            dev = Math.max(dev, Math.abs(100 * (in.get(i).tension() / target.at(in.get(i).key()) - 1)));
            if (i > 0) {
                step = Math.max(step, Math.abs(100 * (in.get(i).tension() / in.get(i - 1).tension() - 1)));
            }
        }
        return new double[] {step, dev};
    }

    private PlanCommandRunner.Run plansSmoothly(Path sheet, String keys, String... extra) throws Exception {
        Path out = dir.resolve("planned-" + extra.length + "-" + sheet.getFileName());
        List<String> args = new java.util.ArrayList<>(List.of("plan-wound", sheet.toString(), "--keys", keys, "--out",
                out.toString()));
        args.addAll(List.of(extra));
        PlanCommandRunner.Run r = PlanCommandRunner.run(args.toArray(String[]::new));
        assertEquals(0, r.status(), r.err());
        ScaleAnalysis before = ScaleAnalyzer.analyze(ScaleSheetReader.standard().read(sheet),
                BuiltInData.defaultSettings());
        ScaleAnalysis after = ScaleAnalyzer.analyze(ScaleSheetReader.standard().read(out),
                BuiltInData.defaultSettings());
        KeyRange range = KeyRange.parse(keys);
        TargetCurve target = WoundPlanner.target(before, range, TargetSpec.loess(0.5), TargetQuantity.TENSION, false);
        double[] was = roughness(before, range, target);
        double[] now = roughness(after, range, target);
        // the neighbour-step limit is promised for the defaults; any settings promise never rougher
        assertTrue(extra.length > 0 || now[0] <= before.settings().neighbourStepPct(), sheet + ": largest step " + now[0] + " %\n" + r.out());
        assertTrue(now[0] <= was[0] + 1e-9, sheet + ": largest step " + was[0] + " → " + now[0] + " %\n" + r.out());
        assertTrue(now[1] <= was[1] + 1e-9, sheet + ": largest deviation " + was[1] + " → " + now[1] + " %\n" + r.out());
        long planned = after.notes().stream().filter(n -> range.contains(n.key()) && n.wound()).count();
        assertEquals(planned, PlanCommandRunner.checkRowsMatchReanalysis(r, out));
        assertTrue(r.out().contains(String.format(java.util.Locale.ROOT, "largest neighbour step in per-string tension %.1f %% → %.1f %%", was[0], now[0])),
                "the report states the largest step before and after\n" + r.out());
        return r;
    }

    private Path write(Scale s, String name) throws Exception {
        Path p = dir.resolve(name);
        ScaleSheetWriter.write(s, p, false);
        return p;
    }

    @Test
    void demoGrandBassWithDefaults() throws Exception {
        Path demo = Path.of("demo-instruments/grand-190/grand-190.csv");
        assumeTrue(Files.exists(demo));
        plansSmoothly(demo, "1-20");
    }

    @Test
    void anUprightBassWithDefaults() throws Exception {
        plansSmoothly(write(TestScales.bass("test upright bass", 11, 26, 6, 1.12, 0.72, 1.45e-3, 1050), "up.csv"),
                "1-26");
    }

    @Test
    void aLongGrandBassWithDefaults() throws Exception {
        plansSmoothly(write(TestScales.bass("test grand bass", 12, 20, 10, 1.95, 1.24, 1.65e-3, 1500), "gr.csv"),
                "1-20");
    }

    /**
     * The old defaults (wrap wire in 0.05 mm steps, every core kept) made the demo grand's bass rougher
     * than it was; with them the designer now keeps the present strings where the designed ones would
     * be rougher, and says so.
     */
    @Test
    void coarseWrapWireAndKeptCoresNeverMakeTheBassRougher() throws Exception {
        Path demo = Path.of("demo-instruments/grand-190/grand-190.csv");
        assumeTrue(Files.exists(demo));
        PlanCommandRunner.Run r = plansSmoothly(demo, "1-20", "--wrap-step", "0.05", "--cores", "keep");
        assertTrue(r.out().contains("present strings kept"), r.out());
        for (long seed = 1; seed <= 4; seed++) {
            Scale s = TestScales.random(seed);
            Path p = write(s, "random" + seed + ".csv");
            String keys = "1-" + TestScales.lastWound(s);
            plansSmoothly(p, keys);
            plansSmoothly(p, keys, "--wrap-step", "0.05", "--cores", "keep");
        }
    }

    private void refused(String wraps, String why) throws Exception {
        Path demo = write(TestScales.bass("test grand bass", 13, 20, 10, 1.7, 1.15, 1.6e-3, 1450), "g13.csv");
        Path out = dir.resolve("never.csv");
        PlanCommandRunner.Run r = PlanCommandRunner.run("plan-wound", demo.toString(), "--keys", "1-20", "--wraps",
                wraps, "--out", out.toString());
        assertEquals(2, r.status(), r.out() + r.err());
        assertTrue(r.err().contains(why), r.err());
        assertFalse(r.err().contains("coarse"), r.err());
        assertFalse(Files.exists(out));
    }

    @Test
    void aFarTooThinWrapListIsRefusedAsTooThin() throws Exception {
        refused("0.1,0.2,0.3,0.4", "too thin");
    }

    @Test
    void aFarTooThickWrapListIsRefusedAsTooThick() throws Exception {
        refused("3,3.5,4", "too thick");
    }
}
