package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.design.rescale.TestScales;
import org.scalewright.io.ScaleSheetWriter;

/** {@code --target FILE.csv} for the planning commands, and the reader's messages. */
class PlanTargetFileTest {
    @TempDir
    Path dir;

    @Test
    void aTargetFileIsFollowed() throws Exception {
        Path in = dir.resolve("scale.csv");
        ScaleSheetWriter.write(TestScales.random(6), in, false);
        Path target = dir.resolve("target.csv");
        Files.writeString(target, "# wanted tension\nkey,tension_n\n40,720\nC6,690\n88,640\n");
        Path out = dir.resolve("new.csv");
        PlanCommandRunner.Run r = PlanCommandRunner.run("plan-plain", in.toString(), "--keys", "40-88", "--target",
                target.toString(), "--out", out.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("target: target from target.csv"), r.out());
        // straight between the keys given: key 64 (C6) is 690 N, key 76 half-way to 640 N
        assertTrue(r.row(64).contains(" 690 "), r.row(64));
        assertTrue(r.row(76).contains(" 665 "), r.row(76));
        assertEquals(49, PlanCommandRunner.checkRowsMatchReanalysis(r, out));
    }

    @Test
    void problemsInTheTargetFileNameLineAndColumn() throws Exception {
        Path in = dir.resolve("scale.csv");
        ScaleSheetWriter.write(TestScales.random(6), in, false);
        Path target = dir.resolve("bad-target.csv");
        Files.writeString(target, "key,tension_n,colour\n40,720,red\nX9,700\n50,-3\n40,710\n");
        Path out = dir.resolve("never.csv");
        PlanCommandRunner.Run r = PlanCommandRunner.run("plan-plain", in.toString(), "--keys", "40-88", "--target",
                target.toString(), "--out", out.toString());
        assertEquals(2, r.status());
        assertFalse(Files.exists(out));
        assertTrue(r.err().contains("bad-target.csv, line 1, column colour: unknown column"), r.err());
        r = PlanCommandRunner.run("plan-plain", in.toString(), "--keys", "40-88", "--target",
                write("t2.csv", "key,tension_n\n40,720\nX9,700\n50,-3\n40,710\n60,\n").toString(), "--out",
                out.toString());
        assertEquals(2, r.status());
        assertTrue(r.err().contains("t2.csv, line 3, column key: not a key number or note name (such as 49, A4 or C#3): 'X9'"), r.err());
        assertTrue(r.err().contains("t2.csv, line 4, column tension_n: must be greater than 0 N, was -3"), r.err());
        assertTrue(r.err().contains("t2.csv, line 5, column key: key 40 appears twice (first on line 2)"), r.err());
        assertTrue(r.err().contains("t2.csv, line 6, column tension_n: a value is required here"), r.err());
        assertEquals(4, r.errLines().size(), r.err());
        assertFalse(Files.exists(out));
        r = PlanCommandRunner.run("plan-plain", in.toString(), "--keys", "40-88", "--target",
                write("t3.csv", "key,tension_n\n40,720d\n60,0x1p9\n").toString(), "--out", out.toString());
        assertEquals(2, r.status());
        assertTrue(r.err().contains("t3.csv, line 2, column tension_n: expected a tension in N, was '720d'"), r.err());
        assertEquals(2, r.errLines().size(), r.err());
        assertFalse(Files.exists(out));
    }

    @Test
    void aTargetFileThatDoesNotCoverThePlannedKeysIsRefused() throws Exception {
        Path in = dir.resolve("scale.csv");
        ScaleSheetWriter.write(TestScales.random(6), in, false);
        Path out = dir.resolve("never.csv");
        PlanCommandRunner.Run r = PlanCommandRunner.run("plan-plain", in.toString(), "--keys", "40-88", "--target",
                write("t3.csv", "key,tension_n\n50,720\n88,640\n").toString(), "--out", out.toString());
        assertEquals(2, r.status());
        assertEquals(1, r.errLines().size(), r.err());
        assertTrue(r.err().contains("covers keys 50-88"), r.err());
        assertFalse(Files.exists(out));
    }

    private Path write(String name, String text) throws Exception {
        Path p = dir.resolve(name);
        Files.writeString(p, text);
        return p;
    }
}
