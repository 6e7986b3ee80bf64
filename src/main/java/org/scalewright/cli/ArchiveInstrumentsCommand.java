package org.scalewright.cli;

import java.util.List;
import java.util.concurrent.Callable;
import org.scalewright.archive.Archive;
import org.scalewright.archive.Instrument;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code archive instruments}: every instrument with its description. */
@Command(name = "instruments", mixinStandardHelpOptions = true,
        description = "List the instruments in the archive with their descriptions.")
public final class ArchiveInstrumentsCommand implements Callable<Integer> {
    @Mixin
    ArchiveOption db;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        List<Instrument> all;
        try (Archive a = db.open()) {
            all = a.instruments();
        }
        TextTable t = new TextTable("name", "maker", "model", "serial", "owner", "location");
        for (Instrument i : all) {
            t.row(i.name(), i.maker(), i.model(), i.serial(), i.owner(), i.location());
        }
        t.print(spec.commandLine().getOut());
        return ExitStatus.OK;
    }
}
