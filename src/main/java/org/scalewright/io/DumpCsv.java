package org.scalewright.io;

import com.opencsv.CSVReader;
import com.opencsv.CSVReaderBuilder;
import com.opencsv.RFC4180ParserBuilder;
import com.opencsv.exceptions.CsvException;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.StringWriter;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The CSV of an archive dump: UTF-8, RFC 4180 (every cell quoted, quotes doubled, line breaks kept
 * inside cells), one header row. Cells are written and read back exactly as they are: unlike the
 * results CSVs, text is not made spreadsheet-safe, because a dump is a backup to be loaded again,
 * not a sheet to be opened in a spreadsheet.
 */
public final class DumpCsv {
    /** The largest dump file read, bytes (256 MiB; an archive of a thousand scale versions is about 10 MiB). */
    public static final long MAX_FILE_BYTES = 256L * 1024 * 1024;

    private DumpCsv() {
    }

    /** @return the table as CSV bytes: the header, then one line per row */
    public static byte[] write(List<String> header, List<List<String>> rows) {
        StringWriter out = new StringWriter();
        CsvReportWriter.writeTable(out, ',', true, header, rows);
        return out.toString().getBytes(StandardCharsets.UTF_8);
    }

    /**
     * @return the rows of a dump file, the header first
     * @throws BadInputException when the file is missing, too large, not UTF-8 or not CSV
     */
    public static List<String[]> read(Path file) throws BadInputException {
        try {
            if (!Files.isRegularFile(file)) {
                throw BadInputException.of(file, "the dump has no file " + file.getFileName());
            }
            if (Files.size(file) > MAX_FILE_BYTES) {
                throw BadInputException.of(file, "file is larger than " + MAX_FILE_BYTES / (1024 * 1024)
                        + " MiB; not a dump of this program");
            }
            Reader in = new InputStreamReader(Files.newInputStream(file), StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT));
            try (CSVReader csv = new CSVReaderBuilder(in).withCSVParser(new RFC4180ParserBuilder().build())
                    .withKeepCarriageReturn(true).build()) {
                List<String[]> rows = new ArrayList<>(csv.readAll());
                if (rows.isEmpty()) {
                    throw BadInputException.of(file, "the file is empty; a dump file starts with its header");
                }
                return rows;
            }
        } catch (CsvException e) {
            throw BadInputException.of(file, "line " + e.getLineNumber() + ": not CSV: " + e.getMessage());
        } catch (java.nio.charset.CharacterCodingException e) {
            throw BadInputException.of(file, "not UTF-8 text; a dump is written in UTF-8");
        } catch (IOException e) {
            throw BadInputException.of(file, "cannot read: " + e.getMessage());
        }
    }
}
