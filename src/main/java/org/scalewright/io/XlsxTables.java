package org.scalewright.io;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.ss.util.WorkbookUtil;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * Tables as one .xlsx workbook (Apache POI) for people who open them in a spreadsheet: one sheet per
 * table, its first row the columns in plain words with their units ({@link ColumnWords}), frozen, then
 * the rows, every number a number cell with a number format of the decimals it was written with, every
 * other cell text (a text cell is never run as a formula); the comment lines (title, pitch standard,
 * strength table, totals) and the cautions on a sheet of their own, {@code notes}, with the column names
 * of the CSV beside their words.
 */
public final class XlsxTables {
    /** A table to write. @param name the sheet's name @param sheet its comment lines, header and rows */
    public record Table(String name, CsvSheet sheet) {
        List<String> comments() {
            return sheet.comments();
        }

        List<String> header() {
            return sheet.header();
        }

        List<List<String>> rows() {
            return sheet.rows();
        }
    }


    /** The name of the sheet holding the notes. */
    public static final String NOTES = "notes";
    private static final int MAX_COLUMN_CHARS = 60;

    private XlsxTables() {
    }

    /** @return the workbook's bytes: the tables in order, then the notes sheet */
    public static byte[] toBytes(List<Table> tables) {
        try (XSSFWorkbook book = new XSSFWorkbook(); ByteArrayOutputStream out = new ByteArrayOutputStream()) {
            Styles styles = new Styles(book);
            for (Table t : tables) {
                table(book.createSheet(WorkbookUtil.createSafeSheetName(t.name())), t, styles);
            }
            notes(book.createSheet(NOTES), tables, styles);
            book.write(out);
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("writing a workbook to memory failed", e);
        }
    }

    private static void table(Sheet sheet, Table t, Styles styles) {
        Row head = sheet.createRow(0);
        int[] widths = new int[t.header().size()];
        for (int c = 0; c < t.header().size(); c++) {
            String words = ColumnWords.of(t.header().get(c));
            Cell cell = head.createCell(c);
            cell.setCellValue(words);
            cell.setCellStyle(styles.header);
            widths[c] = words.length();
        }
        for (int r = 0; r < t.rows().size(); r++) {
            Row row = sheet.createRow(r + 1);
            List<String> cells = t.rows().get(r);
            for (int c = 0; c < cells.size(); c++) {
                String text = cells.get(c);
                if (text.isEmpty()) {
                    continue;
                }
                Cell cell = row.createCell(c);
                if (CsvTable.isDecimal(text) && Double.isFinite(Double.parseDouble(text))) {
                    cell.setCellValue(Double.parseDouble(text));
                    cell.setCellStyle(styles.number(text));
                } else {
                    cell.setCellValue(text);
                }
                widths[c] = Math.max(widths[c], text.length());
            }
        }
        for (int c = 0; c < widths.length; c++) {
            sheet.setColumnWidth(c, 256 * (Math.min(widths[c], MAX_COLUMN_CHARS) + 2));
        }
        sheet.createFreezePane(0, 1);
        if (!t.rows().isEmpty() && !t.header().isEmpty()) {
            sheet.setAutoFilter(new CellRangeAddress(0, t.rows().size(), 0, t.header().size() - 1));
        }
    }

    private static void notes(Sheet sheet, List<Table> tables, Styles styles) {
        int r = 0;
        for (Table t : tables) {
            r = heading(sheet, r, t.name(), styles);
            for (String c : t.comments()) {
                sheet.createRow(r++).createCell(0).setCellValue(c);
            }
            r++;
        }
        r = heading(sheet, r, "cautions", styles);
        for (String c : BuiltInData.cautions()) {
            sheet.createRow(r++).createCell(0).setCellValue(c);
        }
        r++;
        for (Table t : tables) {
            r = heading(sheet, r, "columns of " + t.name() + ": heading, and the column's name in the CSV file", styles);
            for (String h : t.header()) {
                Row row = sheet.createRow(r++);
                row.createCell(0).setCellValue(ColumnWords.of(h));
                row.createCell(1).setCellValue(h);
            }
            r++;
        }
        sheet.setColumnWidth(0, 256 * 90);
        sheet.setColumnWidth(1, 256 * 30);
    }

    private static int heading(Sheet sheet, int r, String text, Styles styles) {
        Cell cell = sheet.createRow(r).createCell(0);
        cell.setCellValue(text);
        cell.setCellStyle(styles.header);
        return r + 1;
    }

    /** The workbook's styles: the bold header, and one number format per way a number was written. */
    private static final class Styles {
        final XSSFWorkbook book;
        final CellStyle header;
        final Map<String, CellStyle> numbers = new HashMap<>();

        Styles(XSSFWorkbook book) {
            this.book = book;
            Font bold = book.createFont();
            bold.setBold(true);
            header = book.createCellStyle();
            header.setFont(bold);
            header.setWrapText(true);
        }

        /** @return the style showing a number with the decimals it was written with: {@code 0.00}, {@code 0.000E+00} */
        CellStyle number(String text) {
            String format = formatOf(text);
            return numbers.computeIfAbsent(format, f -> {
                CellStyle s = book.createCellStyle();
                s.setDataFormat(book.createDataFormat().getFormat(f));
                return s;
            });
        }

        static String formatOf(String text) {
            String t = text.toLowerCase(java.util.Locale.ROOT);
            int e = t.indexOf('e');
            String mantissa = e < 0 ? t : t.substring(0, e);
            int dot = mantissa.indexOf('.');
            int decimals = dot < 0 ? 0 : mantissa.length() - dot - 1;
            String base = decimals == 0 ? "0" : "0." + "0".repeat(decimals);
            return e < 0 ? base : base + "E+00";
        }
    }
}
