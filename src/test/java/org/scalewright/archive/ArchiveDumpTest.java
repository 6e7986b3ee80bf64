package org.scalewright.archive;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.time.LocalDate;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.BreakActivity;
import org.scalewright.model.BreakPlace;
import org.scalewright.model.Scale;
import org.scalewright.model.StringBreak;

/** Dump → load gives an equal archive: every table, every row, every cell, compared on the raw database. */
class ArchiveDumpTest {
    @TempDir
    Path dir;

    /** Text that a CSV round trip could spoil: quotes, separators, line breaks, a carriage return, formulas. */
    private static final String AWKWARD = "\"Steinweg\", =SUM(A1) ; tab\there\nsecond line\r\nand 'quotes' \u0141\u00f3d\u017a";

    private Path filled() throws Exception {
        Path db = dir.resolve("full.db");
        Scale demo = ScaleSheetReader.standard().read(Path.of("demo-instruments/grand-190/grand-190.csv"));
        try (Archive a = Archive.create(db)) {
            a.addInstrument(new Instrument("grand-190", AWKWARD, "-190", "+44", "@owner", ""));
            a.addInstrument(Instrument.named("upright"));
            a.saveVersion("grand-190", demo, "as-measured", OptionalInt.empty(), LocalDate.of(2025, 5, 1));
            a.saveVersion("grand-190", demo.withTitle(AWKWARD), AWKWARD.substring(0, 30), OptionalInt.of(1),
                    LocalDate.of(2025, 6, 1));
            a.logJob("grand-190", new Job(LocalDate.of(2025, 6, 2), "pitch raise", AWKWARD, OptionalDouble.of(442.5),
                    "ASTM A228 minimum", OptionalInt.of(1)));
            a.logJob("upright", new Job(LocalDate.of(2025, 6, 3), "tuning", "", OptionalDouble.empty(), "",
                    OptionalInt.empty()));
            a.logBreak("grand-190", new StringBreak(LocalDate.of(2025, 6, 2), 66, OptionalInt.of(2),
                    OptionalDouble.of(1178.123456789), BreakActivity.PITCH_RAISE, BreakPlace.FRONT_BEARING, "coil 7",
                    AWKWARD), OptionalInt.empty());
            a.logBreak("upright", new StringBreak(LocalDate.of(2025, 7, 1), 30, OptionalInt.empty(),
                    OptionalDouble.empty(), BreakActivity.UNKNOWN, BreakPlace.UNKNOWN, "", ""), OptionalInt.empty());
        }
        return db;
    }

    @Test
    void dumpThenLoadGivesAnEqualArchive() throws Exception {
        Path db = filled();
        Path dump = dir.resolve("dump");
        try (Archive a = Archive.open(db)) {
            Map<String, Integer> counts = ArchiveDump.dump(a, dump);
            assertEquals(Map.of("instrument.csv", 2, "scale_version.csv", 2, "job.csv", 2, "string_break.csv", 2),
                    counts);
        }
        Path copy = dir.resolve("copy.db");
        try (Archive b = Archive.create(copy)) {
            ArchiveDump.load(b, dump);
        }
        assertEquals(tables(db), tables(copy));
        // and once more: the dump of the copy is byte for byte the dump of the original
        Path again = dir.resolve("again");
        try (Archive b = Archive.open(copy)) {
            ArchiveDump.dump(b, again);
        }
        for (String f : List.of("archive.csv", "instrument.csv", "scale_version.csv", "job.csv", "string_break.csv")) {
            assertEquals(Files.readString(dump.resolve(f)), Files.readString(again.resolve(f)), f);
        }
    }

    @Test
    void aDumpOfANewerSchemaOrABadCellIsRefusedAndNothingLoaded() throws Exception {
        Path db = filled();
        Path dump = dir.resolve("dump");
        try (Archive a = Archive.open(db)) {
            ArchiveDump.dump(a, dump);
        }
        Path bad = dir.resolve("bad");
        Files.createDirectories(bad);
        for (String f : List.of("archive.csv", "instrument.csv", "scale_version.csv", "job.csv", "string_break.csv")) {
            Files.copy(dump.resolve(f), bad.resolve(f));
        }
        String breaks = Files.readString(bad.resolve("string_break.csv"), StandardCharsets.UTF_8);
        Files.writeString(bad.resolve("string_break.csv"), breaks.replace("\"pitch-raise\"", "\"dancing\""));
        Path target = dir.resolve("target.db");
        try (Archive b = Archive.create(target)) {
            ArchiveRefused e = assertThrows(ArchiveRefused.class, () -> ArchiveDump.load(b, bad));
            assertTrue(e.getMessage().contains("string_break.csv: row 1, column during"), e.getMessage());
            assertEquals(List.of(), b.instruments(), "nothing loaded");
            Files.writeString(bad.resolve("archive.csv"), "\"format\",\"schema_version\"\n"
                    + "\"scalewright archive dump\",\"" + (Archive.schemaVersion() + 1) + "\"\n");
            ArchiveRefused newer = assertThrows(ArchiveRefused.class, () -> ArchiveDump.load(b, bad));
            assertTrue(newer.getMessage().contains("knows up to version " + Archive.schemaVersion()),
                    newer.getMessage());
        }
    }

    @Test
    void realCellsAreWrittenAsPlainDecimalsAndLoadBackBitForBit() throws Exception {
        Path db = dir.resolve("reals.db");
        // the double just above 440: 440 + 2^-44 = 440.0000000000000568…, IEEE 754 binary64 (52-bit fraction), hand-worked
        double noisy = Math.nextUp(440.0);
        try (Archive a = Archive.create(db)) {
            a.addInstrument(Instrument.named("grand"));
            a.logJob("grand", new Job(LocalDate.of(2025, 6, 2), "tuning", "", OptionalDouble.of(noisy), "",
                    OptionalInt.empty()));
            a.logBreak("grand", new StringBreak(LocalDate.of(2025, 6, 2), 66, OptionalInt.empty(),
                    OptionalDouble.of(1052.0), BreakActivity.TUNING, BreakPlace.UNKNOWN, "", ""), OptionalInt.empty());
        }
        Path dump = dir.resolve("reals");
        try (Archive a = Archive.open(db)) {
            ArchiveDump.dump(a, dump);
        }
        String jobs = Files.readString(dump.resolve("job.csv"), StandardCharsets.UTF_8);
        String breaks = Files.readString(dump.resolve("string_break.csv"), StandardCharsets.UTF_8);
        assertTrue(jobs.contains("\"440.00000000000006\""), jobs);
        assertTrue(breaks.contains("\"1052\""), breaks);
        assertTrue(!breaks.contains("1052.0") && !jobs.contains("E"), breaks + jobs);
        Path copy = dir.resolve("reals-copy.db");
        try (Archive b = Archive.create(copy)) {
            ArchiveDump.load(b, dump);
        }
        assertEquals(tables(db), tables(copy));
    }

    /** @return every row of every table, as the database holds it (type and value), by id */
    private static Map<String, List<List<Object>>> tables(Path db) throws Exception {
        Map<String, List<List<Object>>> out = new LinkedHashMap<>();
        try (Connection c = ArchiveFileTest.raw(db)) {
            for (String table : ArchiveSchema.TABLES) {
                List<List<Object>> rows = new java.util.ArrayList<>();
                try (var s = c.createStatement(); var r = s.executeQuery("SELECT * FROM " + table + " ORDER BY id")) {
                    int n = r.getMetaData().getColumnCount();
                    while (r.next()) {
                        List<Object> row = new java.util.ArrayList<>();
                        for (int i = 1; i <= n; i++) {
                            Object v = r.getObject(i);
                            row.add(v == null ? "NULL" : v.getClass().getSimpleName() + ":" + v);
                        }
                        rows.add(row);
                    }
                }
                out.put(table, rows);
            }
        }
        return out;
    }
}
