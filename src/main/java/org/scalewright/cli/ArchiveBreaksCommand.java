package org.scalewright.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;
import org.scalewright.archive.Archive;
import org.scalewright.archive.BreakList;
import org.scalewright.archive.JudgedBreak;
import org.scalewright.model.KeyNames;
import org.scalewright.model.StringBreak;
import org.scalewright.physics.AnalysisSettings;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/** {@code archive breaks}: an instrument's broken strings with the stress each broke at. */
@Command(name = "breaks", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"List an instrument's broken strings. Where the pitch at break is known, the stress the "
                + "string broke at (the stiff-string tension at that pitch over the core's area: for plain wire "
                + "4 L² f² ρ less a small stiffness term, whatever the diameter) and its ratio to the strength "
                + "table's figure for that diameter: under 1 the wire broke weaker than the table says.",
                "With --out the CSV columns are key, date, break_hz, stress_at_break_mpa, table_strength_mpa, "
                + "strength_ratio."})
public final class ArchiveBreaksCommand implements Callable<Integer> {
    @Mixin
    InstrumentName instrument;

    @Mixin
    StrengthOption strength;

    @Mixin
    ArchiveOption db;

    @Mixin
    CsvOutput out;

    @Override
    public Integer call() throws Exception {
        AnalysisSettings settings = strength.settings();
        List<JudgedBreak> breaks;
        try (Archive a = db.open()) {
            breaks = JudgedBreak.all(a, instrument.name, settings);
        }
        return out.writeThenPrint(List.of("breaks of '" + instrument.name + "', compared with "
                        + settings.strength().name()), BreakList.HEADER, BreakList.rows(breaks),
                w -> print(breaks, settings, w));
    }

    private void print(List<JudgedBreak> breaks, AnalysisSettings settings, PrintWriter w) {
        w.println("Breaks of '" + instrument.name + "', compared with " + settings.strength().name() + ":");
        TextTable t = new TextTable(">key", "note", "date", ">string", ">break Hz", ">stress MPa", ">table MPa",
                ">ratio", "during", "place", "batch", ">version", "remark");
        for (JudgedBreak j : breaks) {
            StringBreak b = j.archived().record();
            t.row(b.key(), KeyNames.name(b.key()), b.date(), b.string().isPresent() ? b.string().getAsInt() : "",
                    b.breakHz().isPresent() ? Formats.trim(b.breakHz().getAsDouble()) : "",
                    j.stress().map(s -> Formats.f(s.stress() / 1e6, 0)).orElse(""),
                    j.stress().map(s -> Formats.f(s.tableStrength() / 1e6, 0)).orElse(""),
                    j.stress().map(s -> Formats.f(s.ratio(), 2)).orElse(""), b.during().word(), b.place().word(),
                    b.wireBatch(), j.archived().version().isPresent() ? j.archived().version().getAsInt() : "",
                    b.remark());
        }
        t.print(w);
        w.println(breaks.size() + " break" + (breaks.size() == 1 ? "" : "s") + "; ratio: stress at break over the "
                + "table's strength for that diameter");
    }
}
