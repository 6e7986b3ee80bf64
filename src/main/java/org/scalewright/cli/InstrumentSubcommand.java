package org.scalewright.cli;

import picocli.CommandLine.Mixin;

/** An {@code archive} subcommand about one instrument, named first on the line. */
abstract class InstrumentSubcommand extends ArchiveSubcommand {
    @Mixin
    InstrumentName instrument;
}
