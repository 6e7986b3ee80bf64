package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.scalewright.cli.CommandRun.run;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.ss.usermodel.WorkbookFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Tables for spreadsheets (DESIGN §5): {@code --out FILE.xlsx} and the report's {@code tables.xlsx} read
 * back with Apache POI (an independent reader of the format): every number a number cell, headings in
 * words with units, the header frozen, the notes on their own sheet; {@code --decimal-comma} CSV; a
 * locale-dependent number in the input refused with its place, exit 2, nothing written.
 */
class SpreadsheetOutputTest {
    private static final Path GRAND = Path.of("demo-instruments/grand-190/grand-190.csv");

    @TempDir
    Path dir;

    /** @return the number of number cells; fails on any text cell that reads as a number */
    private static int checkNumbersAreNumbers(Sheet sheet) {
        int numbers = 0;
        for (Row row : sheet) {
            if (row.getRowNum() == 0) {
                continue;
            }
            for (Cell c : row) {
                if (c.getCellType() == CellType.NUMERIC) {
                    numbers++;
                } else {
                    String text = c.getStringCellValue();
                    assertFalse(text.matches("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?"), sheet.getSheetName()
                            + " row " + (row.getRowNum() + 1) + ": a number written as text: " + text);
                }
            }
        }
        return numbers;
    }

    @ParameterizedTest
    @ValueSource(strings = {"analyze", "stretch", "diagnose", "check-wire"})
    void everyTableCommandWritesAWorkbookWhenTheNameEndsInXlsx(String command) throws Exception {
        Path out = dir.resolve("x.xlsx");
        List<String> args = new java.util.ArrayList<>(List.of(command, GRAND.toString(), "--out", out.toString()));
        if (command.equals("diagnose")) {
            args.addAll(List.of("--keys", "1-88"));
        }
        CommandRun r = run(args.toArray(String[]::new));
        assertEquals(0, r.status(), r.err());
        try (Workbook book = WorkbookFactory.create(out.toFile())) {
            Sheet results = book.getSheet("results");
            assertNotNull(results);
            assertTrue(checkNumbersAreNumbers(results) > 88, command);
            assertEquals(1, results.getPaneInformation().getHorizontalSplitPosition(), "the header row is frozen");
            assertNotNull(book.getSheet("notes"));
            assertEquals(2, book.getNumberOfSheets());
        }
    }

    @Test
    void theAnalysisWorkbookHasWordsWithUnitsAndItsNotesApart() throws Exception {
        Path out = dir.resolve("grand.xlsx");
        assertEquals(0, run("analyze", GRAND.toString(), "--out", out.toString()).status());
        try (Workbook book = WorkbookFactory.create(out.toFile())) {
            Sheet results = book.getSheet("results");
            Row head = results.getRow(0);
            assertEquals("key", head.getCell(0).getStringCellValue());
            assertEquals("tension per string (N)", head.getCell(8).getStringCellValue());
            assertEquals("frequency (Hz)", head.getCell(3).getStringCellValue());
            Row a0 = results.getRow(1);
            assertEquals(1, a0.getCell(0).getNumericCellValue());
            assertEquals(27.5, a0.getCell(3).getNumericCellValue(), 1e-12, "A0 at A4 = 440 Hz (ISO 16)");
            assertEquals("0.00", a0.getCell(8).getCellStyle().getDataFormatString(), "tension to 0.01 N");
            assertEquals(89, results.getLastRowNum() + 1, "header and 88 notes, nothing before the header");
            StringBuilder notes = new StringBuilder();
            for (Row row : book.getSheet("notes")) {
                notes.append(row.getCell(0).getStringCellValue()).append('\n');
            }
            assertTrue(notes.toString().contains("a4_hz: 440"), notes.toString());
            assertTrue(notes.toString().contains("strength table: ASTM A228"), notes.toString());
            assertTrue(notes.toString().contains("cautions"), notes.toString());
        }
    }

    @Test
    void theReportFolderHoldsItsTablesAsOneWorkbook() throws Exception {
        Path report = dir.resolve("report");
        CommandRun r = run("report", GRAND.toString(), "--out", report.toString());
        assertEquals(0, r.status(), r.err());
        try (Workbook book = WorkbookFactory.create(report.resolve("tables.xlsx").toFile())) {
            for (String name : List.of("results", "schedule", "wound-order", "wire-order", "stretch")) {
                Sheet s = book.getSheet(name);
                assertNotNull(s, name);
                assertTrue(checkNumbersAreNumbers(s) > 0, name);
            }
            assertNotNull(book.getSheet("notes"));
        }
    }

    @Test
    void decimalCommaCsvHasSemicolonsCommasAndAByteOrderMarkAndReadsBack() throws Exception {
        Path out = dir.resolve("x.csv");
        assertEquals(0, run("analyze", GRAND.toString(), "--out", out.toString(), "--decimal-comma").status());
        byte[] bytes = Files.readAllBytes(out);
        assertEquals((byte) 0xEF, bytes[0]);
        String text = new String(bytes, StandardCharsets.UTF_8);
        assertTrue(text.contains("\n1;A0;bass;27,5;1;true;1,6;"), text.substring(0, 600));
        Path plain = dir.resolve("plain.csv");
        assertEquals(0, run("analyze", GRAND.toString(), "--out", plain.toString()).status());
        assertFalse(Files.readString(plain).startsWith("\uFEFF"));
    }

    @Test
    void aLocaleDependentNumberIsRefusedWithItsPlaceAndNothingIsWritten() throws Exception {
        Path sheet = Files.writeString(dir.resolve("de.csv"), """
                # a4_hz: 440
                key;strings;length_mm;wire_mm
                1;1;1480;1,60
                2;1;1465;1.143
                """);
        Path out = dir.resolve("x.xlsx");
        CommandRun r = run("analyze", sheet.toString(), "--out", out.toString());
        assertEquals(2, r.status());
        assertTrue(r.err().contains("de.csv, line 4, column wire_mm: '1.143'"), r.err());
        assertFalse(Files.exists(out));
    }

    @Test
    void odsIsRefusedAsOutputAndAScaleSheetStaysCsv() throws Exception {
        CommandRun r = run("analyze", GRAND.toString(), "--out", dir.resolve("x.ods").toString());
        assertEquals(2, r.status());
        assertTrue(r.err().contains(".xlsx"), r.err());
        assertFalse(Files.exists(dir.resolve("x.ods")));
        r = run("plan-plain", GRAND.toString(), "--keys", "40-88", "--out", dir.resolve("new.xlsx").toString());
        assertEquals(2, r.status());
        assertTrue(r.err().contains("a scale sheet is written as CSV"), r.err());
        assertFalse(Files.exists(dir.resolve("new.xlsx")));
    }
}
