package org.scalewright.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Map;
import org.scalewright.archive.Archive;
import org.scalewright.archive.ArchiveDump;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code archive dump}: the whole archive as a folder of CSV files. */
@Command(name = "dump", mixinStandardHelpOptions = true,
        description = {"Write the whole archive into a folder of CSV files, one per table (instrument, "
                + "scale_version, job, string_break) and archive.csv with the archive's version: a backup that "
                + "'archive load' reads back into a new archive, equal to this one.",
                "The folder is written whole: it holds the earlier dump or the new one, never a mixture."})
public final class ArchiveDumpCommand extends ArchiveSubcommand {
    @Option(names = "--out", paramLabel = "FOLDER", required = true,
            description = "the folder to write (new, or holding only an earlier dump)")
    Path out;

    @Override
    public Integer call() {
        Map<String, Integer> counts;
        try (Archive a = db.open()) {
            counts = ArchiveDump.dump(a, out);
        } catch (IOException e) {
            throw new UserError("cannot write " + out + ": " + e.getMessage());
        }
        printRowCounts(counts);
        terminal().println("wrote " + out);
        return ExitStatus.OK;
    }
}
