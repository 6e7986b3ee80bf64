package org.scalewright.archive;

import java.util.List;

/**
 * The archive's tables, built by a short numbered list of migrations. The number of the last one
 * applied is kept in the database header ({@code PRAGMA user_version}); each migration runs in one
 * transaction together with the new number, so an archive is always at one whole version. A new
 * migration is appended, never edited: files in the field were built by the ones before it.
 */
final class ArchiveSchema {
    /** Marks the file as a Scalewright archive ({@code PRAGMA application_id}): "SWAR". */
    static final int APPLICATION_ID = 0x53574152;

    /** The migrations, the first is version 1. Every text column is NOT NULL ('' when empty). */
    static final List<List<String>> MIGRATIONS = List.of(
            List.of("""
                    CREATE TABLE instrument (
                      id INTEGER PRIMARY KEY,
                      name TEXT NOT NULL UNIQUE CHECK (length(name) BETWEEN 1 AND 200),
                      maker TEXT NOT NULL DEFAULT '',
                      model TEXT NOT NULL DEFAULT '',
                      serial TEXT NOT NULL DEFAULT '',
                      owner TEXT NOT NULL DEFAULT '',
                      location TEXT NOT NULL DEFAULT '',
                      added TEXT NOT NULL)""", """
                    CREATE TABLE scale_version (
                      id INTEGER PRIMARY KEY,
                      instrument_id INTEGER NOT NULL REFERENCES instrument(id),
                      number INTEGER NOT NULL CHECK (number >= 1),
                      date TEXT NOT NULL,
                      label TEXT NOT NULL,
                      derived_from INTEGER CHECK (derived_from IS NULL OR derived_from < number),
                      sheet TEXT NOT NULL,
                      UNIQUE (instrument_id, number))""", """
                    CREATE TABLE job (
                      id INTEGER PRIMARY KEY,
                      instrument_id INTEGER NOT NULL REFERENCES instrument(id),
                      date TEXT NOT NULL,
                      kind TEXT NOT NULL,
                      notes TEXT NOT NULL DEFAULT '',
                      a4_hz REAL,
                      strength_table TEXT NOT NULL DEFAULT '',
                      version_number INTEGER)""", """
                    CREATE TABLE string_break (
                      id INTEGER PRIMARY KEY,
                      instrument_id INTEGER NOT NULL REFERENCES instrument(id),
                      date TEXT NOT NULL,
                      key INTEGER NOT NULL,
                      string_of_unison INTEGER CHECK (string_of_unison IS NULL OR string_of_unison BETWEEN 1 AND 3),
                      break_hz REAL CHECK (break_hz IS NULL OR break_hz > 0),
                      during TEXT NOT NULL,
                      place TEXT NOT NULL,
                      wire_batch TEXT NOT NULL DEFAULT '',
                      remark TEXT NOT NULL DEFAULT '',
                      version_number INTEGER)""",
                    "CREATE INDEX break_by_instrument ON string_break (instrument_id, key)",
                    "PRAGMA application_id = " + APPLICATION_ID));

    /** The tables in the order a dump writes and a load reads them (referenced tables first). */
    static final List<String> TABLES = List.of("instrument", "scale_version", "job", "string_break");

    private ArchiveSchema() {
    }

    /** @return the schema version this program builds and knows */
    static int latest() {
        return MIGRATIONS.size();
    }
}
