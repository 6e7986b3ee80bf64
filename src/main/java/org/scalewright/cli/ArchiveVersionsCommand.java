package org.scalewright.cli;

import java.util.List;
import java.util.concurrent.Callable;
import org.scalewright.archive.Archive;
import org.scalewright.archive.ScaleVersion;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code archive versions}: an instrument's scale versions. */
@Command(name = "versions", mixinStandardHelpOptions = true,
        description = "List an instrument's scale versions: number, date, label, the version each came from and "
                + "the sheet's title and keys.")
public final class ArchiveVersionsCommand implements Callable<Integer> {
    @Mixin
    InstrumentName instrument;

    @Mixin
    ArchiveOption db;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        TextTable t = new TextTable(">version", "date", "label", ">from", "title", "keys");
        try (Archive a = db.open()) {
            List<ScaleVersion> all = a.versions(instrument.name);
            for (ScaleVersion v : all) {
                var s = a.scaleOf(instrument.name, v);
                t.row(v.number(), v.date(), v.label(), v.derivedFrom().isPresent() ? v.derivedFrom().getAsInt() : "",
                        s.title(), s.notes().get(0).key() + "-" + s.notes().get(s.notes().size() - 1).key());
            }
        }
        t.print(spec.commandLine().getOut());
        return ExitStatus.OK;
    }
}
