package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.io.Fifos;

/** Nothing lost: --out onto an input, a read-only file, a link or a pipe replaces nothing and exits 2. */
class OutputSafetyTest {
    static final Path GRAND = Path.of("demo-instruments/grand-190/grand-190.csv");
    static final Path UPRIGHT = Path.of("demo-instruments/upright-131/upright-131.csv");

    @TempDir
    Path dir;

    record Run(int status, String out, String err) {
    }

    static Run run(Object... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        String[] a = Stream.of(args).map(String::valueOf).toArray(String[]::new);
        int rc = ScalewrightCommand.run(a, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(rc, out.toString(), err.toString());
    }

    private Path copy(Path from, String name) throws Exception {
        return Files.copy(from, dir.resolve(name));
    }

    private List<String> names() throws Exception {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    private static void refused(Run r, String why) {
        assertEquals(2, r.status(), r.err());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().startsWith("error: "), r.err());
        assertTrue(r.err().contains(why), r.err());
        assertFalse(r.err().contains("Exception"), r.err());
    }

    @Test
    @DisplayName("--out onto the command's own input, however it is spelt: refused, the input unchanged")
    void outOntoAnInput() throws Exception {
        Path sheet = copy(GRAND, "my.csv");
        byte[] before = Files.readAllBytes(sheet);
        Files.createSymbolicLink(dir.resolve("alias.csv"), sheet.getFileName());
        Path flat = Files.writeString(dir.resolve("flat.csv"), "key,cents_flat\n1,10\n88,20\n");
        Path target = Files.writeString(dir.resolve("target.csv"), "key,tension_n\n60,700\n88,600\n");
        Path maker = Files.copy(Path.of("scales/wire-makers/specimen-wire-mill-mm-load-n.csv"), dir.resolve("maker.csv"));
        String spelt = dir.resolve("sub").resolve("..").resolve("my.csv").toString();
        Files.createDirectory(dir.resolve("sub"));
        refused(run("analyze", sheet, "--out", sheet), "is the same file as SCALE.csv");
        refused(run("analyze", sheet, "--out", spelt), "is the same file as SCALE.csv");
        refused(run("analyze", sheet, "--out", dir.resolve("alias.csv")), "is the same file as SCALE.csv");
        refused(run("plan-plain", sheet, "--keys", "60-88", "--out", sheet), "is the same file as SCALE.csv");
        refused(run("plan-plain", sheet, "--keys", "60-88", "--target", target, "--out", target),
                "is the same file as --target");
        refused(run("analyze", sheet, "--strength", maker, "--out", maker), "is the same file as --strength");
        refused(run("check-wire", sheet, "--flat", flat, "--out", flat), "is the same file as --flat");
        refused(run("diagnose", sheet, "--keys", "60-88", "--compare", maker, "--out", maker),
                "is the same file as --compare");
        Path report = Files.createDirectory(dir.resolve("rep"));
        Path ref = Files.copy(UPRIGHT, report.resolve("results.csv"));
        refused(run("report", sheet, "--reference", ref, "--out", report), "holds the same file as --reference");
        assertTrue(Files.exists(ref));
        assertEquals(new String(before), Files.readString(sheet));
        assertEquals(List.of("alias.csv", "flat.csv", "maker.csv", "my.csv", "rep", "sub", "target.csv"), names());
    }

    @Test
    @DisplayName("--out onto a read-only file, a link, a device or a pipe: refused, nothing replaced, exit 2")
    void outOntoWhatMustNotBeReplaced() throws Exception {
        Path sheet = copy(GRAND, "my.csv");
        Path ro = copy(UPRIGHT, "ro.csv");
        Files.setPosixFilePermissions(ro, PosixFilePermissions.fromString("r--r--r--"));
        Path other = copy(UPRIGHT, "other.csv");
        Path link = Files.createSymbolicLink(dir.resolve("link.csv"), other.getFileName());
        String upright = Files.readString(UPRIGHT);
        for (String command : List.of("analyze", "stretch", "plan-plain")) {
            List<Object> args = command.equals("plan-plain") ? List.of(command, sheet, "--keys", "60-88")
                    : List.of(command, sheet);
            refused(run(concat(args, "--out", ro)), "read-only");
            refused(run(concat(args, "--out", link)), "symbolic link");
        }
        assertEquals(upright, Files.readString(ro));
        assertEquals(upright, Files.readString(other));
        assertTrue(Files.isSymbolicLink(link));
        Path report = Files.createSymbolicLink(dir.resolve("report-link"), Files.createDirectory(dir.resolve("r")));
        refused(run("report", sheet, "--out", report), "symbolic link");
        assertEquals(List.of("link.csv", "my.csv", "other.csv", "r", "report-link", "ro.csv"), names());
        Path device = Path.of("/dev/null");
        if (Files.exists(device)) {
            refused(run("analyze", sheet, "--out", device), "it is a device");
            assertFalse(Files.isRegularFile(device));
        }
        Path fifo = Fifos.make(dir.resolve("pipe.csv"));
        refused(run("analyze", sheet, "--out", fifo), "named pipe");
        refused(run("plan-wound", sheet, "--keys", "1-12", "--out", fifo), "named pipe");
        assertFalse(Files.isRegularFile(fifo));
    }

    @Test
    @DisplayName("--out over an existing sheet keeps it as NAME.csv.bak")
    void anOverwrittenSheetKeepsItsBackup() throws Exception {
        Path sheet = copy(GRAND, "my.csv");
        Path older = copy(UPRIGHT, "older.csv");
        Run r = run("plan-plain", sheet, "--keys", "60-88", "--out", older);
        assertEquals(0, r.status(), r.err());
        assertEquals(Files.readString(UPRIGHT), Files.readString(dir.resolve("older.csv.bak")));
        Path results = copy(UPRIGHT, "results.csv");
        assertEquals(0, run("analyze", sheet, "--out", results).status());
        assertEquals(Files.readString(UPRIGHT), Files.readString(dir.resolve("results.csv.bak")));
        assertTrue(Files.readString(results).contains("break_pct"));
    }

    @Test
    @DisplayName("report --out over an earlier report replaces it whole and leaves no temporary files")
    void aReportReplacesAnEarlierOneWhole() throws Exception {
        Path out = dir.resolve("report");
        assertEquals(0, run("report", UPRIGHT, "--out", out).status());
        assertTrue(Files.readString(out.resolve("results.csv")).contains("upright"));
        Run r = run("report", GRAND, "--out", out);
        assertEquals(0, r.status(), r.err());
        try (Stream<Path> s = Files.list(out)) {
            for (Path p : s.filter(p -> p.toString().endsWith(".csv")).toList()) {
                String text = Files.readString(p);
                assertTrue(text.contains("grand") && !text.contains("upright"), p + " is of the new report");
            }
        }
        assertEquals(List.of("report"), names(), "nothing left beside the report");
        Files.writeString(out.resolve("notes.txt"), "mine");
        refused(run("report", UPRIGHT, "--out", out), "not part of a report (notes.txt)");
        assertEquals("mine", Files.readString(out.resolve("notes.txt")));
    }

    private static Object[] concat(List<Object> args, Object... more) {
        return Stream.concat(args.stream(), Stream.of(more)).toArray();
    }
}
