package org.scalewright.design.wirecheck;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.scalewright.model.KeyNames;
import org.scalewright.model.Note;
import org.scalewright.model.Scale;
import org.scalewright.model.UnitConversions;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.NoteCalculator;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.Pitch;

/**
 * Checks replacement wire, a new pitch standard and a pitch raise against every string of a
 * scale (DESIGN §5, check-wire). Per note: percent of breaking strength before (present wire
 * and table at the target pitch), after (replacement at the target pitch) and at the peak of
 * the overpull (a note C cents flat is first tuned to target + C·overpull/100 cents); the total
 * tension on the plate; and whether to raise in stages.
 */
public final class WireCheck {
    private WireCheck() {
    }

    /**
     * @param request the scale, the replacement, the target pitch and the present state
     * @return the report; the request's scale is not changed
     */
    public static WireCheckReport run(WireCheckRequest request) {
        Scale scale = request.scale();
        AnalysisSettings presentSettings = request.settings();
        AnalysisSettings replacementSettings = presentSettings.withStrength(request.replacement());
        double danger = presentSettings.bands().danger();
        double overpull = request.overpullPct() / 100.0;
        List<WireCheckNote> notes = new ArrayList<>(scale.notes().size());
        List<Note> replacementNotes = new ArrayList<>(scale.notes().size());
        double present = 0;
        double before = 0;
        double after = 0;
        double peak = 0;
        for (Note n : scale.notes()) {
            WireChange change = request.conversion().convert(n);
            Note repl = change.changed() ? n.withWire(change.to()) : n;
            replacementNotes.add(repl);
            double cents = request.flat().centsFlat(n.key());
            double target = Pitch.working(n, request.target());
            double presentHz = Pitch.shiftedByCents(target, -cents);
            double peakHz = Pitch.shiftedByCents(target, Math.max(cents, 0) * overpull);
            NoteResult rPresent = NoteCalculator.computeAt(n, presentHz, presentSettings);
            NoteResult rBefore = NoteCalculator.computeAt(n, target, presentSettings);
            NoteResult rAfter = NoteCalculator.computeAt(repl, target, replacementSettings);
            NoteResult rPeak = NoteCalculator.computeAt(repl, peakHz, replacementSettings);
            notes.add(new WireCheckNote(n, repl, change, cents, request.flat().source(n.key()), rPresent, rBefore,
                    rAfter, rPeak, rPeak.breakPct() >= danger));
            present += rPresent.noteTension();
            before += rBefore.noteTension();
            after += rAfter.noteTension();
            peak += rPeak.noteTension();
        }
        TensionTotals totals = new TensionTotals(present, before, after, peak);
        StrengthComparison tables = StrengthComparison.compare(scale.withNotes(replacementNotes), request.target(),
                presentSettings, presentSettings.strength(), request.replacement());
        StageAdvice stages = stageAdvice(request, notes, totals);
        List<WireCheckNote> ordered = new ArrayList<>(notes);
        ordered.sort(Comparator.comparing((WireCheckNote w) -> !w.overDanger())
                .thenComparing(w -> w.overDanger() ? -w.breakPctPeak() : 0)
                .thenComparingInt(WireCheckNote::key));
        return new WireCheckReport(request, ordered, totals, tables, stages);
    }

    private static StageAdvice stageAdvice(WireCheckRequest request, List<WireCheckNote> notes, TensionTotals totals) {
        double danger = request.settings().bands().danger();
        double limit = request.stageLimit().newtons(totals.present());
        List<String> reasons = new ArrayList<>();
        List<WireCheckNote> over = notes.stream().filter(WireCheckNote::overDanger).toList();
        if (!over.isEmpty()) {
            reasons.add(String.format(Locale.ROOT, "%d note%s pass%s the danger band (%.0f %%) at the overpull peak",
                    over.size(), over.size() == 1 ? "" : "s", over.size() == 1 ? "es" : "", danger));
        }
        if (totals.changeToPeak() > limit) {
            reasons.add(String.format(Locale.ROOT,
                    "the total tension rises by %.1f kN (%,.0f lbf, %.1f %%) to the peak, more than the stage limit "
                            + "of %s", totals.changeToPeak() / 1e3,
                    UnitConversions.newtonsToLbf(totals.changeToPeak()), totals.changeToPeakPct(),
                    request.stageLimit().describe(limit)));
        }
        List<Integer> dangerAtTarget = notes.stream().filter(w -> w.breakPctAfter() >= danger)
                .map(WireCheckNote::key).toList();
        List<RaiseStage> plan = List.of();
        for (int n = 1; n <= StageAdvice.MAX_STAGES; n++) {
            List<RaiseStage> stages = plan(request, notes, totals.present(), n);
            boolean ok = true;
            for (RaiseStage s : stages) {
                // a pass may not take a note into the danger band that is under it at the target
                boolean newlyInDanger = s.inDanger().stream().anyMatch(o -> !dangerAtTarget.contains(o.key()));
                if (s.change() > limit || newlyInDanger) {
                    ok = false;
                    break;
                }
            }
            if (ok) {
                plan = stages;
                break;
            }
        }
        return new StageAdvice(!reasons.isEmpty(), reasons, plan, dangerAtTarget, limit);
    }

    /**
     * The passes of an n-stage raise, every note's percent of breaking strength worked out at
     * every pass's peak: the highest of all of them (notes already in the danger band at the
     * target pitch included) and every note at or over the danger band are kept per pass.
     */
    static List<RaiseStage> plan(WireCheckRequest request, List<WireCheckNote> notes, double presentTotal, int n) {
        AnalysisSettings repl = request.settings().withStrength(request.replacement());
        double danger = request.settings().bands().danger();
        double overpull = request.overpullPct() / 100.0;
        List<WireCheckNote> byKey = notes.stream().sorted(Comparator.comparingInt(WireCheckNote::key)).toList();
        List<RaiseStage> stages = new ArrayList<>(n);
        for (int i = 1; i <= n; i++) {
            double startFraction = (i - 1) / (double) n;
            double endFraction = i / (double) n;
            double atStart = i == 1 ? presentTotal : 0;
            double atPeak = 0;
            double maxPct = Double.NEGATIVE_INFINITY;
            int maxKey = byKey.isEmpty() ? 0 : byKey.get(0).key();
            List<RaiseStage.Over> inDanger = new ArrayList<>();
            for (WireCheckNote w : byKey) {
                double c = w.centsFlat();
                double target = w.after().frequency();
                if (i > 1) {
                    atStart += NoteCalculator.computeAt(w.replacementNote(),
                            Pitch.shiftedByCents(target, -c * (1 - startFraction)), repl).noteTension();
                }
                double peakCents = -c * (1 - endFraction) + Math.max(c, 0) / n * overpull;
                NoteResult r = NoteCalculator.computeAt(w.replacementNote(), Pitch.shiftedByCents(target, peakCents),
                        repl);
                atPeak += r.noteTension();
                if (r.breakPct() > maxPct) {
                    maxPct = r.breakPct();
                    maxKey = w.key();
                }
                if (r.breakPct() >= danger) {
                    inDanger.add(new RaiseStage.Over(w.key(), r.breakPct()));
                }
            }
            stages.add(new RaiseStage(i, endFraction, atStart, atPeak, maxPct == Double.NEGATIVE_INFINITY ? 0 : maxPct,
                    maxKey, inDanger));
        }
        return stages;
    }

    /** @return a one-line summary of a note's peak, e.g. {@code 68 E6: 71.2 % at +10 cents} */
    public static String describePeak(WireCheckNote w) {
        return String.format(Locale.ROOT, "%d %s: %.1f %% of breaking strength at +%.1f cents", w.key(),
                KeyNames.name(w.key()), w.breakPctPeak(), w.peakCentsAboveTarget());
    }
}
