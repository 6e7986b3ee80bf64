package org.scalewright.cli;

import java.io.PrintWriter;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** What every {@code archive} subcommand has: the archive file ({@code --db}) and the terminal it answers on. */
abstract class ArchiveSubcommand implements Callable<Integer> {
    @Mixin
    ArchiveOption db;

    @Spec
    CommandSpec spec;

    /** @return where the command prints its answer */
    final PrintWriter terminal() {
        return spec.commandLine().getOut();
    }

    /** Prints how many rows each file of a dump holds, one line a file, as {@code dump} and {@code load} tell it. */
    final void printRowCounts(Map<String, Integer> rowsPerFile) {
        rowsPerFile.forEach((file, rows) -> terminal().println("  " + file + ": " + rows + " rows"));
    }
}
