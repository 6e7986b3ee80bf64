package org.scalewright.cli;

import java.util.concurrent.Callable;
import org.scalewright.archive.Archive;
import org.scalewright.archive.Instrument;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code archive add-instrument}: a new instrument with its description. */
@Command(name = "add-instrument", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Add an instrument to the archive under a short name of your choosing (unique in the "
                + "archive), with free-text description fields.")
public final class ArchiveAddInstrumentCommand implements Callable<Integer> {
    @Mixin
    InstrumentName instrument;

    @Option(names = "--maker", paramLabel = "TEXT", description = "who built it")
    String maker;

    @Option(names = "--model", paramLabel = "TEXT", description = "the maker's model")
    String model;

    @Option(names = "--serial", paramLabel = "TEXT", description = "serial number")
    String serial;

    @Option(names = "--owner", paramLabel = "TEXT", description = "whose it is")
    String owner;

    @Option(names = "--location", paramLabel = "TEXT", description = "where it stands")
    String location;

    @Mixin
    ArchiveOption db;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Instrument i = new Instrument(instrument.name, maker, model, serial, owner, location);
        try (Archive a = db.open()) {
            a.addInstrument(i);
        }
        spec.commandLine().getOut().println("added instrument '" + i.name() + "'");
        return ExitStatus.OK;
    }
}
