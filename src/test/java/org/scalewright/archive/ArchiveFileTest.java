package org.scalewright.archive;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.LocalDate;
import java.util.List;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.model.BreakActivity;
import org.scalewright.model.BreakPlace;
import org.scalewright.model.StringBreak;

/** The archive file on a real SQLite database: built, reopened, and what it refuses without touching. */
class ArchiveFileTest {
    @TempDir
    Path dir;

    @Test
    void aNewArchiveIsBuiltAtTheLatestVersionAndReopens() throws SQLException {
        Path db = dir.resolve("a.db");
        try (Archive a = Archive.create(db)) {
            a.addInstrument(new Instrument("upright", "maker", "model", "123", "owner", "hall"));
        }
        try (Connection c = raw(db); Statement s = c.createStatement()) {
            assertEquals(Archive.schemaVersion(), s.executeQuery("PRAGMA user_version").getInt(1));
            assertEquals(ArchiveSchema.APPLICATION_ID, s.executeQuery("PRAGMA application_id").getInt(1));
            assertEquals("delete", s.executeQuery("PRAGMA journal_mode").getString(1));
        }
        try (Archive a = Archive.open(db)) {
            assertEquals(List.of(new Instrument("upright", "maker", "model", "123", "owner", "hall")), a.instruments());
            assertEquals(List.of("ok"), a.integrityCheck());
        }
    }

    @Test
    void aFileWrittenByANewerVersionIsRefusedAndNeverModified() throws Exception {
        Path db = dir.resolve("newer.db");
        try (Archive a = Archive.create(db)) {
            a.addInstrument(Instrument.named("grand"));
        }
        try (Connection c = raw(db); Statement s = c.createStatement()) {
            s.execute("PRAGMA user_version = " + (Archive.schemaVersion() + 1));
            s.execute("CREATE TABLE tuning_visit (id INTEGER PRIMARY KEY)");
        }
        byte[] before = Files.readAllBytes(db);
        ArchiveRefused e = assertThrows(ArchiveRefused.class, () -> Archive.open(db));
        assertTrue(e.getMessage().contains("was written by a newer Scalewright (archive version "
                + (Archive.schemaVersion() + 1) + "; this program knows up to version " + Archive.schemaVersion()),
                e.getMessage());
        assertTrue(e.getMessage().contains("left as it is"), e.getMessage());
        assertThrows(ArchiveRefused.class, () -> Archive.openOrCreate(db));
        assertArrayEquals(before, Files.readAllBytes(db));
        assertTrue(Files.notExists(db.resolveSibling("newer.db-journal")));
    }

    @Test
    void aFileThatIsNotADatabaseIsRefusedAndNeverReplaced() throws IOException {
        Path db = dir.resolve("sheet.db");
        Files.writeString(db, "key,strings,length_mm,wire\n1,3,600,15\n");
        byte[] before = Files.readAllBytes(db);
        ArchiveRefused e = assertThrows(ArchiveRefused.class, () -> Archive.open(db));
        assertTrue(e.getMessage().contains("not a Scalewright archive (not an SQLite database)"), e.getMessage());
        assertThrows(ArchiveRefused.class, () -> Archive.openOrCreate(db));
        assertThrows(ArchiveRefused.class, () -> Archive.create(db));
        assertArrayEquals(before, Files.readAllBytes(db));
    }

    @Test
    void aDamagedArchiveIsRefusedAndLeftForRepair() throws IOException {
        Path db = dir.resolve("damaged.db");
        try (Archive a = Archive.create(db)) {
            for (int i = 0; i < 200; i++) {
                a.addInstrument(new Instrument("piano " + i, "maker " + i, "", "", "", ""));
            }
        }
        byte[] bytes = Files.readAllBytes(db);
        // overwrite the second page onwards with noise, keeping the valid header of page 1
        for (int i = 4096; i < bytes.length; i++) {
            bytes[i] = (byte) (i * 31 + 7);
        }
        Files.write(db, bytes);
        ArchiveRefused e = assertThrows(ArchiveRefused.class, () -> Archive.open(db));
        assertTrue(e.getMessage().contains("damaged") || e.getMessage().contains("not a Scalewright archive"),
                e.getMessage());
        assertArrayEquals(bytes, Files.readAllBytes(db));
    }

    @Test
    void anSqliteDatabaseOfAnotherProgramIsRefused() throws Exception {
        Path db = dir.resolve("other.db");
        try (Connection c = raw(db); Statement s = c.createStatement()) {
            s.execute("CREATE TABLE customers (id INTEGER PRIMARY KEY, name TEXT)");
        }
        byte[] before = Files.readAllBytes(db);
        ArchiveRefused e = assertThrows(ArchiveRefused.class, () -> Archive.open(db));
        assertTrue(e.getMessage().contains("an SQLite database but not a Scalewright archive"), e.getMessage());
        assertArrayEquals(before, Files.readAllBytes(db));
    }

    @Test
    void aRefusedChangeWritesNothing() throws IOException {
        Path db = dir.resolve("a.db");
        try (Archive a = Archive.create(db)) {
            a.addInstrument(Instrument.named("grand"));
        }
        byte[] before = Files.readAllBytes(db);
        try (Archive a = Archive.open(db)) {
            assertThrows(ArchiveRefused.class, () -> a.addInstrument(Instrument.named("grand")));
            assertThrows(ArchiveRefused.class, () -> a.logBreak("upright", breakOn(40), OptionalInt.empty()));
            assertThrows(ArchiveRefused.class, () -> a.logBreak("grand", breakOn(40), OptionalInt.of(1)));
        }
        assertArrayEquals(before, Files.readAllBytes(db));
    }

    @Test
    void aBreakIsJudgedOnTheLatestVersionDescribingTheStringsNotOnAPlan() throws Exception {
        Path db = dir.resolve("a.db");
        var sheet = org.scalewright.io.ScaleSheetReader.standard().read(Path.of("s.csv"),
                ArchiveKillWriter.sheet().getBytes(java.nio.charset.StandardCharsets.UTF_8));
        try (Archive a = Archive.create(db)) {
            a.addInstrument(Instrument.named("grand"));
            ArchivedBreak none = a.logBreak("grand", breakOn(2), OptionalInt.empty());
            assertTrue(none.version().isEmpty(), "no version yet");
            a.saveVersion("grand", sheet, "as-measured", OptionalInt.empty(), LocalDate.of(2026, 1, 2));
            a.saveVersion("grand", sheet, "Planned", OptionalInt.of(1), LocalDate.of(2026, 1, 3));
            assertEquals("planned", a.version("grand", 2).label());
            assertEquals(OptionalInt.of(1), a.logBreak("grand", breakOn(2), OptionalInt.empty()).version());
            a.saveVersion("grand", sheet, "as strung", OptionalInt.of(2), LocalDate.of(2026, 2, 1));
            assertEquals(OptionalInt.of(3), a.logBreak("grand", breakOn(2), OptionalInt.empty()).version());
            ArchiveRefused outside = assertThrows(ArchiveRefused.class,
                    () -> a.logBreak("grand", breakOn(40), OptionalInt.empty()));
            assertTrue(outside.getMessage().contains("key 40 is outside the scale of 'grand' version 3 (it has keys "
                    + "1-3)"), outside.getMessage());
            assertEquals(3, a.breaks("grand").size());
        }
    }

    static StringBreak breakOn(int key) {
        return new StringBreak(LocalDate.of(2026, 3, 1), key, OptionalInt.empty(), OptionalDouble.of(500),
                BreakActivity.PITCH_RAISE, BreakPlace.UNKNOWN, "", "");
    }

    static Connection raw(Path db) throws SQLException {
        return DriverManager.getConnection("jdbc:sqlite:" + db);
    }
}
