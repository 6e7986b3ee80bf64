package org.scalewright.cli;

import java.nio.file.Path;
import org.scalewright.archive.Archive;
import org.scalewright.archive.ArchiveLocation;
import picocli.CommandLine.Option;

/** The {@code --db FILE} of every {@code archive} command: which archive file, the user's own by default. */
public final class ArchiveOption {
    @Option(names = "--db", paramLabel = "FILE",
            description = "the archive file (default: archive.db in the user's data folder; see 'archive --help')")
    Path db;

    /** @return the archive file chosen */
    Path file() {
        return db != null ? db : ArchiveLocation.defaultFile();
    }

    /** @return the archive, opened (refused with the reason when it is missing, not an archive, damaged or newer) */
    Archive open() {
        return Archive.open(file());
    }
}
