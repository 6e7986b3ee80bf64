package org.scalewright.cli;

import org.scalewright.archive.Archive;
import org.scalewright.archive.ArchiveLocation;
import picocli.CommandLine.Command;

/** {@code archive create}: a new, empty archive file. */
@Command(name = "create", mixinStandardHelpOptions = true,
        description = "Create a new, empty archive (refused when the file exists already).")
public final class ArchiveCreateCommand extends ArchiveSubcommand {
    @Override
    public Integer call() {
        java.nio.file.Path file = db.file();
        if (db.db == null) {
            ArchiveLocation.createFolderOf(file);
        }
        try (Archive a = Archive.create(file)) {
            terminal().println("created archive " + a.path() + " (archive version "
                    + Archive.schemaVersion() + ")");
        }
        return ExitStatus.OK;
    }
}
