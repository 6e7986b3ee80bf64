package org.scalewright.archive;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.scalewright.io.BadInputException;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.io.ScaleSheetWriter;
import org.scalewright.model.BreakActivity;
import org.scalewright.model.BreakPlace;
import org.scalewright.model.Scale;
import org.scalewright.model.StringBreak;

/**
 * The workshop archive: every instrument, its scale versions, its jobs and its broken strings, in
 * one SQLite file. Every change is one transaction, on disk when the method returns; a change that
 * is refused writes nothing.
 */
public final class Archive implements AutoCloseable {
    private final ArchiveFile file;

    private Archive(ArchiveFile file) {
        this.file = file;
    }

    /**
     * Creates a new archive.
     *
     * @param path a file that does not exist yet (or is empty), in an existing folder
     * @throws ArchiveRefused when the file exists and holds anything
     */
    public static Archive create(Path path) {
        if (Files.exists(path) && !isEmptyFile(path)) {
            throw new ArchiveRefused(path + " already exists; an archive is created only in a new file");
        }
        return new Archive(ArchiveFile.open(path, true));
    }

    /**
     * Opens an existing archive, migrating its tables to this version where they are older.
     *
     * @throws ArchiveRefused when there is no archive, or the file is not one, is damaged or was
     *                        written by a newer version (left as it was)
     */
    public static Archive open(Path path) {
        return new Archive(ArchiveFile.open(path, false));
    }

    /** Opens the archive at {@code path}, creating it when the file does not exist yet. */
    public static Archive openOrCreate(Path path) {
        return new Archive(ArchiveFile.open(path, true));
    }

    private static boolean isEmptyFile(Path p) {
        try {
            return Files.isRegularFile(p) && Files.size(p) == 0;
        } catch (java.io.IOException e) {
            return false;
        }
    }

    /** @return the archive's file */
    public Path path() {
        return file.file();
    }

    /** @return the schema version this program writes */
    public static int schemaVersion() {
        return ArchiveSchema.latest();
    }

    // ---- instruments

    /**
     * @throws ArchiveRefused when an instrument of that name is already in the archive
     */
    public void addInstrument(Instrument i) {
        file.transaction(c -> {
            if (idOf(c, i.name()) != 0) {
                throw new ArchiveRefused("the archive already has an instrument named '" + i.name() + "'");
            }
            try (PreparedStatement s = c.prepareStatement("INSERT INTO instrument (name, maker, model, serial, owner, "
                    + "location, added) VALUES (?, ?, ?, ?, ?, ?, ?)")) {
                bind(s, i.name(), i.maker(), i.model(), i.serial(), i.owner(), i.location(),
                        LocalDate.now().toString());
                s.executeUpdate();
            }
            return null;
        });
    }

    /** @return every instrument, by name */
    public List<Instrument> instruments() {
        return file.read(c -> {
            List<Instrument> out = new ArrayList<>();
            try (PreparedStatement s = c.prepareStatement("SELECT name, maker, model, serial, owner, location FROM "
                    + "instrument ORDER BY name COLLATE NOCASE"); ResultSet r = s.executeQuery()) {
                while (r.next()) {
                    out.add(new Instrument(r.getString(1), r.getString(2), r.getString(3), r.getString(4),
                            r.getString(5), r.getString(6)));
                }
            }
            return out;
        });
    }

    /** @throws ArchiveRefused naming the instruments there are when {@code name} is not one of them */
    public Instrument instrument(String name) {
        return instruments().stream().filter(i -> i.name().equals(name)).findFirst()
                .orElseThrow(() -> unknown(name));
    }

    // ---- scale versions

    /**
     * Saves a scale as the instrument's next version.
     *
     * @param name        the instrument
     * @param scale       the scale, written as a sheet (DESIGN §4) with its own units and comments
     * @param label       {@link VersionLabel#of} a typed label
     * @param derivedFrom the number of the version it came from, if any (must exist)
     * @param date        the day of the version
     * @return the version saved, with its number
     * @throws ArchiveRefused for an unknown instrument or an unknown {@code derivedFrom}
     */
    public ScaleVersion saveVersion(String name, Scale scale, String label, OptionalInt derivedFrom, LocalDate date) {
        String sheet = ScaleSheetWriter.toText(scale);
        String cleanLabel = VersionLabel.of(label);
        return file.transaction(c -> {
            long id = requireId(c, name);
            int next = 1 + ArchiveFile.intQuery(c, "SELECT coalesce(max(number), 0) FROM scale_version WHERE "
                    + "instrument_id = " + id);
            if (derivedFrom.isPresent() && (derivedFrom.getAsInt() < 1 || derivedFrom.getAsInt() >= next)) {
                throw new ArchiveRefused("'" + name + "' has no version " + derivedFrom.getAsInt() + " to derive from"
                        + (next == 1 ? " (it has no versions yet)" : " (it has versions 1-" + (next - 1) + ")"));
            }
            try (PreparedStatement s = c.prepareStatement("INSERT INTO scale_version (instrument_id, number, date, "
                    + "label, derived_from, sheet) VALUES (?, ?, ?, ?, ?, ?)")) {
                bind(s, id, next, date.toString(), cleanLabel, derivedFrom.isPresent() ? derivedFrom.getAsInt() : null,
                        sheet);
                s.executeUpdate();
            }
            return new ScaleVersion(next, date, cleanLabel, derivedFrom, sheet);
        });
    }

    /** @return the instrument's versions, oldest first */
    public List<ScaleVersion> versions(String name) {
        return file.read(c -> {
            long id = requireId(c, name);
            List<ScaleVersion> out = new ArrayList<>();
            try (PreparedStatement s = c.prepareStatement("SELECT number, date, label, derived_from, sheet FROM "
                    + "scale_version WHERE instrument_id = ? ORDER BY number")) {
                s.setLong(1, id);
                try (ResultSet r = s.executeQuery()) {
                    while (r.next()) {
                        out.add(new ScaleVersion(r.getInt(1), LocalDate.parse(r.getString(2)), r.getString(3),
                                optInt(r, 4), r.getString(5)));
                    }
                }
            }
            return out;
        });
    }

    /** @throws ArchiveRefused when the instrument has no version of that number */
    public ScaleVersion version(String name, int number) {
        List<ScaleVersion> all = versions(name);
        return all.stream().filter(v -> v.number() == number).findFirst()
                .orElseThrow(() -> new ArchiveRefused("'" + name + "' has no version " + number
                        + (all.isEmpty() ? " (it has no versions yet)" : " (it has versions 1-" + all.size() + ")")));
    }

    /**
     * @return the version's sheet read as a scale
     * @throws ArchiveRefused when the stored sheet no longer reads (written by a program that read it differently)
     */
    public Scale scaleOf(String name, ScaleVersion v) {
        Path label = Path.of(name + " version " + v.number());
        try {
            return ScaleSheetReader.standard().read(label, v.sheet().getBytes(StandardCharsets.UTF_8));
        } catch (BadInputException e) {
            throw new ArchiveRefused(e.getMessage());
        }
    }

    /**
     * @return the version a break is judged on by default: the latest that describes the strings on
     *         the instrument (as measured, as strung or a free label — not a plan), else none
     */
    public OptionalInt strungVersion(String name) {
        List<ScaleVersion> all = versions(name);
        for (int i = all.size() - 1; i >= 0; i--) {
            if (VersionLabel.describesTheStrings(all.get(i).label())) {
                return OptionalInt.of(all.get(i).number());
            }
        }
        return OptionalInt.empty();
    }

    // ---- jobs

    /** Records a job. @throws ArchiveRefused for an unknown instrument or version */
    public void logJob(String name, Job job) {
        if (job.version().isPresent()) {
            version(name, job.version().getAsInt());
        }
        file.transaction(c -> {
            long id = requireId(c, name);
            try (PreparedStatement s = c.prepareStatement("INSERT INTO job (instrument_id, date, kind, notes, a4_hz, "
                    + "strength_table, version_number) VALUES (?, ?, ?, ?, ?, ?, ?)")) {
                bind(s, id, job.date().toString(), job.kind(), job.notes(),
                        job.a4().isPresent() ? job.a4().getAsDouble() : null, job.strengthTable(),
                        job.version().isPresent() ? job.version().getAsInt() : null);
                s.executeUpdate();
            }
            return null;
        });
    }

    /** @return the instrument's jobs, by date */
    public List<Job> jobs(String name) {
        return file.read(c -> {
            long id = requireId(c, name);
            List<Job> out = new ArrayList<>();
            try (PreparedStatement s = c.prepareStatement("SELECT date, kind, notes, a4_hz, strength_table, "
                    + "version_number FROM job WHERE instrument_id = ? ORDER BY date, id")) {
                s.setLong(1, id);
                try (ResultSet r = s.executeQuery()) {
                    while (r.next()) {
                        double a4 = r.getDouble(4);
                        OptionalDouble a = r.wasNull() ? OptionalDouble.empty() : OptionalDouble.of(a4);
                        out.add(new Job(LocalDate.parse(r.getString(1)), r.getString(2), r.getString(3), a,
                                r.getString(5), optInt(r, 6)));
                    }
                }
            }
            return out;
        });
    }

    // ---- breaks

    /**
     * Records a broken string, judged on a scale version: the one given, else the latest version
     * that describes the strings ({@link #strungVersion}).
     *
     * @param version the version the string was strung to, or empty for the default
     * @return the break as kept, with its id and the version it is judged on (empty when the
     *         instrument has no version describing its strings)
     * @throws ArchiveRefused for an unknown instrument or version, or a key the version's sheet has no note for
     */
    public ArchivedBreak logBreak(String name, StringBreak b, OptionalInt version) {
        OptionalInt judged = version.isPresent() ? version : strungVersion(name);
        if (judged.isPresent()) {
            ScaleVersion v = version(name, judged.getAsInt());
            Scale scale = scaleOf(name, v);
            if (scale.note(b.key()).isEmpty()) {
                throw new ArchiveRefused("key " + b.key() + " is outside the scale of '" + name + "' version "
                        + v.number() + " (it has keys " + scale.notes().get(0).key() + "-"
                        + scale.notes().get(scale.notes().size() - 1).key() + ")");
            }
        }
        long rowId = file.transaction(c -> {
            long id = requireId(c, name);
            try (PreparedStatement s = c.prepareStatement("INSERT INTO string_break (instrument_id, date, key, "
                    + "string_of_unison, break_hz, during, place, wire_batch, remark, version_number) "
                    + "VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")) {
                bind(s, id, b.date().toString(), b.key(), b.string().isPresent() ? b.string().getAsInt() : null,
                        b.breakHz().isPresent() ? b.breakHz().getAsDouble() : null, b.during().word(),
                        b.place().word(), b.wireBatch(), b.remark(), judged.isPresent() ? judged.getAsInt() : null);
                s.executeUpdate();
            }
            return (long) ArchiveFile.intQuery(c, "SELECT last_insert_rowid()");
        });
        return new ArchivedBreak(rowId, b, judged);
    }

    /** @return the instrument's breaks, by date then key */
    public List<ArchivedBreak> breaks(String name) {
        return file.read(c -> {
            long id = requireId(c, name);
            List<ArchivedBreak> out = new ArrayList<>();
            try (PreparedStatement s = c.prepareStatement("SELECT id, date, key, string_of_unison, break_hz, during, "
                    + "place, wire_batch, remark, version_number FROM string_break WHERE instrument_id = ? "
                    + "ORDER BY date, key, id")) {
                s.setLong(1, id);
                try (ResultSet r = s.executeQuery()) {
                    while (r.next()) {
                        double hz = r.getDouble(5);
                        OptionalDouble f = r.wasNull() ? OptionalDouble.empty() : OptionalDouble.of(hz);
                        StringBreak b = new StringBreak(LocalDate.parse(r.getString(2)), r.getInt(3), optInt(r, 4), f,
                                BreakActivity.of(r.getString(6)), BreakPlace.of(r.getString(7)), r.getString(8),
                                r.getString(9));
                        out.add(new ArchivedBreak(r.getLong(1), b, optInt(r, 10)));
                    }
                }
            }
            return out;
        });
    }

    // ---- whole file

    /** @return {@code PRAGMA integrity_check}: {@code [ok]} for a sound file */
    public List<String> integrityCheck() {
        return file.integrityCheck();
    }

    /** Runs work on the connection in one transaction (the dump and load of this package). */
    <T> T transaction(ArchiveFile.Work<T> work) {
        return file.transaction(work);
    }

    /** Runs reading work on the connection in one read transaction (the dump). */
    <T> T read(ArchiveFile.Work<T> work) {
        return file.read(work);
    }

    @Override
    public void close() {
        file.close();
    }

    private static long idOf(Connection c, String name) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("SELECT id FROM instrument WHERE name = ?")) {
            s.setString(1, name);
            try (ResultSet r = s.executeQuery()) {
                return r.next() ? r.getLong(1) : 0;
            }
        }
    }

    private static long requireId(Connection c, String name) throws SQLException {
        long id = idOf(c, name);
        if (id == 0) {
            List<String> names = new ArrayList<>();
            try (PreparedStatement s = c.prepareStatement("SELECT name FROM instrument ORDER BY name COLLATE NOCASE "
                    + "LIMIT 11"); ResultSet r = s.executeQuery()) {
                while (r.next()) {
                    names.add(r.getString(1));
                }
            }
            throw unknown(name, names);
        }
        return id;
    }

    private ArchiveRefused unknown(String name) {
        return unknown(name, instruments().stream().map(Instrument::name).limit(11).toList());
    }

    private static ArchiveRefused unknown(String name, List<String> names) {
        String known = names.isEmpty() ? "the archive has no instruments yet (add one with 'archive add-instrument')"
                : "it has " + String.join(", ", names.stream().limit(10).map(n -> "'" + n + "'").toList())
                + (names.size() > 10 ? ", …" : "");
        return new ArchiveRefused("no instrument named '" + name + "' in the archive; " + known);
    }

    private static OptionalInt optInt(ResultSet r, int column) throws SQLException {
        int v = r.getInt(column);
        return r.wasNull() ? OptionalInt.empty() : OptionalInt.of(v);
    }

    private static void bind(PreparedStatement s, Object... values) throws SQLException {
        for (int i = 0; i < values.length; i++) {
            Object v = values[i];
            if (v == null) {
                s.setNull(i + 1, Types.NULL);
            } else {
                s.setObject(i + 1, v);
            }
        }
    }
}
