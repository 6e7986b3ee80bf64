package org.scalewright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.scalewright.design.diagnosis.DiagnosedNote;
import org.scalewright.design.diagnosis.DiagnosisReport;
import org.scalewright.design.diagnosis.DiagnosisRequest;
import org.scalewright.design.diagnosis.Finding;
import org.scalewright.design.diagnosis.Remedy;
import org.scalewright.design.diagnosis.SectionDiagnosis;
import org.scalewright.design.wirecheck.MakerTables;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.DiagnosisCsv;
import org.scalewright.io.StrengthTableReader;
import org.scalewright.model.Note;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.NoteResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code diagnose}: why strings break in one section, and what change would bring it under the caution band. */
@Command(name = "diagnose", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Diagnose a key range where strings break: per note stress, percent of breaking strength, "
                + "headroom and the pitch at which the wire reaches its strength; the notes standing out from a "
                + "robust smooth trend of their section; and a finding: whether length and pitch or the wire set "
                + "the stress, which changes would bring the range under the caution band (each recomputed), and "
                + "what a technician should inspect."},
        footer = {"", "A section is a run of notes with the same section label and the same kind of string "
                + "(plain or wound); its trend is fitted over the whole section, also outside --keys.",
                "", "Figures are estimates from nominal data: confirm with the maker's certified strength data. "
                + "A breaking string can whip: wear eye protection."})
public final class DiagnoseCommand extends ScaleCommand {
    @Mixin
    KeysOption range;

    @Option(names = "--compare", paramLabel = "MAKER.csv",
            description = "another wire maker's strength table to try as a stronger wire (may be repeated)")
    List<Path> compare = new ArrayList<>();

    @Option(names = "--margin", paramLabel = "PCT", defaultValue = "8",
            description = "a note stands out when it differs from its section's trend by more than PCT %% "
                    + "(default: ${DEFAULT-VALUE}, common practice, no source)")
    double margin;

    @Mixin
    CsvOutput out;

    @Mixin
    ArchiveBreaksOption archive;

    @Override
    public Integer call() throws Exception {
        if (!(margin > 0 && margin < 100)) {
            throw new UserError("--margin must be between 0 and 100 %, was " + Formats.trim(margin));
        }
        Scale scale = inputs.scale();
        AnalysisSettings settings = inputs.settings();
        if (scale.notesIn(range.keys).isEmpty()) {
            throw new UserError("--keys " + range.keys + ": the scale has no note in that range (it has keys "
                    + scale.notes().get(0).key() + "-" + scale.notes().get(scale.notes().size() - 1).key() + ")");
        }
        MakerTables tables = MakerTables.empty();
        for (Path p : compare) {
            tables = tables.with(StrengthTableReader.read(p));
        }
        DiagnosisRequest request = new DiagnosisRequest(scale, range.keys, settings, tables.tables(), margin,
                BuiltInData.musicWireSizes(), BuiltInData.metricPlainWire());
        DiagnosisReport report = SectionDiagnosis.diagnose(request, archive.breaks());
        return out.writeThenPrint(DiagnosisCsv.comments(report), DiagnosisCsv.HEADER, DiagnosisCsv.rows(report),
                w -> print(report, w));
    }

    static void print(DiagnosisReport r, PrintWriter w) {
        DiagnosisRequest q = r.request();
        Scale s = q.scale();
        w.println("Diagnosis: " + (s.title().isEmpty() ? "scale" : s.title()) + ", keys " + q.range() + ", A4 = "
                + Formats.trim(s.pitch().a4()) + " Hz, strength table: " + q.settings().strength().name());
        w.println();
        TextTable t = new TextTable(">key", "note", "section", ">length mm", ">trend mm", "wire", ">pitch Hz",
                ">stress MPa", ">% break", ">trend %", ">dev %", ">headroom c", ">break Hz", "out");
        for (DiagnosedNote d : r.notes()) {
            NoteResult n = d.result();
            Note note = s.note(d.key()).orElseThrow();
            t.row(d.key(), n.noteName(), n.section(), Formats.f(d.speakingLength() * 1e3, 1),
                    Formats.f(d.trendLength() * 1e3, 1), Formats.wire(note), Formats.f(n.frequency(), 2),
                    Formats.f(n.stress() / 1e6, 0), Formats.f(n.breakPct(), 1), Formats.f(d.trendPct(), 1),
                    String.format(Locale.ROOT, "%+.1f", d.trendDeviationPct()), Formats.f(n.headroomCents(), 0),
                    Formats.f(n.breakingFrequency(), 1), d.standsOut() ? (d.trendDeviationPct() > 0 ? "high" : "low")
                            : "");
        }
        t.print(w);
        w.println(String.format(Locale.ROOT, "out: stands out from the trend of its section by more than %s %%; "
                + "trend mm: the section's trend of speaking length", Formats.trim(q.marginPct())));
        ArchiveBreaksOption.print(r.breaks(), w);
        w.println();
        Finding f = r.finding();
        w.println("Finding (" + f.cause().words() + "):");
        for (String p : f.explanation()) {
            WordWrap.print(w, "  ", p);
        }
        if (!f.remedies().isEmpty()) {
            w.println();
            w.println(String.format(Locale.ROOT, "Changes that would bring the range under the caution band "
                    + "(%.0f %%), each applied and recomputed:", q.settings().bands().caution()));
            int i = 1;
            for (Remedy m : f.remedies()) {
                WordWrap.print(w, String.format(Locale.ROOT, "  %d. [%s] ", i++, m.fixes() ? "brings it under"
                        : "not enough"), m.describe());
            }
        }
        w.println();
        w.println("What the figures cannot see; inspect:");
        for (String item : f.inspect()) {
            WordWrap.print(w, "  - ", item);
        }
        w.println();
        w.println("Cautions:");
        for (String caution : BuiltInData.cautions()) {
            WordWrap.print(w, "  - ", caution);
        }
    }
}
