package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.design.rescale.TestScales;
import org.scalewright.io.ScaleSheetWriter;

/** {@code plan-wound} run in-process. */
class PlanWoundCommandTest {
    @TempDir
    Path dir;

    private Path sheet(long seed) throws Exception {
        Path p = dir.resolve("scale" + seed + ".csv");
        ScaleSheetWriter.write(TestScales.random(seed), p, false);
        return p;
    }

    @Test
    void designsPrintsTheChangesAndWritesASheetThatReanalysesToThem() throws Exception {
        Path in = sheet(1);
        int wound = TestScales.lastWound(TestScales.random(1));
        String[][] cases = {
            {},
            {"--join-break", "4"},
            {"--wrap-step", "0.02", "--double-above", "0.9"},
            {"--wraps", "0.1,0.15,0.2,0.25,0.3,0.4,0.5,0.6,0.7,0.8,0.9,1.0,1.1,1.2,1.3,1.4"},
            {"--cores", "0.9,0.95,1.0,1.05,1.1,1.15,1.2,1.25,1.3,1.35,1.4,1.45,1.5,1.55,1.6"},
            {"--target-of", "break-pct", "--max-break", "60"},
            {"--target", "logline", "--per-section"},
        };
        int i = 0;
        for (String[] extra : cases) {
            Path out = dir.resolve("w" + i++ + ".csv");
            List<String> args = new ArrayList<>(List.of("plan-wound", in.toString(), "--keys", "1-88", "--out",
                    out.toString()));
            args.addAll(List.of(extra));
            if (String.join(" ", extra).contains("per-section")) {
                PlanCommandRunner.Run bad = PlanCommandRunner.run(args.toArray(String[]::new));
                assertEquals(2, bad.status(), "--per-section needs loess");
                assertFalse(Files.exists(out));
                continue;
            }
            PlanCommandRunner.Run r = PlanCommandRunner.run(args.toArray(String[]::new));
            assertEquals(0, r.status(), String.join(" ", extra) + "\n" + r.err());
            assertTrue(r.out().contains("plain wire, skipped"), r.out());
            assertTrue(r.out().contains("break "), r.out());
            assertEquals(wound, PlanCommandRunner.checkRowsMatchReanalysis(r, out), String.join(" ", extra));
        }
    }

    @Test
    void badArgumentsGiveOneLineEachAndNoFile() throws Exception {
        Path in = sheet(2);
        Path out = dir.resolve("never.csv");
        String[][] cases = {
            {"--wrap-step", "0"},
            {"--wrap-step", "0.05", "--wraps", "0.2,0.3"},
            {"--wraps", "0.2,abc"},
            {"--double-above", "-1"},
            {"--double-ratio", "0"},
            {"--cores", "1.0,x"},
            {"--target-of", "mass"},
            {"--join-break", "-2"},
            {"--max-break", "150"},
            {"--target", "spline", "--points", "1=1400,5=1300"},
        };
        for (String[] extra : cases) {
            List<String> args = new ArrayList<>(List.of("plan-wound", in.toString(), "--keys", "1-12", "--out",
                    out.toString()));
            args.addAll(List.of(extra));
            PlanCommandRunner.Run r = PlanCommandRunner.run(args.toArray(String[]::new));
            assertEquals(2, r.status(), String.join(" ", extra) + "\n" + r.err());
            assertTrue(r.errLines().get(0).startsWith("error: "), r.err());
            assertFalse(r.err().contains("Exception"), r.err());
            assertFalse(Files.exists(out), String.join(" ", extra));
        }
        PlanCommandRunner.Run plainOnly = PlanCommandRunner.run("plan-wound", in.toString(), "--keys", "60-88",
                "--out", out.toString());
        assertEquals(2, plainOnly.status());
        assertTrue(plainOnly.err().contains("no wound strings"), plainOnly.err());
    }

    @Test
    void aTargetTheCoresCannotCarrySaysWhyForEachKey() throws Exception {
        Path in = sheet(3);
        Path out = dir.resolve("never.csv");
        PlanCommandRunner.Run r = PlanCommandRunner.run("plan-wound", in.toString(), "--keys", "1-4", "--target",
                "line", "--points", "1=30,4=30", "--out", out.toString());
        assertEquals(2, r.status());
        assertFalse(Files.exists(out));
        assertEquals(5, r.errLines().size(), r.err());
        assertTrue(r.err().contains("alone already gives"), r.err());
    }

    /** The contract run on the demo grand (skipped where the demo sheets are not present). */
    @Test
    void demoGrandLowestKeys() throws Exception {
        Path demo = Path.of("demo-instruments/grand-190/grand-190.csv");
        assumeTrue(Files.exists(demo));
        Path out = dir.resolve("grand-wound.csv");
        PlanCommandRunner.Run r = PlanCommandRunner.run("plan-wound", demo.toString(), "--keys", "1-12", "--out",
                out.toString());
        assertEquals(0, r.status(), r.err());
        assertEquals(12, PlanCommandRunner.checkRowsMatchReanalysis(r, out));
    }
}
