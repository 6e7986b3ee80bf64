package org.scalewright.cli;

import java.io.PrintWriter;
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
}
