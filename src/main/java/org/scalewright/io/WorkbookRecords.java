package org.scalewright.io;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.poi.EncryptedDocumentException;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.DateUtil;
import org.apache.poi.ss.usermodel.FormulaError;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.ss.usermodel.WorkbookFactory;
import org.apache.poi.ss.util.CellReference;

/**
 * Reads the first sheet of a workbook (.xlsx, also the older .xls) with Apache POI into the records of
 * {@link SheetRecords}: one record per spreadsheet row, numbered as the spreadsheet numbers its rows. A
 * number cell is taken as its exact value (no locale is involved), a formula as the value it last
 * computed; a date, an error value or a formula without a stored value is refused with its cell.
 */
final class WorkbookRecords {
    private WorkbookRecords() {
    }

    /** @return true when the bytes begin as a zip archive (.xlsx, .ods) or an OLE2 compound file (.xls) does */
    static boolean isWorkbook(byte[] bytes) {
        return TextFile.startsWith(bytes, 'P', 'K', 3, 4)
                || TextFile.startsWith(bytes, 0xD0, 0xCF, 0x11, 0xE0, 0xA1, 0xB1, 0x1A, 0xE1);
    }

    static SheetRecords read(Path file, byte[] bytes) throws BadInputException {
        if (isOpenDocument(bytes)) {
            throw BadInputException.of(file, "is an OpenDocument spreadsheet (.ods), which this program does not "
                    + "read; save it as .xlsx or .csv");
        }
        Workbook book;
        try {
            book = WorkbookFactory.create(new ByteArrayInputStream(bytes));
        } catch (EncryptedDocumentException e) {
            throw BadInputException.of(file, "is a protected (encrypted) workbook; save it without a password");
        } catch (IOException | RuntimeException e) {
            throw BadInputException.of(file, "is a zip archive or binary file but not a workbook that can be read ("
                    + e.getMessage() + "); save the sheet as .xlsx or .csv");
        }
        try (book) {
            if (book.getNumberOfSheets() == 0) {
                throw BadInputException.of(file, "the workbook has no sheet");
            }
            Sheet sheet = book.getSheetAt(0);
            List<SheetProblem> problems = new ArrayList<>();
            List<SheetRecords.Record> records = new ArrayList<>();
            for (Row row : sheet) {
                List<String> cells = cells(file, row, problems);
                if (cells.stream().allMatch(String::isBlank)) {
                    continue;
                }
                if (cells.get(0).strip().startsWith("#")) {
                    records.add(SheetRecords.Record.comment(row.getRowNum() + 1, SheetRecords.commentText(cells)));
                } else {
                    records.add(SheetRecords.Record.cells(row.getRowNum() + 1, cells));
                }
            }
            if (!problems.isEmpty()) {
                throw new BadInputException(problems);
            }
            List<String> notes = new ArrayList<>();
            if (book.getNumberOfSheets() > 1) {
                notes.add("read the first sheet of the workbook, '" + sheet.getSheetName() + "' (it has "
                        + book.getNumberOfSheets() + " sheets)");
            }
            return new SheetRecords(records, (char) 0, notes);
        } catch (IOException e) {
            throw BadInputException.of(file, "cannot be read: " + e.getMessage());
        }
    }

    private static List<String> cells(Path file, Row row, List<SheetProblem> problems) {
        List<String> out = new ArrayList<>();
        for (int c = 0; c < Math.max(row.getLastCellNum(), 0); c++) {
            out.add(text(file, row.getCell(c), problems));
        }
        // a cell formatted but empty counts in the row's width; it holds nothing
        while (!out.isEmpty() && out.get(out.size() - 1).isBlank()) {
            out.remove(out.size() - 1);
        }
        return out;
    }

    private static String text(Path file, Cell cell, List<SheetProblem> problems) {
        if (cell == null) {
            return "";
        }
        CellType type = cell.getCellType();
        if (type == CellType.FORMULA) {
            type = cell.getCachedFormulaResultType();
        }
        String where = new CellReference(cell).formatAsString(false);
        return switch (type) {
            case NUMERIC -> {
                if (DateUtil.isCellDateFormatted(cell)) {
                    problems.add(new SheetProblem(file, cell.getRowIndex() + 1, where, "the cell is formatted as a "
                            + "date or time; a spreadsheet may have turned a number into a date here: format it as "
                            + "a number and check its value"));
                    yield "";
                }
                double v = cell.getNumericCellValue();
                yield v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v)
                        : BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
            }
            case STRING -> cell.getStringCellValue();
            case BOOLEAN -> Boolean.toString(cell.getBooleanCellValue());
            case ERROR -> {
                problems.add(new SheetProblem(file, cell.getRowIndex() + 1, where, "the cell holds the error "
                        + FormulaError.forInt(cell.getErrorCellValue()).getString()));
                yield "";
            }
            default -> "";
        };
    }

    /** An OpenDocument file is a zip archive whose first entry, stored, is {@code mimetype}. */
    private static boolean isOpenDocument(byte[] bytes) {
        String head = new String(bytes, 0, Math.min(bytes.length, 100), java.nio.charset.StandardCharsets.ISO_8859_1);
        return head.startsWith("PK") && head.contains("mimetypeapplication/vnd.oasis.opendocument");
    }
}
