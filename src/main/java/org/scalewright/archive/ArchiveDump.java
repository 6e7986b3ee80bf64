package org.scalewright.archive;

import java.io.IOException;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.sql.Types;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.scalewright.io.AtomicFiles;
import org.scalewright.io.BadInputException;
import org.scalewright.io.DumpCsv;
import org.scalewright.model.BreakActivity;
import org.scalewright.model.BreakPlace;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.NumberText;

/**
 * The whole archive as a folder of CSV files, one per table ({@code instrument.csv},
 * {@code scale_version.csv}, {@code job.csv}, {@code string_break.csv}) and {@code archive.csv}
 * with the schema version; and back. Every column and row id is kept, so a dump loaded into a new
 * archive gives an equal archive. An empty cell of a number column is a missing value (NULL); text
 * columns are never NULL.
 */
public final class ArchiveDump {
    /** The file naming the dump's schema version. */
    public static final String META = "archive.csv";

    private ArchiveDump() {
    }

    /**
     * Writes the archive into {@code folder}, whole: the folder holds the old dump or the new one,
     * never a mixture (io.AtomicFiles).
     *
     * @param folder a new folder, or one holding only an earlier dump
     * @return the names of the files written, with their row counts
     */
    public static Map<String, Integer> dump(Archive archive, Path folder) throws IOException {
        Map<String, byte[]> files = new LinkedHashMap<>();
        Map<String, Integer> counts = new LinkedHashMap<>();
        files.put(META, DumpCsv.write(List.of("format", "schema_version"),
                List.of(List.of("scalewright archive dump", Integer.toString(Archive.schemaVersion())))));
        archive.read(c -> {
            for (String table : ArchiveSchema.TABLES) {
                List<String> header = columns(c, table).stream().map(Column::name).toList();
                List<List<String>> rows = rows(c, table);
                files.put(table + ".csv", DumpCsv.write(header, rows));
                counts.put(table + ".csv", rows.size());
            }
            return null;
        });
        AtomicFiles.writeFolder(folder, files);
        return counts;
    }

    /**
     * Loads a dump into an archive that holds nothing yet, in one transaction: all of it or, on the
     * first problem, nothing.
     *
     * @return the row counts loaded per table
     * @throws ArchiveRefused when the archive already holds instruments, the dump is of a newer schema,
     *                        or a file, column or cell is not what a dump holds (named with its line)
     */
    public static Map<String, Integer> load(Archive archive, Path folder) {
        Map<String, List<String[]>> files = new LinkedHashMap<>();
        try {
            List<String[]> meta = DumpCsv.read(folder.resolve(META));
            if (meta.size() < 2 || meta.get(1).length < 2 || !"scalewright archive dump".equals(meta.get(1)[0])) {
                throw new ArchiveRefused(folder.resolve(META) + " does not name a Scalewright archive dump");
            }
            int version = parseVersion(folder, meta.get(1)[1]);
            if (version != Archive.schemaVersion()) {
                throw new ArchiveRefused(folder + " is a dump of archive version " + version + "; this program "
                        + (version > Archive.schemaVersion() ? "knows up to" : "loads dumps of") + " version "
                        + Archive.schemaVersion() + (version > Archive.schemaVersion() ? ": load it with that newer "
                        + "version" : ""));
            }
            for (String table : ArchiveSchema.TABLES) {
                files.put(table, DumpCsv.read(folder.resolve(table + ".csv")));
            }
        } catch (BadInputException e) {
            throw new ArchiveRefused(e.getMessage());
        }
        return archive.transaction(c -> {
            if (ArchiveFile.intQuery(c, "SELECT count(*) FROM instrument") > 0) {
                throw new ArchiveRefused(archive.path() + " already holds instruments; load a dump only into a new "
                        + "archive (archive create --db NEW.db)");
            }
            Map<String, Integer> counts = new LinkedHashMap<>();
            for (String table : ArchiveSchema.TABLES) {
                counts.put(table + ".csv", insert(c, folder.resolve(table + ".csv"), table, files.get(table)));
            }
            return counts;
        });
    }

    private static int parseVersion(Path folder, String text) {
        try {
            return Integer.parseInt(text.strip());
        } catch (NumberFormatException e) {
            throw new ArchiveRefused(folder.resolve(META) + ": schema_version must be a whole number, was '" + text
                    + "'");
        }
    }

    private record Column(String name, String type, boolean notNull) {
    }

    private static List<Column> columns(Connection c, String table) throws SQLException {
        List<Column> out = new ArrayList<>();
        try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("PRAGMA table_info(" + table + ")")) {
            while (r.next()) {
                out.add(new Column(r.getString("name"), r.getString("type"), r.getInt("notnull") == 1));
            }
        }
        return out;
    }

    /**
     * @return every row of the table by id, each cell as text; a REAL as the shortest plain decimal that
     *         reads back exactly ({@link NumberText#exact}: {@code 1052}, {@code 0.0001})
     */
    static List<List<String>> rows(Connection c, String table) throws SQLException {
        List<List<String>> out = new ArrayList<>();
        try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("SELECT * FROM " + table
                + " ORDER BY id")) {
            int n = r.getMetaData().getColumnCount();
            while (r.next()) {
                List<String> row = new ArrayList<>(n);
                for (int i = 1; i <= n; i++) {
                    Object v = r.getObject(i);
                    row.add(v == null ? "" : v instanceof Double d ? NumberText.exact(d) : v.toString());
                }
                out.add(row);
            }
        }
        return out;
    }

    private static int insert(Connection c, Path file, String table, List<String[]> lines) throws SQLException {
        List<Column> cols = columns(c, table);
        List<String> header = List.of(lines.get(0));
        List<String> expected = cols.stream().map(Column::name).toList();
        if (!header.equals(expected)) {
            throw new ArchiveRefused(file + ": the columns must be " + String.join(", ", expected) + ", were "
                    + String.join(", ", header));
        }
        String sql = "INSERT INTO " + table + " (" + String.join(", ", expected) + ") VALUES ("
                + String.join(", ", expected.stream().map(x -> "?").toList()) + ")";
        try (PreparedStatement s = c.prepareStatement(sql)) {
            for (int line = 1; line < lines.size(); line++) {
                String[] cells = lines.get(line);
                if (cells.length != cols.size()) {
                    throw new ArchiveRefused(file + ": row " + line + " has " + cells.length + " cells, the header "
                            + cols.size());
                }
                for (int i = 0; i < cells.length; i++) {
                    bind(s, i + 1, cols.get(i), cells[i], file, line);
                }
                try {
                    s.executeUpdate();
                } catch (SQLException e) {
                    throw new ArchiveRefused(file + ": row " + line + " does not fit the archive: " + e.getMessage());
                }
            }
        }
        return lines.size() - 1;
    }

    private static void bind(PreparedStatement s, int index, Column col, String cell, Path file, int line)
            throws SQLException {
        String where = file + ": row " + line + ", column " + col.name() + ": ";
        try {
            switch (col.type()) {
                case "INTEGER" -> {
                    if (cell.isEmpty() && !col.notNull()) {
                        s.setNull(index, Types.INTEGER);
                    } else {
                        s.setLong(index, Long.parseLong(cell));
                    }
                }
                case "REAL" -> {
                    if (cell.isEmpty() && !col.notNull()) {
                        s.setNull(index, Types.REAL);
                    } else {
                        s.setDouble(index, Double.parseDouble(cell));
                    }
                }
                default -> {
                    checkText(col.name(), cell);
                    s.setString(index, cell);
                }
            }
        } catch (NumberFormatException | DateTimeParseException e) {
            throw new ArchiveRefused(where + "'" + cell + "' is not a " + (col.type().equals("TEXT") ? "date"
                    : "number"));
        } catch (InvalidInput e) {
            throw new ArchiveRefused(where + e.getMessage());
        }
    }

    /** The text columns the program reads back with a meaning: dates and the words of a break. */
    private static void checkText(String column, String cell) {
        switch (column) {
            case "date", "added" -> LocalDate.parse(cell);
            case "during" -> BreakActivity.of(cell);
            case "place" -> BreakPlace.of(cell);
            default -> {
            }
        }
    }
}
