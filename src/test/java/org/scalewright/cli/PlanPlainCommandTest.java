package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.design.rescale.TestScales;
import org.scalewright.io.ScaleSheetWriter;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.Scale;
import org.scalewright.model.SheetColumn;
import org.scalewright.model.SheetLayout;

/** {@code plan-plain} run in-process. */
class PlanPlainCommandTest {
    @TempDir
    Path dir;

    private Path sheet(long seed) throws Exception {
        Path p = dir.resolve("scale" + seed + ".csv");
        ScaleSheetWriter.write(TestScales.random(seed), p, false);
        return p;
    }

    @Test
    void plansPrintsTheChangesAndWritesASheetThatReanalysesToThem() throws Exception {
        Path in = sheet(1);
        Path out = dir.resolve("new.csv");
        PlanCommandRunner.Run r = PlanCommandRunner.run("plan-plain", in.toString(), "--keys", "1-88", "--out",
                out.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(Files.exists(out));
        assertTrue(r.out().contains("Largest neighbour step"), r.out());
        assertTrue(r.out().contains("All planned strings at or under 70 % of breaking strength: yes"), r.out());
        assertTrue(r.out().contains("wound strings, skipped"), r.out());
        assertTrue(r.out().contains("Caution:"));
        int rows = PlanCommandRunner.checkRowsMatchReanalysis(r, out);
        assertEquals(88 - TestScales.lastWound(TestScales.random(1)), rows);
    }

    @Test
    void keepsTheInputsUnitsInTheWrittenSheet() throws Exception {
        Scale s = TestScales.random(2);
        List<SheetColumn> cols = new ArrayList<>(List.of(SheetColumn.KEY, SheetColumn.STRINGS,
                SheetColumn.SPEAKING_LENGTH, SheetColumn.WIRE_DIAMETER, SheetColumn.WRAP1, SheetColumn.WRAP2,
                SheetColumn.WRAP_METAL, SheetColumn.SECTION));
        Map<SheetColumn, LengthUnit> units = new EnumMap<>(SheetColumn.class);
        for (SheetColumn c : cols) {
            if (c.isLength()) {
                units.put(c, LengthUnit.IN);
            }
        }
        Path in = dir.resolve("inch.csv");
        ScaleSheetWriter.write(s.withLayout(new SheetLayout(cols, units)), in, false);
        Path out = dir.resolve("inch-new.csv");
        PlanCommandRunner.Run r = PlanCommandRunner.run("plan-plain", in.toString(), "--keys", "C4-C8", "--sizes",
                "metric", "--out", out.toString());
        assertEquals(0, r.status(), r.err());
        String header = Files.readAllLines(out).stream().filter(l -> l.startsWith("key")).findFirst().orElseThrow();
        assertTrue(header.contains("length_in") && header.contains("wire_in"), header);
        assertFalse(header.contains("_mm"), header);
        assertTrue(PlanCommandRunner.checkRowsMatchReanalysis(r, out, true) > 40);
    }

    @Test
    void badArgumentsGiveOneLineEachAndNoFile() throws Exception {
        Path in = sheet(3);
        Path out = dir.resolve("never.csv");
        String[][] cases = {
            {"plan-plain", in.toString(), "--keys", "40-60", "--max-break", "0", "--out", out.toString()},
            {"plan-plain", in.toString(), "--keys", "40-60", "--sizes", "99", "--out", out.toString()},
            {"plan-plain", in.toString(), "--keys", "40-60", "--sizes", "0.8mm,0.8mm", "--out", out.toString()},
            {"plan-plain", in.toString(), "--keys", "60-40", "--out", out.toString()},
            {"plan-plain", in.toString(), "--keys", "40-60"},
            {"plan-plain", in.toString(), "--keys", "40-60", "--change-cost", "-1", "--out", out.toString()},
            {"plan-plain", in.toString(), "--keys", "40-60", "--bandwidth", "2", "--out", out.toString()},
            {"plan-plain", in.toString(), "--keys", "40-60", "--target", "spline", "--out", out.toString()},
            {"plan-plain", in.toString(), "--keys", "40-60", "--target", "line", "--points", "40=700",
                "--out", out.toString()},
            {"plan-plain", in.toString(), "--keys", "40-60", "--target", "nofile.csv", "--out", out.toString()},
            {"plan-plain", in.toString(), "--keys", "1-5", "--out", out.toString()},
            {"plan-plain", dir.resolve("missing.csv").toString(), "--keys", "40-60", "--out", out.toString()},
        };
        for (String[] args : cases) {
            PlanCommandRunner.Run r = PlanCommandRunner.run(args);
            assertEquals(2, r.status(), String.join(" ", args) + "\n" + r.err());
            assertTrue(r.errLines().get(0).startsWith("error: "), r.err());
            assertFalse(r.err().contains("Exception"), r.err());
            assertFalse(Files.exists(out), String.join(" ", args));
            assertEquals("", r.out().trim(), "nothing printed on a bad argument: " + String.join(" ", args));
        }
    }

    @Test
    void anImpossibleMaximumSaysWhyOnEveryLineAndWritesNothing() throws Exception {
        Path in = sheet(4);
        Path out = dir.resolve("never.csv");
        PlanCommandRunner.Run r = PlanCommandRunner.run("plan-plain", in.toString(), "--keys", "70-75",
                "--max-break", "25", "--out", out.toString());
        assertEquals(2, r.status());
        assertFalse(Files.exists(out));
        List<String> lines = r.errLines();
        assertTrue(lines.size() >= 2, r.err());
        for (String l : lines) {
            assertTrue(l.startsWith("error: "), l);
        }
        assertTrue(r.err().contains("speaking length"), r.err());
    }

    @Test
    void targetsByLineSplineAndPerSection() throws Exception {
        Path in = sheet(5);
        String[][] cases = {
            {"--target", "line"},
            {"--target", "logline", "--points", "50,88=600"},
            {"--target", "spline", "--points", "40=750,60=720,75=650,88=600"},
            {"--target", "akima", "--points", "40=750,50=740,60=720,75=650,88=600"},
            {"--per-section", "--bandwidth", "0.7"},
        };
        int i = 0;
        for (String[] extra : cases) {
            Path out = dir.resolve("t" + i++ + ".csv");
            List<String> args = new ArrayList<>(List.of("plan-plain", in.toString(), "--keys", "40-88", "--out",
                    out.toString()));
            args.addAll(List.of(extra));
            PlanCommandRunner.Run r = PlanCommandRunner.run(args.toArray(String[]::new));
            assertEquals(0, r.status(), String.join(" ", extra) + "\n" + r.err());
            assertEquals(49, PlanCommandRunner.checkRowsMatchReanalysis(r, out), String.join(" ", extra));
        }
    }

    @Test
    void theHelpNamesTheOptions() {
        PlanCommandRunner.Run r = PlanCommandRunner.run("plan-plain", "--help");
        assertEquals(0, r.status());
        for (String o : List.of("--keys", "--target", "--max-break", "--sizes", "--change-cost", "--out")) {
            assertTrue(r.out().contains(o), o);
        }
    }

    /** The contract run on the demo grand (skipped where the demo sheets are not present). */
    @Test
    void demoGrandTopKeys() throws Exception {
        Path demo = Path.of("demo-instruments/grand-190/grand-190.csv");
        assumeTrue(Files.exists(demo));
        Path out = dir.resolve("grand-plain.csv");
        PlanCommandRunner.Run r = PlanCommandRunner.run("plan-plain", demo.toString(), "--keys", "60-88", "--out",
                out.toString());
        assertEquals(0, r.status(), r.err());
        assertEquals(29, PlanCommandRunner.checkRowsMatchReanalysis(r, out));
    }

    /** The window shows the same sentences (app RescaleViewModelTest); here with the option in front. */
    @Test
    void aRefusedValueIsTheEnginesOneMessageWithTheOptionNamed() throws Exception {
        Path in = sheet(3);
        Path out = dir.resolve("never.csv");
        String[][] cases = {
            {"--sizes", "0.8mm,0.8mm", "error: --sizes: plain wire list: diameter 0.800 mm is listed twice"},
            {"--max-break", "150", "error: --max-break: maximum percent of breaking strength must be more than 0 and "
                    + "at most 100 %, was 150"},
            {"--change-cost", "-1", "error: --change-cost: change cost must be 0 or more, was -1"},
            {"--target", "akima", "--points", "40=700,50=650,60=600",
                "error: an Akima spline needs at least 5 control points, had 3"},
        };
        for (String[] c : cases) {
            List<String> args = new java.util.ArrayList<>(List.of("plan-plain", in.toString(), "--keys", "40-60",
                    "--out", out.toString()));
            args.addAll(List.of(c).subList(0, c.length - 1));
            PlanCommandRunner.Run r = PlanCommandRunner.run(args.toArray(String[]::new));
            assertEquals(2, r.status(), r.err());
            assertEquals(List.of(c[c.length - 1]), r.errLines());
            assertFalse(Files.exists(out));
        }
    }
}
