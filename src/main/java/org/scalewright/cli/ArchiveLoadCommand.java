package org.scalewright.cli;

import java.nio.file.Path;
import java.util.Map;
import org.scalewright.archive.Archive;
import org.scalewright.archive.ArchiveDump;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code archive load}: a dump read back into a new archive. */
@Command(name = "load", mixinStandardHelpOptions = true,
        description = "Read a folder written by 'archive dump' into an archive that holds no instruments yet (one "
                + "made with 'archive create'): all of it in one transaction, or nothing when any file, row or cell "
                + "does not fit.")
public final class ArchiveLoadCommand extends ArchiveSubcommand {
    @Parameters(index = "0", paramLabel = "FOLDER", description = "the dump folder")
    Path folder;

    @Override
    public Integer call() {
        Map<String, Integer> counts;
        try (Archive a = db.open()) {
            counts = ArchiveDump.load(a, folder);
        }
        printRowCounts(counts);
        terminal().println("loaded " + folder + " into " + db.file());
        return ExitStatus.OK;
    }
}
