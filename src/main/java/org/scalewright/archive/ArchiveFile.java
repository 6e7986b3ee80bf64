package org.scalewright.archive;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Arrays;
import java.util.List;
import org.sqlite.SQLiteConfig;

/**
 * One open archive file: the connection, the checks made before anything is written, the
 * migrations and the transactions.
 *
 * <p>Safety: the database keeps a rollback journal and syncs it fully ({@code synchronous=FULL}):
 * a transaction is on disk when its commit returns, and a process killed in the middle of one
 * leaves the journal from which the next opening restores the state before it. A file that is not
 * an SQLite database, an SQLite database of another program, a damaged archive or one written by a
 * newer version is refused before anything is written to it.
 */
final class ArchiveFile implements AutoCloseable {
    /** The first 16 bytes of every SQLite 3 database file (SQLite file format, section 1.3). */
    private static final byte[] SQLITE_HEADER = "SQLite format 3\0".getBytes(StandardCharsets.US_ASCII);
    /** How long to wait for another program holding the archive (the window and a command at once), ms. */
    private static final int BUSY_TIMEOUT_MS = 10_000;

    /** A unit of work in one transaction. */
    interface Work<T> {
        T run(Connection c) throws SQLException;
    }

    private final Path file;
    private final Connection connection;

    private ArchiveFile(Path file, Connection connection) {
        this.file = file;
        this.connection = connection;
    }

    /**
     * Opens an archive, building or migrating its tables where needed.
     *
     * @param file     the database file
     * @param mayBuild true to accept a missing or empty file and build a new archive in it
     * @throws ArchiveRefused when the file is missing (and may not be built), is not an archive, is
     *                        damaged or was written by a newer version; the file is left as it was
     */
    static ArchiveFile open(Path file, boolean mayBuild) {
        boolean fresh = checkBeforeOpening(file, mayBuild);
        Connection c = connect(file);
        try {
            if (!fresh) {
                checkContents(file, c);
            }
            migrate(c);
            return new ArchiveFile(file, c);
        } catch (RuntimeException | SQLException e) {
            closeQuietly(c);
            if (e instanceof ArchiveRefused r) {
                throw r;
            }
            throw refusedOrFailed(file, e);
        }
    }

    /** @return true when the file is missing or empty (a new archive will be built) */
    private static boolean checkBeforeOpening(Path file, boolean mayBuild) {
        if (Files.isDirectory(file)) {
            throw new ArchiveRefused(file + " is a folder, not an archive file");
        }
        if (!Files.exists(file, LinkOption.NOFOLLOW_LINKS)) {
            if (!mayBuild) {
                throw new ArchiveRefused("no archive at " + file + " (create one with 'archive create')");
            }
            Path parent = file.toAbsolutePath().getParent();
            if (parent != null && !Files.isDirectory(parent)) {
                throw new ArchiveRefused("cannot create " + file + ": the folder " + parent + " does not exist");
            }
            return true;
        }
        if (!Files.isRegularFile(file)) {
            throw new ArchiveRefused(file + " is not a regular file (a pipe or device), not an archive");
        }
        byte[] head = new byte[SQLITE_HEADER.length];
        int n;
        try (InputStream in = Files.newInputStream(file)) {
            n = in.readNBytes(head, 0, head.length);
        } catch (IOException e) {
            throw new ArchiveRefused("cannot read " + file + ": " + e.getMessage());
        }
        if (n == 0) {
            if (!mayBuild) {
                throw new ArchiveRefused(file + " is empty, not an archive (create one with 'archive create')");
            }
            return true;
        }
        if (n < head.length || !Arrays.equals(head, SQLITE_HEADER)) {
            throw new ArchiveRefused(file + " is not a Scalewright archive (not an SQLite database); it was left "
                    + "as it is");
        }
        return false;
    }

    private static Connection connect(Path file) {
        SQLiteConfig config = new SQLiteConfig();
        config.setSynchronous(SQLiteConfig.SynchronousMode.FULL);
        config.enforceForeignKeys(true);
        config.setBusyTimeout(BUSY_TIMEOUT_MS);
        try {
            // transactions are begun and ended here (BEGIN IMMEDIATE … COMMIT), never left open between
            // changes: the driver's own mode would begin the next one at once and hold its lock
            Connection c = DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath(), config.toProperties());
            c.setAutoCommit(true);
            return c;
        } catch (SQLException e) {
            throw refusedOrFailed(file, e);
        }
    }

    /** Refuses an SQLite file of another program, a newer version and a damaged archive, before any write. */
    private static void checkContents(Path file, Connection c) throws SQLException {
        exec(c, "BEGIN");
        try {
            int app = intPragma(c, "application_id");
            int version = intPragma(c, "user_version");
            int tables = intQuery(c, "SELECT count(*) FROM sqlite_master");
            if (app != ArchiveSchema.APPLICATION_ID && !(app == 0 && version == 0 && tables == 0)) {
                throw new ArchiveRefused(file + " is an SQLite database but not a Scalewright archive; it was left "
                        + "as it is");
            }
            if (version > ArchiveSchema.latest()) {
                throw new ArchiveRefused(file + " was written by a newer Scalewright (archive version " + version
                        + "; this program knows up to version " + ArchiveSchema.latest() + "): open it with that "
                        + "newer version. The file was left as it is.");
            }
            List<String> problems = textQuery(c, "PRAGMA quick_check");
            if (!problems.equals(List.of("ok"))) {
                throw new ArchiveRefused(file + " is damaged (" + String.join("; ", problems.subList(0,
                        Math.min(3, problems.size()))) + "); it was left as it is: restore it from a backup or a dump");
            }
        } finally {
            exec(c, "ROLLBACK");
        }
    }

    private static void exec(Connection c, String sql) throws SQLException {
        try (Statement s = c.createStatement()) {
            s.execute(sql);
        }
    }

    private static void migrate(Connection c) throws SQLException {
        int version = intPragma(c, "user_version");
        for (int v = version + 1; v <= ArchiveSchema.latest(); v++) {
            exec(c, "BEGIN IMMEDIATE");
            try (Statement s = c.createStatement()) {
                for (String sql : ArchiveSchema.MIGRATIONS.get(v - 1)) {
                    s.execute(sql);
                }
                s.execute("PRAGMA user_version = " + v);
                exec(c, "COMMIT");
            } catch (SQLException e) {
                exec(c, "ROLLBACK");
                throw e;
            }
        }
    }

    /**
     * Runs {@code work} in one transaction: committed (and on disk) when it returns, rolled back
     * entirely when it throws.
     */
    <T> T transaction(Work<T> work) {
        return inTransaction("BEGIN IMMEDIATE", work);
    }

    /** Runs {@code work}, which only reads, in one read transaction: it sees one state of the archive. */
    <T> T read(Work<T> work) {
        return inTransaction("BEGIN", work);
    }

    private <T> T inTransaction(String begin, Work<T> work) {
        try {
            exec(connection, begin);
        } catch (SQLException e) {
            throw refusedOrFailed(file, e);
        }
        try {
            T result = work.run(connection);
            exec(connection, "COMMIT");
            return result;
        } catch (SQLException e) {
            rollbackQuietly();
            throw refusedOrFailed(file, e);
        } catch (RuntimeException e) {
            rollbackQuietly();
            throw e;
        }
    }

    Path file() {
        return file;
    }

    /** @return the result of {@code PRAGMA integrity_check}: {@code [ok]} for a sound file */
    List<String> integrityCheck() {
        return read(c -> textQuery(c, "PRAGMA integrity_check"));
    }

    static int intPragma(Connection c, String name) throws SQLException {
        return intQuery(c, "PRAGMA " + name);
    }

    static int intQuery(Connection c, String sql) throws SQLException {
        try (Statement s = c.createStatement(); ResultSet r = s.executeQuery(sql)) {
            return r.next() ? r.getInt(1) : 0;
        }
    }

    private static List<String> textQuery(Connection c, String sql) throws SQLException {
        try (Statement s = c.createStatement(); ResultSet r = s.executeQuery(sql)) {
            List<String> out = new java.util.ArrayList<>();
            while (r.next()) {
                out.add(r.getString(1));
            }
            return out;
        }
    }

    /** SQLite's "not a database" and "corrupt" codes are the user's file; anything else is a failure. */
    private static RuntimeException refusedOrFailed(Path file, Exception e) {
        String m = String.valueOf(e.getMessage());
        if (m.contains("SQLITE_NOTADB") || m.contains("not a database")) {
            return new ArchiveRefused(file + " is not a Scalewright archive (not an SQLite database); it was left "
                    + "as it is");
        }
        if (m.contains("SQLITE_CORRUPT") || m.contains("malformed")) {
            return new ArchiveRefused(file + " is damaged (" + m + "); restore it from a backup or a dump");
        }
        if (m.contains("SQLITE_READONLY") || m.contains("readonly")) {
            return new ArchiveRefused("cannot write " + file + ": the file or its folder is read-only");
        }
        if (m.contains("SQLITE_BUSY") || m.contains("locked")) {
            return new ArchiveRefused(file + " is busy: another program is writing to it; try again");
        }
        return new ArchiveFailure("archive " + file + ": " + m, e);
    }

    private void rollbackQuietly() {
        try {
            exec(connection, "ROLLBACK");
        } catch (SQLException ignored) {
            // the connection is failing already; the first error is the one reported
        }
    }

    private static void closeQuietly(Connection c) {
        try {
            c.close();
        } catch (SQLException ignored) {
            // closing after a refusal: the refusal is what is reported
        }
    }

    @Override
    public void close() {
        try {
            connection.close();
        } catch (SQLException e) {
            throw new ArchiveFailure("closing " + file + ": " + e.getMessage(), e);
        }
    }
}
