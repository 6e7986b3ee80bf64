package org.scalewright.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.scalewright.archive.Archive;
import org.scalewright.model.Scale;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code archive export-sheet}: one version written out as a scale sheet. */
@Command(name = "export-sheet", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Write one of an instrument's scale versions as a scale sheet, in the units it was saved in.")
public final class ArchiveExportCommand implements Callable<Integer> {
    @Mixin
    InstrumentName instrument;

    @Parameters(index = "1", paramLabel = "VERSION", description = "the version's number (see 'archive versions')")
    int version;

    @Option(names = "--out", paramLabel = "FILE.csv", required = true,
            description = "the sheet to write (a file it replaces is kept as NAME.bak)")
    Path out;

    @Mixin
    ArchiveOption db;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Scale scale;
        try (Archive a = db.open()) {
            scale = a.scaleOf(instrument.name, a.version(instrument.name, version));
        }
        Outputs.sheet(out, scale);
        spec.commandLine().getOut().println("wrote version " + version + " of '" + instrument.name + "' to " + out);
        return ExitStatus.OK;
    }
}
