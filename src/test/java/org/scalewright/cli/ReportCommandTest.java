package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.opencsv.CSVReader;
import java.awt.image.BufferedImage;
import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import picocli.CommandLine;

class ReportCommandTest {
    static final Path GRAND = Path.of("demo-instruments/grand-190/grand-190.csv");
    static final Path UPRIGHT = Path.of("demo-instruments/upright-131/upright-131.csv");

    @TempDir
    Path tmp;

    record Run(int status, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int rc = ScalewrightCommand.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(rc, out.toString(), err.toString());
    }

    static List<String[]> csv(Path file) throws Exception {
        StringBuilder data = new StringBuilder();
        for (String line : Files.readAllLines(file)) {
            if (!line.startsWith("#")) {
                data.append(line).append('\n');
            }
        }
        try (CSVReader r = new CSVReader(new StringReader(data.toString()))) {
            return new ArrayList<>(r.readAll());
        }
    }

    static long count(Path dir, String suffix) throws Exception {
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(p -> p.getFileName().toString().endsWith(suffix)).count();
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"demo-instruments/grand-190/grand-190.csv", "demo-instruments/upright-131/upright-131.csv"})
    void aReportOfEachDemoInstrumentWritesEveryFile(String sheet) throws Exception {
        Path dir = tmp.resolve("out");
        Run r = run("report", sheet, "--out", dir.toString());
        assertEquals(0, r.status(), r.err());
        assertEquals("", r.err());
        assertTrue(r.out().contains("wrote 15 files"), r.out());
        assertTrue(count(dir, ".png") >= 3 && count(dir, ".svg") >= 3);
        for (String f : List.of("report.pdf", "results.csv", "schedule.csv", "wound-order.csv", "wire-order.csv",
                "stretch.csv", "tables.xlsx")) {
            assertTrue(Files.size(dir.resolve(f)) > 0, f);
        }
        try (PDDocument doc = Loader.loadPDF(dir.resolve("report.pdf").toFile())) {
            assertTrue(doc.getNumberOfPages() >= 8);
            PDFRenderer renderer = new PDFRenderer(doc);
            for (int p = 0; p < doc.getNumberOfPages(); p++) {
                BufferedImage img = renderer.renderImageWithDPI(p, 30);
                assertTrue(img.getWidth() > 200, "page " + (p + 1) + " renders");
            }
        }
        wireOrderTotalsAreTheSumsOfTheRows(dir.resolve("wire-order.csv"));
        for (String f : List.of("results.csv", "schedule.csv", "wound-order.csv", "wire-order.csv", "stretch.csv")) {
            noFormulaCells(dir.resolve(f));
        }
        List<String[]> stretch = csv(dir.resolve("stretch.csv"));
        assertEquals(List.of("key", "note", "stretch_cents"), Arrays.asList(stretch.get(0)).subList(0, 3));
        for (String[] row : stretch.subList(1, stretch.size())) {
            int key = Integer.parseInt(row[0]);
            if (key >= 37 && key <= 49) {
                assertEquals(0.0, Double.parseDouble(row[2]), 0.0, "key " + key);
            }
        }
    }

    static void wireOrderTotalsAreTheSumsOfTheRows(Path file) throws Exception {
        List<String[]> rows = csv(file);
        List<String> h = Arrays.asList(rows.get(0));
        String[] total = rows.get(rows.size() - 1);
        assertEquals("total", total[0]);
        for (String col : List.of("notes", "strings", "pieces", "estimated_strings", "length_m", "mass_g")) {
            int i = h.indexOf(col);
            BigDecimal sum = BigDecimal.ZERO;
            for (String[] r : rows.subList(1, rows.size() - 1)) {
                sum = sum.add(new BigDecimal(r[i]));
            }
            assertEquals(0, sum.compareTo(new BigDecimal(total[i])), col + ": rows " + sum + ", total " + total[i]);
        }
    }

    static void noFormulaCells(Path file) throws Exception {
        for (String[] row : csv(file)) {
            for (String cell : row) {
                if (!cell.isEmpty() && "=+-@".indexOf(cell.charAt(0)) >= 0) {
                    try {
                        Double.parseDouble(cell);
                    } catch (NumberFormatException e) {
                        throw new AssertionError(file.getFileName() + ": formula-like text cell '" + cell + "'");
                    }
                }
            }
        }
    }

    @Test
    void imperialUnitsAndAReferenceScale() throws Exception {
        Path dir = tmp.resolve("imp");
        Run r = run("report", UPRIGHT.toString(), "--out", dir.toString(), "--units", "imperial",
                "--reference", GRAND.toString(), "--octave", "4:2", "--pin-allowance", "200", "--single-tied");
        assertEquals(0, r.status(), r.err());
        List<String> h = Arrays.asList(csv(dir.resolve("wound-order.csv")).get(0));
        assertTrue(h.contains("core_in") && h.contains("core_mm") && h.contains("stretched_length_in"), h.toString());
        assertTrue(Files.readString(dir.resolve("wire-order.csv")).contains("+ 200 mm for the tuning-pin coil"));
        List<String[]> wire = csv(dir.resolve("wire-order.csv"));
        List<String> wh = Arrays.asList(wire.get(0));
        String[] total = wire.get(wire.size() - 1);
        assertEquals(total[wh.indexOf("strings")], total[wh.indexOf("pieces")], "single-tied: a piece per string");
        assertTrue(Files.readString(dir.resolve("stretch.csv")).contains("4:2 (m=2)"));
        assertTrue(Files.readString(dir.resolve("tension.svg")).contains("reference"));
        try (PDDocument doc = Loader.loadPDF(dir.resolve("report.pdf").toFile())) {
            assertEquals(PDRectangle.LETTER.getWidth(), doc.getPage(0).getMediaBox().getWidth(), 0.01);
        }
    }

    @Test
    void thePaperIsChosenApartFromTheUnits() throws Exception {
        Path letter = tmp.resolve("letter");
        Run r = run("report", GRAND.toString(), "--out", letter.toString(), "--paper", "Letter");
        assertEquals(0, r.status(), r.err());
        Path a4 = tmp.resolve("a4");
        r = run("report", GRAND.toString(), "--out", a4.toString(), "--units", "imperial", "--paper", "a4");
        assertEquals(0, r.status(), r.err());
        try (PDDocument metricOnLetter = Loader.loadPDF(letter.resolve("report.pdf").toFile());
             PDDocument imperialOnA4 = Loader.loadPDF(a4.resolve("report.pdf").toFile())) {
            for (int p = 0; p < metricOnLetter.getNumberOfPages(); p++) {
                assertEquals(PDRectangle.LETTER.getHeight(), metricOnLetter.getPage(p).getMediaBox().getHeight(), 0.01);
            }
            for (int p = 0; p < imperialOnA4.getNumberOfPages(); p++) {
                assertEquals(PDRectangle.A4.getHeight(), imperialOnA4.getPage(p).getMediaBox().getHeight(), 0.01);
            }
        }
        assertFalse(Files.readString(letter.resolve("schedule.csv")).contains("speaking_length_in"),
                "the tables keep the sheet's metric units on Letter paper");
        assertTrue(Files.readString(a4.resolve("schedule.csv")).contains("speaking_length_in"),
                "the tables in inches on A4 paper");
        Run bad = run("report", GRAND.toString(), "--out", tmp.resolve("never").toString(), "--paper", "a3");
        assertEquals("error: --paper: paper must be a4 or letter, was 'a3'", bad.err().strip());
    }

    @Test
    void withoutFontsTheReportSaysWhatToInstallInOneLine() throws Exception {
        CommandLine cl = new CommandLine(new ScalewrightCommand());
        ReportCommand report = cl.getSubcommands().get("report").getCommand();
        report.charts = content -> {
            // as AWT fails on a machine without fontconfig's fonts: an Error, not an Exception
            throw new Error("Fontconfig head is null, check your fonts or fonts configuration");
        };
        Path dir = tmp.resolve("never");
        Path log = tmp.resolve("errors.log");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int rc = ScalewrightCommand.run(cl, new String[] {"report", GRAND.toString(), "--out", dir.toString()},
                new PrintWriter(out, true), new PrintWriter(err, true), log);
        assertEquals(1, rc);
        List<String> lines = err.toString().lines().toList();
        assertEquals(1, lines.size(), err.toString());
        assertTrue(lines.get(0).startsWith("error: the charts could not be drawn (Fontconfig head is null"),
                lines.get(0));
        assertTrue(lines.get(0).contains("install fontconfig and a font package such as fonts-dejavu-core"),
                lines.get(0));
        assertFalse(err.toString().contains("Exception") || err.toString().contains("\tat "), err.toString());
        assertFalse(Files.exists(dir), "nothing written");
        assertFalse(Files.exists(log), "not a program error: no stack trace logged");
    }

    @Test
    void aBadSheetWritesNothingAndExitsTwo() throws Exception {
        Path bad = Files.writeString(tmp.resolve("bad.csv"), "key,strings,length_mm,wire\n1,2,abc,14\n");
        Path dir = tmp.resolve("never");
        Run r = run("report", bad.toString(), "--out", dir.toString());
        assertEquals(2, r.status());
        assertTrue(r.err().startsWith("error: "), r.err());
        assertTrue(r.err().contains("bad.csv") && r.err().contains("line 2"), r.err());
        assertFalse(r.err().contains("Exception"), r.err());
        assertFalse(Files.exists(dir));
    }

    @Test
    void aBadReferenceWritesNothingEither() throws Exception {
        Path dir = tmp.resolve("never");
        Run r = run("report", GRAND.toString(), "--out", dir.toString(), "--reference",
                tmp.resolve("missing.csv").toString());
        assertEquals(2, r.status());
        assertTrue(r.err().contains("missing.csv"), r.err());
        assertFalse(Files.exists(dir));
    }

    @Test
    void badOptionsWriteNothingAndExitTwo() throws Exception {
        Path dir = tmp.resolve("never");
        for (String[] extra : List.of(new String[] {"--units", "furlongs"}, new String[] {"--octave", "3:1"},
                new String[] {"--pin-allowance", "-5"}, new String[] {"--a4", "0"}, new String[] {"--paper", "a3"})) {
            List<String> args = new ArrayList<>(List.of("report", GRAND.toString(), "--out", dir.toString()));
            args.addAll(List.of(extra));
            Run r = run(args.toArray(String[]::new));
            assertEquals(2, r.status(), String.join(" ", extra) + ": " + r.err());
            assertTrue(r.err().startsWith("error: "), r.err());
            assertEquals(1, r.err().lines().count(), r.err());
            assertFalse(Files.exists(dir), String.join(" ", extra));
        }
        Path file = Files.writeString(tmp.resolve("a-file"), "x");
        Run r = run("report", GRAND.toString(), "--out", file.toString());
        assertEquals(2, r.status());
        assertTrue(r.err().contains("is a file, not a directory"), r.err());
        assertEquals("x", Files.readString(file));
    }

    @Test
    void helpDescribesTheCommand() {
        Run r = run("report", "--help");
        assertEquals(0, r.status());
        assertTrue(r.out().contains("--reference") && r.out().contains("--units") && r.out().contains("--paper"),
                r.out());
    }
}
