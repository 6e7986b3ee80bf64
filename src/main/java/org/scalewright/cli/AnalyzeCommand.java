package org.scalewright.cli;

import java.io.PrintWriter;
import java.util.stream.Collectors;
import org.scalewright.io.AnalysisCsv;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.Note;
import org.scalewright.model.Scale;
import org.scalewright.model.UnitConversions;
import org.scalewright.physics.Flag;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.SectionTotal;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/** {@code analyze}: every string's tension, stress, percent of breaking strength and inharmonicity. */
@Command(name = "analyze", mixinStandardHelpOptions = true,
        description = {"Analyse a scale: per string tension, stress, percent of breaking strength,",
                "inharmonicity and headroom, with flagged notes and section totals."})
public final class AnalyzeCommand extends ScaleCommand {
    @Mixin
    CsvOutput out;

    @Override
    public Integer call() throws Exception {
        ScaleAnalysis a = inputs.analysis();
        return out.writeThenPrint(AnalysisCsv.comments(a), AnalysisCsv.HEADER, AnalysisCsv.rows(a), w -> print(a, w));
    }

    static void print(ScaleAnalysis a, PrintWriter w) {
        Scale s = a.scale();
        w.println((s.title().isEmpty() ? "Scale" : s.title()) + ": " + s.notes().size() + " notes, A4 = "
                + Formats.trim(s.pitch().a4()) + " Hz, strength table: " + a.settings().strength().name());
        w.println();
        TextTable t = new TextTable(">key", "note", "section", ">str", ">length mm", "wire", ">pitch Hz", ">T N",
                ">T lbf", ">note T N", ">stress MPa", ">% break", ">B", ">headroom c", "flag");
        for (NoteResult r : a.notes()) {
            Note n = s.note(r.key()).orElseThrow();
            t.row(r.key(), r.noteName(), r.section(), r.strings(), Formats.f(n.speakingLength() * 1e3, 1),
                    Formats.wire(n), Formats.f(r.frequency(), 2), Formats.f(r.tension(), 0),
                    Formats.f(UnitConversions.newtonsToLbf(r.tension()), 1), Formats.f(r.noteTension(), 0),
                    Formats.f(r.stress() / 1e6, 0), Formats.f(r.breakPct(), 1), Formats.b(r.inharmonicity()),
                    Formats.f(r.headroomCents(), 0), marker(r));
        }
        t.print(w);
        w.println();
        w.println("wire: #size = music-wire size, else diameter in mm; wound: core/wrap[+second wrap] metal (co, ir, st)");
        w.println("flag: ! danger band, over strength or implausible value, ^ caution band, v low stress, "
                + "s tension step, w plain size out of order (growing toward the treble, or a single odd size), "
                + "? outside the strength table");
        w.println();
        if (a.flags().isEmpty()) {
            w.println("No flagged notes.");
        } else {
            w.println("Flagged notes (" + a.flaggedNoteCount() + "):");
            for (NoteResult r : a.notes()) {
                if (r.isFlagged()) {
                    w.println("  " + r.key() + " " + r.noteName() + ": "
                            + r.flags().stream().map(Flag::detail).collect(Collectors.joining("; ")));
                }
            }
        }
        w.println();
        w.println("Total tension by section:");
        TextTable st = new TextTable("section", ">keys", ">notes", ">strings", ">kN", ">lbf");
        for (SectionTotal sec : a.sections()) {
            st.row(sec.section().isEmpty() ? "(none)" : sec.section(), sec.firstKey() + "-" + sec.lastKey(),
                    sec.notes(), sec.strings(), Formats.f(sec.tension() / 1000, 1),
                    String.format(java.util.Locale.ROOT, "%,.0f", UnitConversions.newtonsToLbf(sec.tension())));
        }
        st.print(w);
        w.println("Whole instrument: " + Formats.kN(a.totalTension()));
        if (a.dangerNoteCount() > 0) {
            w.println();
            w.println("Caution: " + BuiltInData.cautions().get(0));
        }
    }

    /** @return the flag marker of a note, most serious first */
    static String marker(NoteResult r) {
        StringBuilder m = new StringBuilder();
        for (Flag f : r.flags()) {
            String c = f.kind().isDanger() ? "!" : switch (f.kind()) {
                case CAUTION -> "^";
                case LOW_STRESS -> "v";
                case NEIGHBOUR_STEP -> "s";
                case SIZE_GROWS, ODD_SIZE -> "w";
                default -> "?";
            };
            if (m.indexOf(c) < 0) {
                m.append(c);
            }
        }
        return m.toString();
    }

}
