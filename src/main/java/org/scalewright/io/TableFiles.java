package org.scalewright.io;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/**
 * Writes a table of results to the file a user named, in the format its name ends with: {@code .xlsx} a
 * workbook ({@link XlsxTables}), anything else CSV in the dialect asked for ({@link CsvReportWriter});
 * {@code .ods} and {@code .xls} are refused, as formats the program does not write. Atomically, through
 * {@link AtomicFiles}.
 */
public final class TableFiles {
    private TableFiles() {
    }

    /** @return true when the file's name asks for a workbook ({@code .xlsx}) */
    public static boolean isWorkbook(Path file) {
        return extension(file).equals("xlsx");
    }

    /**
     * @return why a table cannot be written under this name, or null when it can
     */
    public static String refusal(Path file) {
        String ext = extension(file);
        if (ext.equals("ods") || ext.equals("xls")) {
            return "cannot write ." + ext + " files; name the file .xlsx (a workbook) or .csv";
        }
        return null;
    }

    /**
     * @param file       the file, its name ending {@code .xlsx} for a workbook
     * @param sheet      the workbook's sheet name for the table ({@code results})
     * @param dialect    the CSV dialect, where CSV is written
     * @param keepBackup keep a file replaced as {@code NAME.bak}
     * @throws OutputRefused when the file cannot be written there
     */
    public static void write(Path file, String sheet, List<String> comments, List<String> header,
                             List<List<String>> rows, CsvDialect dialect, boolean keepBackup) throws IOException {
        String refusal = refusal(file);
        if (refusal != null) {
            throw new IllegalArgumentException(refusal);
        }
        byte[] bytes = isWorkbook(file)
                ? XlsxTables.toBytes(List.of(new XlsxTables.Table(sheet, new CsvSheet(comments, header, rows))))
                : CsvReportWriter.toBytes(comments, header, rows, dialect);
        AtomicFiles.write(file, bytes, keepBackup);
    }

    private static String extension(Path file) {
        String name = String.valueOf(file.getFileName()).toLowerCase(Locale.ROOT);
        int dot = name.lastIndexOf('.');
        return dot < 0 ? "" : name.substring(dot + 1);
    }
}
