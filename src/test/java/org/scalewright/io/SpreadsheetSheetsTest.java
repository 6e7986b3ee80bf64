package org.scalewright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.scalewright.model.Scale;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

/**
 * The demo grand as real spreadsheets save it (LibreOffice Calc 7, headless; the fixtures and the exact
 * commands that made them are in src/test/resources/org/scalewright/io/sheets/README.md) analyses to
 * exactly the figures of the original sheet.
 */
class SpreadsheetSheetsTest {
    static final Path ORIGINAL = Path.of("demo-instruments/grand-190/grand-190.csv");

    static Path fixture(String name) {
        try {
            return Path.of(SpreadsheetSheetsTest.class.getResource("sheets/" + name).toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    static List<List<String>> figures(Scale s) {
        ScaleAnalysis a = ScaleAnalyzer.analyze(s, BuiltInData.defaultSettings());
        return AnalysisCsv.rows(a);
    }

    static List<String> notesOf(Path file) throws BadInputException {
        List<String> notes = new ArrayList<>();
        ReadNotes.toldTo(notes::add, () -> ScaleSheetReader.standard().read(file));
        return notes;
    }

    @ParameterizedTest
    @ValueSource(strings = {"grand-resaved.csv", "grand-semicolon-de.csv", "grand.xlsx", "grand-windows-1252.csv",
            "grand-line-break.csv", "grand-utf16-tabs.csv"})
    void aSheetSavedByASpreadsheetAnalysesToTheFiguresOfTheOriginal(String name) throws Exception {
        Scale original = ScaleSheetReader.standard().read(ORIGINAL);
        Scale saved = ScaleSheetReader.standard().read(fixture(name));
        assertEquals(figures(original), figures(saved), name);
        assertEquals(original.title(), saved.title(), "the title comment, split at its commas by the spreadsheet");
        assertEquals(original.pitch(), saved.pitch());
        assertEquals(original.layout().comments(), saved.layout().comments(), "the free comments");
    }

    @Test
    void remarksKeepTheirUmlautsAndLineBreaks() throws Exception {
        for (String name : List.of("grand-windows-1252.csv", "grand-line-break.csv", "grand-utf16-tabs.csv")) {
            Scale s = ScaleSheetReader.standard().read(fixture(name));
            assertEquals("Saite ersetzt, Stimmstock geprüft (Müller, Köln)", s.note(3).orElseThrow().remark(), name);
            assertEquals("old string broke at the coil\nreplaced 2026-11-30", s.note(4).orElseThrow().remark(), name);
        }
    }

    @Test
    void howAFileWasReadIsToldInANote() throws Exception {
        assertEquals(List.of(), notesOf(ORIGINAL));
        assertTrue(notesOf(fixture("grand-windows-1252.csv")).get(0).contains("read as Windows-1252"));
        List<String> de = notesOf(fixture("grand-semicolon-de.csv"));
        assertTrue(de.get(0).contains("separated by semicolons"), de.toString());
        List<String> u16 = notesOf(fixture("grand-utf16-tabs.csv"));
        assertTrue(u16.get(0).contains("UTF-16") && u16.get(1).contains("tabs"), u16.toString());
    }

    @Test
    void aLocaleDependentNumberIsRefusedWithItsLineAndColumn() throws Exception {
        String text = java.nio.file.Files.readString(fixture("grand-semicolon-de.csv"))
                .replace("1;\"bass\";1;1480;;1,6;", "1;\"bass\";1;1480;;1.143;");
        BadInputException e = assertThrows(BadInputException.class, () -> ScaleSheetReader.standard()
                .read(Path.of("de.csv"), text.getBytes(java.nio.charset.StandardCharsets.UTF_8)));
        SheetProblem p = e.problems().get(0);
        assertEquals(8, p.line());
        assertEquals("wire_mm", p.column());
        assertTrue(p.message().contains("'1.143'") && p.message().contains("thousands separator"), p.message());
    }

    @Test
    void anOpenDocumentSpreadsheetIsRefusedWithWhatToDo() {
        BadInputException e = assertThrows(BadInputException.class,
                () -> ScaleSheetReader.standard().read(fixture("grand.ods")));
        assertEquals("grand.ods: is an OpenDocument spreadsheet (.ods), which this program does not read; "
                + "save it as .xlsx or .csv", e.getMessage());
    }

    @Test
    void aDateInAWorkbookIsRefusedWithItsCell(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
        Path file = dir.resolve("dated.xlsx");
        try (var book = new org.apache.poi.xssf.usermodel.XSSFWorkbook()) {
            var sheet = book.createSheet("sheet");
            String[] head = {"key", "strings", "length_mm", "wire_mm"};
            var h = sheet.createRow(0);
            for (int i = 0; i < head.length; i++) {
                h.createCell(i).setCellValue(head[i]);
            }
            var r = sheet.createRow(1);
            r.createCell(0).setCellValue(40);
            r.createCell(1).setCellValue(3);
            r.createCell(2).setCellValue(1200.5);
            // what a German spreadsheet may make of 1.143 typed into a cell: the first of November
            var date = r.createCell(3);
            date.setCellValue(java.time.LocalDate.of(2026, 11, 1));
            var style = book.createCellStyle();
            style.setDataFormat(book.createDataFormat().getFormat("dd.mm.yyyy"));
            date.setCellStyle(style);
            try (var out = java.nio.file.Files.newOutputStream(file)) {
                book.write(out);
            }
        }
        BadInputException e = assertThrows(BadInputException.class, () -> ScaleSheetReader.standard().read(file));
        SheetProblem p = e.problems().get(0);
        assertEquals(2, p.line());
        assertEquals("D2", p.column());
        assertTrue(p.message().contains("formatted as a date"), p.message());
        assertTrue(p.toString().startsWith("dated.xlsx, row 2, column D2: "), p.toString());
    }
}
