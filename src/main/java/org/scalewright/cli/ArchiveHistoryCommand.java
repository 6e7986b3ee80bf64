package org.scalewright.cli;

import java.io.PrintWriter;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.scalewright.archive.Archive;
import org.scalewright.archive.ArchivedBreak;
import org.scalewright.archive.Instrument;
import org.scalewright.archive.Job;
import org.scalewright.archive.ScaleVersion;
import org.scalewright.model.KeyNames;
import org.scalewright.model.StringBreak;
import picocli.CommandLine.Command;

/** {@code archive history}: an instrument's versions, jobs and breaks in the order of their days. */
@Command(name = "history", mixinStandardHelpOptions = true,
        description = "Show an instrument's description and its history: scale versions, jobs and broken strings, "
                + "day by day.")
public final class ArchiveHistoryCommand extends InstrumentSubcommand {
    private record Entry(LocalDate date, int order, String what) {
    }

    @Override
    public Integer call() {
        List<Entry> entries = new ArrayList<>();
        Instrument i;
        try (Archive a = db.open()) {
            i = a.instrument(instrument.name);
            for (ScaleVersion v : a.versions(i.name())) {
                entries.add(new Entry(v.date(), 0, "version " + v.numberAndLabel()
                        + (v.derivedFrom().isPresent() ? ", from version " + v.derivedFrom().getAsInt() : "")));
            }
            for (Job j : a.jobs(i.name())) {
                entries.add(new Entry(j.date(), 1, "job: " + j.kind() + (j.notes().isEmpty() ? "" : " - " + j.notes())
                        + (j.a4().isPresent() ? ", A4 = " + Formats.trim(j.a4().getAsDouble()) + " Hz" : "")
                        + (j.strengthTable().isEmpty() ? "" : ", strength table " + j.strengthTable())
                        + (j.version().isPresent() ? ", to version " + j.version().getAsInt() : "")));
            }
            for (ArchivedBreak ab : a.breaks(i.name())) {
                entries.add(new Entry(ab.record().date(), 2, breakText(ab.record())));
            }
        }
        entries.sort(Comparator.comparing(Entry::date).thenComparingInt(Entry::order));
        PrintWriter w = terminal();
        w.println(i.name() + (i.description().isEmpty() ? "" : ": " + i.description()));
        for (Entry e : entries) {
            w.println("  " + e.date() + "  " + e.what());
        }
        if (entries.isEmpty()) {
            w.println("  nothing recorded yet");
        }
        return ExitStatus.OK;
    }

    private static String breakText(StringBreak b) {
        return "break: key " + b.key() + " " + KeyNames.name(b.key())
                + (b.string().isPresent() ? " string " + b.string().getAsInt() : "")
                + (b.breakHz().isPresent() ? " at " + Formats.trim(b.breakHz().getAsDouble()) + " Hz" : "")
                + ", " + b.during().phrase() + ", " + b.place().phrase()
                + (b.wireBatch().isEmpty() ? "" : ", batch " + b.wireBatch())
                + (b.remark().isEmpty() ? "" : " - " + b.remark());
    }
}
