package org.scalewright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import org.scalewright.archive.Archive;
import org.scalewright.archive.ArchivedBreak;
import org.scalewright.design.diagnosis.BreakFindings;
import org.scalewright.design.diagnosis.BrokenString;
import org.scalewright.model.StringBreak;
import picocli.CommandLine.Option;

/**
 * The {@code --archive FILE --instrument NAME} of {@code diagnose}: the breaks recorded for the
 * instrument, taken into the finding, and their table on the terminal.
 */
public final class ArchiveBreaksOption {
    @Option(names = "--archive", paramLabel = "FILE",
            description = "a workshop archive (see 'archive --help'): with --instrument, the breaks recorded there "
                    + "are taken into the finding")
    Path file;

    @Option(names = "--instrument", paramLabel = "NAME", description = "the instrument's name in --archive")
    String instrument;

    /** @return the instrument's recorded breaks, or none when no archive is given */
    List<StringBreak> breaks() {
        if (file == null && instrument == null) {
            return List.of();
        }
        if (file == null || instrument == null) {
            throw new UserError(file == null ? "--instrument needs --archive FILE" : "--archive needs --instrument "
                    + "NAME");
        }
        try (Archive a = Archive.open(file)) {
            return a.breaks(instrument).stream().map(ArchivedBreak::record).toList();
        }
    }

    /** Prints the breaks on the range's notes, judged on the diagnosed sheet; nothing without breaks. */
    static void print(BreakFindings f, PrintWriter w) {
        if (f.strings().isEmpty()) {
            return;
        }
        w.println();
        w.println("Recorded breaks in the range (stress at break on this sheet):");
        TextTable t = new TextTable(">key", "note", "date", ">string", ">break Hz", ">stress MPa", ">ratio",
                ">% break now", ">headroom c", "during", "place", "batch");
        for (BrokenString s : f.strings()) {
            StringBreak b = s.record();
            t.row(b.key(), s.working().noteName(), b.date(), b.string().isPresent() ? b.string().getAsInt() : "",
                    b.breakHz().isPresent() ? Formats.trim(b.breakHz().getAsDouble()) : "",
                    s.atBreak().map(a -> Formats.f(a.stress() / 1e6, 0)).orElse(""),
                    s.atBreak().map(a -> Formats.f(a.ratio(), 2)).orElse(""), Formats.f(s.working().breakPct(), 1),
                    Formats.f(s.working().headroomCents(), 0), b.during().word(), b.place().word(), b.wireBatch());
        }
        t.print(w);
    }
}
