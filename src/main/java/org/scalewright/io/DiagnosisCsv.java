package org.scalewright.io;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.scalewright.design.diagnosis.DiagnosedNote;
import org.scalewright.design.diagnosis.DiagnosisReport;
import org.scalewright.design.diagnosis.Remedy;
import org.scalewright.model.NumberText;
import org.scalewright.physics.NoteResult;

/** The per-note results of a section diagnosis as CSV rows in SI (DESIGN §5, {@code diagnose --out}). */
public final class DiagnosisCsv {
    /** The columns, in order. */
    public static final List<String> HEADER = List.of("key", "note", "section", "wound", "length_mm", "core_mm",
            "frequency_hz", "tension_n", "stress_mpa", "breaking_strength_mpa", "break_pct", "headroom_cents",
            "break_hz", "trend_pct", "trend_deviation_pct", "stands_out", "length_trend_mm", "length_share_pct",
            "pitch_share_pct", "mass_share_pct", "strength_share_pct", "length_for_trend_mm", "length_needed_mm",
            "band");

    private DiagnosisCsv() {
    }

    /** @return header comments: the inputs and the whole finding */
    public static List<String> comments(DiagnosisReport report) {
        List<String> c = new ArrayList<>();
        if (!report.request().scale().title().isEmpty()) {
            c.add("scale: " + report.request().scale().title());
        }
        c.add("keys: " + report.request().range());
        c.add("a4_hz: " + NumberText.number(report.request().scale().pitch().a4()));
        c.add("strength table: " + report.request().settings().strength().name());
        c.add("stand-out margin: " + NumberText.number(report.request().marginPct()) + " % from the section's trend");
        c.add("length_trend_mm: the section's trend of speaking length at the key (the trend length of the finding)");
        c.add("length_for_trend_mm: the speaking length that would put the note's percent of breaking strength on "
                + "its section's trend (notes standing out high)");
        c.add("cause: " + report.finding().cause().words());
        for (String p : report.finding().explanation()) {
            c.add("finding: " + p);
        }
        for (Remedy r : report.finding().remedies()) {
            c.add("change" + (r.fixes() ? " (brings the range under the caution band): " : " (not enough): ")
                    + r.describe());
        }
        for (String i : report.finding().inspect()) {
            c.add("inspect: " + i);
        }
        return c;
    }

    /** @return one row per note of the range, bass to treble */
    public static List<List<String>> rows(DiagnosisReport report) {
        List<List<String>> rows = new ArrayList<>(report.notes().size());
        for (DiagnosedNote d : report.notes()) {
            NoteResult r = d.result();
            rows.add(List.of(Integer.toString(r.key()), r.noteName(), r.section(), Boolean.toString(r.wound()),
                    NumberText.rounded(d.speakingLength() * 1e3, 2), NumberText.rounded(r.coreDiameter() * 1e3, 4),
                    NumberText.rounded(r.frequency(), 4), NumberText.rounded(r.tension(), 2),
                    NumberText.rounded(r.stress() / 1e6, 2), NumberText.rounded(r.breakingStrength() / 1e6, 2),
                    NumberText.rounded(r.breakPct(), 3), NumberText.rounded(r.headroomCents(), 1),
                    NumberText.rounded(r.breakingFrequency(), 3), NumberText.rounded(d.trendPct(), 3),
                    NumberText.rounded(d.trendDeviationPct(), 2), Boolean.toString(d.standsOut()),
                    NumberText.rounded(d.trendLength() * 1e3, 2), NumberText.rounded(d.share().lengthPct(), 2),
                    NumberText.rounded(d.share().pitchPct(), 2), NumberText.rounded(d.share().massPct(), 2),
                    NumberText.rounded(d.share().strengthPct(), 2), mm(d.lengthForTrend()), mm(d.lengthNeeded()),
                    r.band().word()));
        }
        return rows;
    }

    private static String mm(OptionalDouble v) {
        return v.isPresent() ? NumberText.rounded(v.getAsDouble() * 1e3, 1) : "";
    }
}
