package org.scalewright.cli;

import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.Callable;
import org.scalewright.archive.Archive;
import org.scalewright.archive.ArchiveDump;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code archive load}: a dump read back into a new archive. */
@Command(name = "load", mixinStandardHelpOptions = true,
        description = "Read a folder written by 'archive dump' into an archive that holds no instruments yet (one "
                + "made with 'archive create'): all of it in one transaction, or nothing when any file, row or cell "
                + "does not fit.")
public final class ArchiveLoadCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "FOLDER", description = "the dump folder")
    Path folder;

    @Mixin
    ArchiveOption db;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Map<String, Integer> counts;
        try (Archive a = db.open()) {
            counts = ArchiveDump.load(a, folder);
        }
        counts.forEach((f, n) -> spec.commandLine().getOut().println("  " + f + ": " + n + " rows"));
        spec.commandLine().getOut().println("loaded " + folder + " into " + db.file());
        return ExitStatus.OK;
    }
}
