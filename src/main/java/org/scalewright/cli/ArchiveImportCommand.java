package org.scalewright.cli;

import java.nio.file.Path;
import java.util.OptionalInt;
import java.util.concurrent.Callable;
import org.scalewright.archive.Archive;
import org.scalewright.archive.ScaleVersion;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.Scale;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code archive import-sheet}: a scale sheet saved as the instrument's next version. */
@Command(name = "import-sheet", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Save a scale sheet as the instrument's next version (numbered 1, 2, …). The sheet is read "
                + "and checked as every command reads it, then kept in the archive as written.")
public final class ArchiveImportCommand implements Callable<Integer> {
    @Mixin
    InstrumentName instrument;

    @Parameters(index = "1", paramLabel = "SHEET.csv", description = "the scale sheet (CSV, see scales/README.md)")
    Path sheet;

    @Option(names = "--label", paramLabel = "LABEL", required = true,
            description = "as-measured, planned, as-strung, or a label of your own")
    String label;

    @Option(names = "--from", paramLabel = "N", description = "the number of the version this one was derived from")
    Integer from;

    @Mixin
    DateOption date;

    @Mixin
    ArchiveOption db;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        java.time.LocalDate day = date.day();
        Scale scale = ScaleSheetReader.standard().read(sheet);
        ScaleVersion v;
        try (Archive a = db.open()) {
            v = a.saveVersion(instrument.name, scale, label, from == null ? OptionalInt.empty() : OptionalInt.of(from),
                    day);
        }
        spec.commandLine().getOut().println("saved " + sheet + " as version " + v.number() + " of '"
                + instrument.name + "' (" + v.label() + (v.derivedFrom().isPresent() ? ", from version "
                + v.derivedFrom().getAsInt() : "") + ", " + v.date() + ")");
        return ExitStatus.OK;
    }
}
