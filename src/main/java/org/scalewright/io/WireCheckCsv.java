package org.scalewright.io;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.scalewright.design.wirecheck.StageAdvice;
import org.scalewright.design.wirecheck.StageWords;
import org.scalewright.design.wirecheck.TensionTotals;
import org.scalewright.design.wirecheck.WireCheckNote;
import org.scalewright.design.wirecheck.WireCheckReport;
import org.scalewright.design.wirecheck.WireCheckRequest;
import org.scalewright.model.CoreWire;
import org.scalewright.model.NumberText;
import org.scalewright.model.UnitConversions;

/** The per-note results of a wire check as CSV rows in SI (DESIGN §5, {@code check-wire --out}). */
public final class WireCheckCsv {
    /** The columns, in order: notes over the danger band at the peak come first. */
    public static final List<String> HEADER = List.of("key", "note", "section", "wound", "strings",
            "wire_size_before", "core_mm_before", "wire_size_after", "core_mm_after", "cents_flat", "flat_from",
            "pitch_present_hz", "pitch_target_hz", "pitch_peak_hz", "strength_before_mpa", "strength_after_mpa",
            "tension_present_n", "tension_after_n", "tension_peak_n", "break_pct_before", "break_pct_after",
            "break_pct_peak", "headroom_cents_after", "band_after", "band_peak", "over_danger", "conversion");

    private WireCheckCsv() {
    }

    /** @return header comments: the inputs, the totals and the stage advice */
    public static List<String> comments(WireCheckReport report) {
        WireCheckRequest q = report.request();
        List<String> c = new ArrayList<>();
        if (!q.scale().title().isEmpty()) {
            c.add("scale: " + q.scale().title());
        }
        c.add("sheet a4_hz: " + NumberText.number(q.scale().pitch().a4()));
        c.add("target a4_hz: " + NumberText.number(q.target().a4()));
        c.add("present strength table: " + q.settings().strength().name());
        c.add("replacement strength table: " + q.replacement().name());
        c.add("wire: " + q.conversion().describe());
        c.add("present state: " + (q.flat().isPerNote() ? "cents flat per note (interpolated between measured keys)"
                : NumberText.number(q.flat().uniformCents()) + " cents flat on every note"));
        c.add("overpull: " + NumberText.number(q.overpullPct()) + " % of how flat each note is");
        TensionTotals t = report.totals();
        c.add(String.format(Locale.ROOT, "total tension present: %s N (%s lbf)", NumberText.rounded(t.present(), 0),
                NumberText.rounded(UnitConversions.newtonsToLbf(t.present()), 0)));
        c.add(String.format(Locale.ROOT, "total tension after, at target: %s N (%s lbf), change %s N (%s lbf)",
                NumberText.rounded(t.afterAtTarget(), 0), NumberText.rounded(UnitConversions.newtonsToLbf(t.afterAtTarget()), 0),
                NumberText.rounded(t.changeToTarget(), 0), NumberText.rounded(UnitConversions.newtonsToLbf(t.changeToTarget()), 0)));
        c.add(String.format(Locale.ROOT, "total tension at peak: %s N (%s lbf), change %s N (%s lbf)",
                NumberText.rounded(t.peak(), 0), NumberText.rounded(UnitConversions.newtonsToLbf(t.peak()), 0),
                NumberText.rounded(t.changeToPeak(), 0), NumberText.rounded(UnitConversions.newtonsToLbf(t.changeToPeak()), 0)));
        // the stage advice in the tool's one wording (design.wirecheck.StageWords)
        StageAdvice s = report.stages();
        StageWords w = report.stageWords();
        c.add("raise in stages: " + (s.advised() ? "yes" : "no"));
        for (String r : w.reasons()) {
            c.add("  because " + r);
        }
        if (!w.plan().isEmpty()) {
            c.add("  " + w.plan());
        }
        for (String line : w.passes()) {
            c.add("  " + line);
        }
        if (!w.closing().isEmpty()) {
            c.add("  " + w.closing());
        }
        return c;
    }

    /** @return one row per note, in the report's order (at risk first) */
    public static List<List<String>> rows(WireCheckReport report) {
        List<List<String>> rows = new ArrayList<>(report.notes().size());
        for (WireCheckNote w : report.notes()) {
            rows.add(List.of(Integer.toString(w.key()), w.noteName(), w.presentNote().section(),
                    Boolean.toString(w.presentNote().isWound()), Integer.toString(w.presentNote().strings()),
                    size(w.presentNote().wire()), NumberText.rounded(w.presentNote().wire().diameter() * 1e3, 4),
                    size(w.replacementNote().wire()), NumberText.rounded(w.replacementNote().wire().diameter() * 1e3, 4),
                    NumberText.rounded(w.centsFlat(), 2), w.flatSource().name().toLowerCase(Locale.ROOT),
                    NumberText.rounded(w.present().frequency(), 4), NumberText.rounded(w.after().frequency(), 4),
                    NumberText.rounded(w.peak().frequency(), 4), NumberText.rounded(w.before().breakingStrength() / 1e6, 2),
                    NumberText.rounded(w.after().breakingStrength() / 1e6, 2), NumberText.rounded(w.present().tension(), 2),
                    NumberText.rounded(w.after().tension(), 2), NumberText.rounded(w.peak().tension(), 2),
                    NumberText.rounded(w.breakPctBefore(), 3), NumberText.rounded(w.breakPctAfter(), 3),
                    NumberText.rounded(w.breakPctPeak(), 3), NumberText.rounded(w.headroomCentsAfter(), 1),
                    w.after().band().word(), w.peak().band().word(), Boolean.toString(w.overDanger()),
                    w.wireChange().remark()));
        }
        return rows;
    }

    private static String size(CoreWire w) {
        return w.musicWireSize().isPresent() ? NumberText.number(w.musicWireSize().getAsDouble()) : "";
    }
}
