package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.Note;
import org.scalewright.model.Scale;

/**
 * Every file the program writes carries the precision of its input or of its catalogue, never
 * binary-float noise (DESIGN §4, §5): planned sheets, the report's CSV files and the PDF's text.
 */
class WrittenNumbersTest {
    static final Path GRAND = Path.of("demo-instruments/grand-190/grand-190.csv");
    static final Path UPRIGHT = Path.of("demo-instruments/upright-131/upright-131.csv");
    /**
     * Float noise: five zeros or nines in a row after the point and another digit after them
     * ({@code 2.1000000000000001}, {@code 1.0399999999999998}). No value the program writes has a
     * legitimate run like that: diameters stop at 0.0001 mm, B is written in scientific notation.
     */
    static final Pattern NOISE = Pattern.compile("\\d\\.\\d*(00000|99999)\\d");

    @TempDir
    Path tmp;

    static int run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int rc = ScalewrightCommand.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        assertEquals(0, rc, String.join(" ", args) + "\n" + out + err);
        return rc;
    }

    static void assertNoNoise(String what, String text) {
        Matcher m = NOISE.matcher(text);
        assertFalse(m.find(), () -> what + " holds float noise: " + m.group() + " in line: "
                + text.lines().filter(l -> NOISE.matcher(l).find()).findFirst().orElse(""));
    }

    /** @return the cells of a sheet's column, by header name, for the rows of the keys asked */
    static List<String> column(Path sheet, String name, int firstKey, int lastKey) throws Exception {
        List<String> lines = Files.readAllLines(sheet).stream().filter(l -> !l.startsWith("#")).toList();
        List<String> header = List.of(lines.get(0).split(",", -1));
        int c = header.indexOf(name);
        assertTrue(c >= 0, name + " in " + header);
        List<String> cells = new ArrayList<>();
        for (String line : lines.subList(1, lines.size())) {
            String[] cell = line.split(",", -1);
            int key = Integer.parseInt(cell[header.indexOf("key")]);
            if (key >= firstKey && key <= lastKey && !cell[c].isEmpty()) {
                cells.add(cell[c]);
            }
        }
        return cells;
    }

    @Test
    @DisplayName("plan-wound --wrap-step 0.01 writes wraps on the 0.01 mm grid, no noise in the sheet")
    void plannedWrapsOnTheirGrid() throws Exception {
        Path out = tmp.resolve("w.csv");
        run("plan-wound", GRAND.toString(), "--keys", "1-20", "--wrap-step", "0.01", "--out", out.toString());
        String text = Files.readString(out);
        assertNoNoise("plan-wound sheet", text);
        List<String> wraps = new ArrayList<>(column(out, "wrap1_mm", 1, 20));
        wraps.addAll(column(out, "wrap2_mm", 1, 20));
        assertFalse(wraps.isEmpty());
        for (String w : wraps) {
            assertTrue(new BigDecimal(w).scale() <= 2, "a wrap planned in 0.01 mm steps is written to 0.01 mm: " + w);
        }
        // keys outside the plan keep the sheet's cells as typed
        assertEquals(column(GRAND, "wrap1_mm", 21, 88), column(out, "wrap1_mm", 21, 88));
    }

    @Test
    @DisplayName("plan-plain --sizes metric on an inch sheet: inch cells give back the metric catalogue diameter")
    void metricSizesOnAnInchSheet() throws Exception {
        Scale grand = ScaleSheetReader.standard().read(GRAND);
        StringBuilder sheet = new StringBuilder("# title: grand in inches\nkey,strings,length_in,wire_in,wrap1_in,wrap2_in\n");
        for (Note n : grand.notes()) {
            sheet.append(String.format(Locale.ROOT, "%d,%d,%.2f,%.4f,%s,%s%n", n.key(), n.strings(),
                    n.speakingLength() / 0.0254, n.wire().diameter() / 0.0254,
                    n.isWound() ? String.format(Locale.ROOT, "%.4f", n.wrap().inner() / 0.0254) : "",
                    n.isWound() && n.wrap().isDouble() ? String.format(Locale.ROOT, "%.4f", n.wrap().outer() / 0.0254) : ""));
        }
        Path in = tmp.resolve("inch.csv");
        Files.writeString(in, sheet);
        Path out = tmp.resolve("p.csv");
        run("plan-plain", in.toString(), "--keys", "40-88", "--sizes", "metric", "--out", out.toString());
        assertNoNoise("plan-plain sheet", Files.readString(out));
        List<String> planned = column(out, "wire_in", 40, 88);
        assertFalse(planned.isEmpty());
        for (String cell : planned) {
            assertTrue(new BigDecimal(cell).scale() <= 5, "an inch diameter to 0.00001 in: " + cell);
            // the metric catalogue is in 0.025 mm steps (common practice, no source): the cell read back and
            // rounded to 0.001 mm lands on that grid
            double mm = Math.round(Double.parseDouble(cell) * 25.4 * 1000) / 1000.0;
            assertEquals(0, Math.round(mm * 1000) % 25, cell + " in = " + mm + " mm");
        }
        // the lengths were typed to 0.01 in and stay so
        assertEquals(column(in, "length_in", 1, 88), column(out, "length_in", 1, 88));
    }

    @ParameterizedTest
    @CsvSource({"demo-instruments/grand-190/grand-190.csv,metric", "demo-instruments/grand-190/grand-190.csv,imperial",
            "demo-instruments/upright-131/upright-131.csv,metric", "demo-instruments/upright-131/upright-131.csv,imperial"})
    @DisplayName("no file the report writes holds float noise: every CSV and the PDF's text")
    void reportFilesHoldNoNoise(String sheet, String units) throws Exception {
        Path dir = tmp.resolve("rep");
        run("report", sheet, "--out", dir.toString(), "--units", units);
        int csvs = 0;
        try (Stream<Path> files = Files.list(dir)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".csv")).toList()) {
                assertNoNoise(f.getFileName().toString(), Files.readString(f));
                csvs++;
            }
        }
        assertEquals(5, csvs);
        try (PDDocument doc = Loader.loadPDF(dir.resolve("report.pdf").toFile())) {
            assertNoNoise("report.pdf", new PDFTextStripper().getText(doc));
        }
    }

    @Test
    @DisplayName("a 1.075 mm core prints as 1.075 in schedule.csv and the PDF, with the one wound-string notation")
    void coreDigitsKeptInTheReport() throws Exception {
        Path in = tmp.resolve("s.csv");
        Files.writeString(in, """
                key,strings,length_mm,wire_mm,wrap1_mm,wrap2_mm
                1,1,1480,1.075,1.25,1.08
                2,1,1465,1.075,1.2,
                40,3,600,1.025,,
                """);
        Path dir = tmp.resolve("rep");
        run("report", in.toString(), "--out", dir.toString());
        String schedule = Files.readString(dir.resolve("schedule.csv"));
        assertTrue(schedule.contains(",1.075 / 1.250 + 1.080 mm Cu (OD 5.735),"), schedule);
        assertTrue(schedule.contains(",1.075 / 1.200 mm Cu (OD 3.475),"), schedule);
        try (PDDocument doc = Loader.loadPDF(dir.resolve("report.pdf").toFile())) {
            String pdf = new PDFTextStripper().getText(doc);
            assertTrue(pdf.contains("1.075 / 1.250 + 1.080 mm Cu (OD 5.735)"), pdf);
        }
    }
}
