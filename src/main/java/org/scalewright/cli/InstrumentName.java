package org.scalewright.cli;

import picocli.CommandLine.Parameters;

/** The instrument an {@code archive} command works on, by its name in the archive. */
public final class InstrumentName {
    @Parameters(index = "0", paramLabel = "NAME", description = "the instrument's name in the archive")
    String name;
}
