package org.scalewright.cli;

import java.util.concurrent.Callable;
import org.scalewright.archive.Archive;
import org.scalewright.archive.ArchiveLocation;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code archive create}: a new, empty archive file. */
@Command(name = "create", mixinStandardHelpOptions = true,
        description = "Create a new, empty archive (refused when the file exists already).")
public final class ArchiveCreateCommand implements Callable<Integer> {
    @Mixin
    ArchiveOption db;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        java.nio.file.Path file = db.file();
        if (db.db == null) {
            ArchiveLocation.createFolderOf(file);
        }
        try (Archive a = Archive.create(file)) {
            spec.commandLine().getOut().println("created archive " + a.path() + " (archive version "
                    + Archive.schemaVersion() + ")");
        }
        return ExitStatus.OK;
    }
}
