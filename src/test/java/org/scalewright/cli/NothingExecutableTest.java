package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.opencsv.CSVReader;
import com.opencsv.CSVReaderBuilder;
import com.opencsv.RFC4180ParserBuilder;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.cli.OutputSafetyTest.Run;

/**
 * Nothing executable in outputs: a title that is a spreadsheet formula, comments with commas and
 * formula-like free text give no formula cell in any CSV the commands write, and escape or bell
 * characters in a sheet never reach the terminal.
 */
class NothingExecutableTest {
    static final String TITLE = "=HYPERLINK(\"http://x\",\"y\")\u001b]0;owned\u0007\u001b[2J";

    @TempDir
    Path dir;

    /** The demo upright with a hostile title, comments and text cells. */
    private Path hostileSheet() throws Exception {
        List<String> lines = new ArrayList<>();
        lines.add("# title: " + TITLE);
        lines.add("# =cmd|' /C calc'!A0, then more, =1+2");
        lines.add("# -2+3; @SUM(A1:A2), \"quoted\"");
        for (String l : Files.readAllLines(OutputSafetyTest.UPRIGHT)) {
            if (!l.startsWith("#")) {
                lines.add(l);
            }
        }
        String header = lines.get(3);
        assertTrue(header.startsWith("key,"), header);
        return Files.write(dir.resolve("hostile.csv"), lines);
    }

    @Test
    @DisplayName("no CSV any command writes holds a cell a spreadsheet would run")
    void noFormulaCellInAnyCsv() throws Exception {
        Path sheet = hostileSheet();
        List<Run> runs = new ArrayList<>();
        runs.add(OutputSafetyTest.run("analyze", sheet, "--out", dir.resolve("analyze.csv")));
        runs.add(OutputSafetyTest.run("stretch", sheet, "--out", dir.resolve("stretch.csv")));
        runs.add(OutputSafetyTest.run("check-wire", sheet, "--flat-cents", "30", "--out", dir.resolve("check.csv")));
        runs.add(OutputSafetyTest.run("diagnose", sheet, "--keys", "30-88", "--out", dir.resolve("diagnose.csv")));
        runs.add(OutputSafetyTest.run("plan-plain", sheet, "--keys", "40-88", "--out", dir.resolve("plain.csv")));
        runs.add(OutputSafetyTest.run("plan-wound", sheet, "--keys", "1-20", "--out", dir.resolve("wound.csv")));
        runs.add(OutputSafetyTest.run("report", sheet, "--out", dir.resolve("report")));
        for (Run r : runs) {
            assertEquals(0, r.status(), r.err());
        }
        List<Path> csvs;
        try (Stream<Path> s = Files.walk(dir)) {
            csvs = s.filter(p -> p.toString().endsWith(".csv") && !p.equals(sheet)).sorted().toList();
        }
        assertEquals(11, csvs.size(), csvs.toString());
        int titles = 0;
        for (Path csv : csvs) {
            String text = Files.readString(csv);
            for (String[] row : rows(text)) {
                for (String cell : row) {
                    String c = cell.stripLeading();
                    assertFalse(!c.isEmpty() && "=+-@".indexOf(c.charAt(0)) >= 0 && !isNumber(c),
                            csv.getFileName() + ": a cell a spreadsheet would run: " + cell);
                    titles += cell.contains("HYPERLINK") ? 1 : 0;
                }
            }
            assertFalse(text.chars().anyMatch(ch -> ch < 0x20 && ch != '\n'), csv + " holds a control character");
        }
        assertTrue(titles >= 8, "the title is kept, as text, in the files that name it: " + titles);
        String plain = Files.readString(dir.resolve("plain.csv"));
        assertTrue(plain.contains("#,\"title: '=HYPERLINK") || plain.contains("#,\"title: =HYPERLINK"), plain);
        assertEquals("=HYPERLINK(\"http://x\",\"y\")]0;owned[2J",
                org.scalewright.io.ScaleSheetReader.standard().read(dir.resolve("plain.csv")).title(),
                "the planned sheet reads back with its title (control characters left out)");
    }

    @Test
    @DisplayName("escape and bell characters in a sheet never reach the terminal")
    void noControlCharacterReachesTheTerminal() throws Exception {
        Path sheet = hostileSheet();
        for (Run r : List.of(OutputSafetyTest.run("analyze", sheet),
                OutputSafetyTest.run("report", sheet, "--out", dir.resolve("r")),
                OutputSafetyTest.run("analyze", sheet, "--keys", "200-300"),
                OutputSafetyTest.run("analyze", dir.resolve("no\u001b[31mfile\u0007.csv")))) {
            String all = r.out() + r.err();
            assertFalse(all.isEmpty());
            assertTrue(all.chars().noneMatch(ch -> (ch < 0x20 && ch != '\n' && ch != '\t') || ch == 0x7f),
                    "a control character on the terminal: " + all.replace("\u001b", "<ESC>").replace("\u0007", "<BEL>"));
        }
        assertTrue(OutputSafetyTest.run("analyze", sheet).out().contains("=HYPERLINK(\"http://x\",\"y\")]0;owned"),
                "the title is shown, without its control characters");
    }

    @Test
    void theTerminalFilterKeepsLineEndsAndDropsControls() {
        assertEquals("a\tb\r\nc]0;x", TerminalText.clean("a\tb\r\nc\u001b]0;x\u0007\r"));
        assertEquals("ab", TerminalText.clean("a\u009bb\u202e"));
        assertEquals("one line", TerminalText.cell("one\nline\u0007"));
        java.io.StringWriter w = new java.io.StringWriter();
        java.io.PrintWriter p = TerminalText.printer(new java.io.PrintWriter(w));
        p.print("x\u001b[31my\r");
        p.print("\nz\rq");
        p.flush();
        assertEquals("x[31my\r\nzq", w.toString());
    }

    private static boolean isNumber(String s) {
        try {
            Double.parseDouble(s);
            return true;
        } catch (NumberFormatException e) {
            return false;
        }
    }

    private static List<String[]> rows(String text) throws Exception {
        try (CSVReader r = new CSVReaderBuilder(new StringReader(text))
                .withCSVParser(new RFC4180ParserBuilder().build()).build()) {
            return r.readAll();
        }
    }
}
