package org.scalewright.app.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.scalewright.model.DisplayUnits;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.TestSheets;
import org.scalewright.report.ReportPaper;

/** The Exports tab's behaviour through its view model, without a display, on the demo grand. */
class ExportViewModelTest {
    @TempDir
    Path dir;
    private final ExportTestPrompts prompts = new ExportTestPrompts();
    private ScaleSession session;
    private ExportViewModel vm;

    @BeforeEach
    void openDemoGrand() throws Exception {
        session = new ScaleSession();
        session.open(TestSheets.demoGrand(), false);
        vm = new ExportViewModel(session, prompts);
    }

    private static List<String> names(Path d) throws IOException {
        try (Stream<Path> s = Files.list(d)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void theWholeReportGoesIntoTheChosenFolder() throws IOException {
        Path out = dir.resolve("grand-report");
        prompts.files.add(out);
        assertTrue(vm.exportReport());
        List<String> expected = Stream.of("report.pdf", "results.csv", "schedule.csv", "wound-order.csv",
                "wire-order.csv", "stretch.csv", "tables.xlsx", "tension.png", "tension.svg", "break-percent.png",
                "break-percent.svg", "inharmonicity.png", "inharmonicity.svg", "stretch.png", "stretch.svg")
                .sorted().toList();
        assertEquals(expected, names(out));
        byte[] pdf = Files.readAllBytes(out.resolve("report.pdf"));
        assertEquals("%PDF", new String(pdf, 0, 4, StandardCharsets.US_ASCII));
        assertEquals(15, vm.written().size());
        for (ExportViewModel.Written w : vm.written()) {
            assertEquals(Files.size(w.path()), w.bytes(), w.path().toString());
            assertTrue(w.bytes() > 0, w.path().toString());
        }
        assertFalse(vm.noteIsProblemProperty().get());
        assertTrue(vm.noteProperty().get().startsWith("Wrote the report into " + out.toAbsolutePath() + ": 15 files"),
                vm.noteProperty().get());
        assertTrue(session.messageProperty().get().startsWith("wrote the report into"), session.messageProperty().get());
        assertTrue(prompts.errors.isEmpty(), prompts.errors.toString());
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            String text = new PDFTextStripper().getText(doc);
            assertTrue(text.contains("as opened: grand-190.csv"), "the session's reference goes into the report");
        }
    }

    private static float pageHeight(Path pdf) throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            return doc.getPage(0).getMediaBox().getHeight();
        }
    }

    @Test
    void thePaperFollowsTheUnitsUntilChosenAndThenStaysAsChosen() throws IOException {
        assertEquals(ReportPaper.A4, vm.paperProperty().get(), "metric display: A4");
        session.unitsProperty().set(DisplayUnits.IMPERIAL);
        assertEquals(ReportPaper.LETTER, vm.paperProperty().get(), "imperial display: Letter");
        assertTrue(vm.write(ExportPiece.PDF, dir.resolve("letter.pdf")));
        assertEquals(PDRectangle.LETTER.getHeight(), pageHeight(dir.resolve("letter.pdf")), 0.01);

        vm.paperProperty().set(ReportPaper.A4); // chosen in the Exports tab
        session.unitsProperty().set(DisplayUnits.METRIC);
        session.unitsProperty().set(DisplayUnits.IMPERIAL);
        assertEquals(ReportPaper.A4, vm.paperProperty().get(), "the chosen paper stays whatever the units");
        assertTrue(vm.writeReportTo(dir.resolve("imperial-on-a4")));
        assertEquals(PDRectangle.A4.getHeight(), pageHeight(dir.resolve("imperial-on-a4").resolve("report.pdf")),
                0.01);
        assertTrue(Files.readString(dir.resolve("imperial-on-a4").resolve("schedule.csv"))
                .contains("speaking_length_in"), "the tables stay in inches");

        vm.paperProperty().set(null); // back to following the units
        assertEquals(ReportPaper.LETTER, vm.paperProperty().get());
        session.unitsProperty().set(DisplayUnits.METRIC);
        assertEquals(ReportPaper.A4, vm.paperProperty().get());
    }

    @Test
    void withoutFontsTheExportShowsWhatToInstallAndWritesNothing() throws IOException {
        vm.charts = content -> {
            throw new Error("Fontconfig head is null, check your fonts or fonts configuration");
        };
        assertFalse(vm.writeReportTo(dir.resolve("report")));
        assertFalse(Files.exists(dir.resolve("report")));
        assertFalse(vm.write(ExportPiece.PDF, dir.resolve("alone.pdf")));
        assertFalse(Files.exists(dir.resolve("alone.pdf")));
        assertEquals(2, prompts.errors.size(), prompts.errors.toString());
        for (String shown : prompts.errors) {
            assertTrue(shown.contains("the charts could not be drawn (Fontconfig head is null, check your fonts or "
                    + "fonts configuration). Java draws the charts' text with the system's fonts; install fontconfig "
                    + "and a font package such as fonts-dejavu-core"), shown);
            assertFalse(shown.contains("Exception") || shown.contains("java.lang"), shown);
        }
        assertTrue(vm.noteIsProblemProperty().get());
        assertTrue(vm.noteProperty().get().contains("fonts-dejavu-core"), vm.noteProperty().get());
    }

    @Test
    void aFolderThatIsAFileIsRefusedWithTheReasonAndNothingIsWritten() throws IOException {
        Path notAFolder = Files.writeString(dir.resolve("occupied"), "x");
        assertFalse(vm.writeReportTo(notAFolder));
        assertEquals("x", Files.readString(notAFolder));
        assertEquals(List.of("occupied"), names(dir));
        assertTrue(vm.noteIsProblemProperty().get());
        assertTrue(vm.noteProperty().get().contains("is a file, not a directory"), vm.noteProperty().get());
        assertTrue(session.messageIsProblemProperty().get());
        assertEquals(1, prompts.errors.size());
        assertTrue(vm.written().isEmpty());

        Path noParent = dir.resolve("missing").resolve("report");
        assertFalse(vm.writeReportTo(noParent));
        assertTrue(vm.noteProperty().get().contains("parent directory"), vm.noteProperty().get());
        assertFalse(Files.exists(dir.resolve("missing")));
    }

    @Test
    void aTableNamedXlsxBecomesAWorkbook() throws IOException {
        prompts.files.add(dir.resolve("schedule.xlsx"));
        assertTrue(vm.export(ExportPiece.of(ExportContent.SCHEDULE)), vm.noteProperty().get());
        assertEquals(List.of("schedule.xlsx"), names(dir));
        byte[] b = Files.readAllBytes(dir.resolve("schedule.xlsx"));
        assertEquals("PK", new String(b, 0, 2, StandardCharsets.ISO_8859_1), "an .xlsx is a zip package");
        // a chart keeps its own extension whatever is typed
        prompts.files.add(dir.resolve("tension.xlsx"));
        assertTrue(vm.export(new ExportPiece(ExportContent.TENSION_CURVE, ExportFormat.PNG)));
        assertTrue(Files.exists(dir.resolve("tension.xlsx.png")));
    }

    static List<ExportPiece> pieces() {
        return ExportPiece.all();
    }

    @ParameterizedTest
    @MethodSource("pieces")
    void eachPieceAloneWritesItsFile(ExportPiece piece) throws IOException {
        Path chosen = dir.resolve("piece"); // without extension: the export adds it
        prompts.files.add(chosen);
        assertTrue(vm.export(piece), vm.noteProperty().get());
        String ext = piece.format().extension();
        assertEquals(List.of(ext), prompts.extensionsAsked);
        assertEquals("grand-190-" + piece.fileStem() + "." + ext, prompts.suggestedNames.get(0));
        Path file = dir.resolve("piece." + ext);
        assertEquals(List.of("piece." + ext), names(dir));
        byte[] b = Files.readAllBytes(file);
        String head = new String(b, 0, Math.min(b.length, 400), StandardCharsets.ISO_8859_1);
        switch (piece.format()) {
            case PDF -> assertTrue(head.startsWith("%PDF"));
            case PNG -> assertTrue(head.startsWith("\u0089PNG"));
            case SVG -> assertTrue(head.startsWith("<?xml") && new String(b, StandardCharsets.UTF_8).contains("<svg"));
            case CSV -> assertTrue(head.startsWith("#") && Files.readAllLines(file).size() > 20, head);
        }
        assertEquals(1, vm.written().size());
        assertEquals(b.length, vm.written().get(0).bytes());
        if (piece.format() == ExportFormat.CSV && piece.content() != ExportContent.RESULTS) {
            assertTrue(Files.readString(file).contains("# reference: as opened: grand-190.csv"));
        }
        assertTrue(session.messageProperty().get().startsWith("wrote "), session.messageProperty().get());
    }

    @Test
    void theTablesFollowTheDisplayUnits() throws IOException {
        Path metric = dir.resolve("metric.csv");
        assertTrue(vm.write(ExportPiece.of(ExportContent.SCHEDULE), metric));
        session.unitsProperty().set(DisplayUnits.IMPERIAL);
        Path imperial = dir.resolve("imperial.csv");
        assertTrue(vm.write(ExportPiece.of(ExportContent.SCHEDULE), imperial));
        String m = Files.readAllLines(metric).stream().filter(l -> !l.startsWith("#")).findFirst().orElseThrow();
        String i = Files.readAllLines(imperial).stream().filter(l -> !l.startsWith("#")).findFirst().orElseThrow();
        assertTrue(m.contains("_mm") && !m.contains("_in"), m);
        assertTrue(i.contains("_in"), i);
    }

    @Test
    void aFileIntoAMissingFolderOrOntoAFolderSaysWhyAndWritesNothing() throws IOException {
        assertFalse(vm.write(ExportPiece.of(ExportContent.WIRE_ORDER), dir.resolve("nope").resolve("w.csv")));
        assertTrue(vm.noteProperty().get().contains("does not exist"), vm.noteProperty().get());
        Files.createDirectory(dir.resolve("taken.csv"));
        assertFalse(vm.write(ExportPiece.of(ExportContent.WIRE_ORDER), dir.resolve("taken.csv")));
        assertTrue(vm.noteProperty().get().contains("is a folder"), vm.noteProperty().get());
        assertEquals(List.of("taken.csv"), names(dir));
        assertEquals(2, prompts.errors.size());
    }

    @Test
    void cancellingTheChooserWritesNothingAndSaysNothing() throws IOException {
        assertFalse(vm.export(ExportPiece.PDF));
        assertFalse(vm.exportReport());
        assertTrue(names(dir).isEmpty());
        assertTrue(prompts.errors.isEmpty());
        assertFalse(vm.noteIsProblemProperty().get());
    }

    @Test
    void anEmptySessionHasNothingToExport() {
        ExportViewModel empty = new ExportViewModel(new ScaleSession(), prompts);
        assertFalse(empty.writeReportTo(dir.resolve("r")));
        assertTrue(empty.noteProperty().get().contains("no notes"), empty.noteProperty().get());
        assertFalse(Files.exists(dir.resolve("r")));
    }
}
