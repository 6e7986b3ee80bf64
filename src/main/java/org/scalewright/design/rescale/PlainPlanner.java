package org.scalewright.design.rescale;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.scalewright.model.CoreWire;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Note;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.NoteCalculator;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

/**
 * Plans plain-wire sizes for the plain keys of a range: one size per key from the available
 * list so that per-string tension follows a target curve, wire never grows toward the treble
 * (diameter non-increasing with rising key, also against the unplanned plain neighbours just
 * outside the range), every planned string stays at or under the maximum percent of breaking
 * strength, and sizes change seldom.
 *
 * <p>Solved exactly by dynamic programming over keys × sizes ({@link ChoiceChain}) with the
 * objective Σ ((T − T*)/T*)² + change cost × changes + step cost × Σ (excess of a neighbour
 * step over the limit, as a fraction); sizes that would put a string over the maximum are
 * excluded. Wound keys in the range are skipped with a note.
 */
public final class PlainPlanner {
    private PlainPlanner() {
    }

    /** @return the present results of the plain-wire keys in the range, bass to treble */
    public static List<NoteResult> plannedKeys(ScaleAnalysis present, KeyRange range) {
        return PlannedKeys.results(present, range, false);
    }

    /**
     * The tension target for the plain keys of a range.
     *
     * @param perSection one smooth trend per section, joined continuously (needs a {@link TargetSpec.Loess})
     * @throws PlanNotPossible when the range holds no plain keys
     */
    public static TargetCurve target(ScaleAnalysis present, KeyRange range, TargetSpec spec, boolean perSection) {
        return PlannedKeys.target(present, range, spec, TargetQuantity.TENSION, perSection, false);
    }

    /**
     * @param present the analysis of the present scale (its settings are used throughout)
     * @param range   the keys to plan; wound keys in it are skipped
     * @param target  per-string tension target, N, covering every plain key of the range
     * @param options sizes, maximum percent of breaking strength, costs
     * @return the proposal; the present scale is not changed
     * @throws PlanNotPossible when no sizes meet the constraints, with the reasons
     */
    public static Proposal plan(ScaleAnalysis present, KeyRange range, TargetCurve target, PlainPlanOptions options) {
        Scale scale = present.scale();
        AnalysisSettings settings = present.settings();
        List<Note> notes = scale.notes();
        List<NoteResult> results = present.notes();
        PlannedKeys planned = PlannedKeys.select(present, range, false, target);
        List<Integer> idx = planned.index();
        List<Integer> skipped = planned.skipped();
        List<CoreWire> sizes = options.sizes();
        int n = idx.size();
        int m = sizes.size();
        NoteResult[][] trial = new NoteResult[n][m];
        double[][] cost = new double[n][m];
        double max = options.maxBreakPct();
        for (int k = 0; k < n; k++) {
            Note note = notes.get(idx.get(k));
            double t = target.at(note.key());
            for (int j = 0; j < m; j++) {
                NoteResult r = NoteCalculator.compute(note.withWire(sizes.get(j)), scale.pitch(), settings);
                trial[k][j] = r;
                double dev = r.tension() / t - 1.0;
                cost[k][j] = r.breakPct() <= max && r.tension() > 0 ? dev * dev : Double.POSITIVE_INFINITY;
            }
        }
        Bounds bounds = bounds(notes, idx);
        applyBounds(cost, sizes, bounds);
        double limit = settings.neighbourStepPct() / 100.0;
        boolean[] adjacent = new boolean[n];
        for (int k = 1; k < n; k++) {
            adjacent[k] = idx.get(k) == idx.get(k - 1) + 1;
        }
        edgeSteps(cost, trial, results, idx, limit, options.stepCost());
        ChoiceChain.StepCost step = options.stepCost() == 0 ? null : (k, i, j) -> {
            if (!adjacent[k]) {
                return 0;
            }
            return excessCost(trial[k - 1][i].tension(), trial[k][j].tension(), limit, options.stepCost());
        };
        ChoiceChain.Result best = ChoiceChain.monotone(cost, options.changeCost(), step);
        if (best == null) {
            throw new PlanNotPossible(whyNot(notes, idx, trial, cost, sizes, bounds, max));
        }
        List<Note> newNotes = new ArrayList<>(notes);
        for (int k = 0; k < n; k++) {
            Note old = notes.get(idx.get(k));
            CoreWire w = sizes.get(best.choice()[k]);
            if (Math.abs(w.diameter() - old.wire().diameter()) > 1e-9) {
                newNotes.set(idx.get(k), old.withWire(w));
            }
        }
        ScaleAnalysis after = ScaleAnalyzer.analyze(scale.withNotes(newNotes), settings);
        List<KeyChange> changes = new ArrayList<>();
        Set<Integer> plannedKeys = new HashSet<>();
        for (int i : idx) {
            Note before = notes.get(i);
            NoteResult a = after.notes().get(i);
            double t = target.at(before.key());
            changes.add(new KeyChange(before, after.scale().notes().get(i), results.get(i), a, t,
                    100.0 * (a.tension() / t - 1.0)));
            plannedKeys.add(before.key());
        }
        List<StepCheck> steps = StepSurvey.survey(present, after, plannedKeys, settings.neighbourStepPct());
        List<String> limits = new ArrayList<>();
        for (StepCheck s : steps) {
            if (!s.withinLimit()) {
                limits.add(whyStep(s, notes, idx, trial, cost, sizes, after, options));
            }
        }
        List<String> remarks = new ArrayList<>();
        if (!skipped.isEmpty()) {
            remarks.add(Words.keys(skipped) + ": wound strings, skipped (the plain-wire planner plans plain wire only)");
        }
        remarks.addAll(deviationNotes(changes, sizes, best.choice(), cost, settings.neighbourStepPct()));
        cautionNote(changes, settings).ifPresent(remarks::add);
        return new Proposal("plain wire", range, present, after, TargetQuantity.TENSION, target, changes, steps, max,
                remarks, limits);
    }

    /**
     * Adds to the first and last planned keys the cost of their step against an unplanned
     * neighbour just outside (which keeps its present tension).
     */
    static void edgeSteps(double[][] cost, NoteResult[][] trial, List<NoteResult> present, List<Integer> idx,
                          double limit, double stepCost) {
        if (stepCost == 0) {
            return;
        }
        int n = idx.size();
        int first = idx.get(0);
        int last = idx.get(n - 1);
        for (int j = 0; j < cost[0].length; j++) {
            if (first > 0 && cost[0][j] < Double.POSITIVE_INFINITY) {
                cost[0][j] += excessCost(present.get(first - 1).tension(), trial[0][j].tension(), limit, stepCost);
            }
        }
        for (int j = 0; j < cost[n - 1].length; j++) {
            if (last + 1 < present.size() && cost[n - 1][j] < Double.POSITIVE_INFINITY) {
                cost[n - 1][j] += excessCost(trial[n - 1][j].tension(), present.get(last + 1).tension(), limit,
                        stepCost);
            }
        }
    }

    /** @return stepCost × the fraction by which the step from {@code lower} to {@code upper} exceeds the limit */
    static double excessCost(double lower, double upper, double limit, double stepCost) {
        double excess = Math.abs(upper / lower - 1.0) - limit;
        return excess > 0 ? stepCost * excess : 0;
    }

    /** The wire of the unplanned plain neighbours just outside the planned keys, which the plan must fit. */
    private record Bounds(Note below, Note above) {
    }

    private static Bounds bounds(List<Note> notes, List<Integer> idx) {
        int first = idx.get(0);
        int last = idx.get(idx.size() - 1);
        Note below = first > 0 && !notes.get(first - 1).isWound() ? notes.get(first - 1) : null;
        Note above = last + 1 < notes.size() && !notes.get(last + 1).isWound() ? notes.get(last + 1) : null;
        return new Bounds(below, above);
    }

    private static void applyBounds(double[][] cost, List<CoreWire> sizes, Bounds b) {
        int n = cost.length;
        for (int j = 0; j < sizes.size(); j++) {
            double d = sizes.get(j).diameter();
            if (b.below() != null && d > b.below().wire().diameter() + 1e-9) {
                cost[0][j] = Double.POSITIVE_INFINITY;
            }
            if (b.above() != null && d < b.above().wire().diameter() - 1e-9) {
                cost[n - 1][j] = Double.POSITIVE_INFINITY;
            }
        }
    }

    /** Reasons why no plan exists, each naming the key and what limits it. */
    private static List<String> whyNot(List<Note> notes, List<Integer> idx, NoteResult[][] trial, double[][] cost,
                                       List<CoreWire> sizes, Bounds bounds, double max) {
        List<String> reasons = new ArrayList<>();
        int m = sizes.size();
        for (int k = 0; k < idx.size(); k++) {
            int leastJ = 0;
            boolean anyUnder = false;
            for (int j = 0; j < m; j++) {
                if (trial[k][j].breakPct() < trial[k][leastJ].breakPct()) {
                    leastJ = j;
                }
                anyUnder |= trial[k][j].breakPct() <= max && trial[k][j].tension() > 0;
            }
            if (!anyUnder) {
                Note note = notes.get(idx.get(k));
                NoteResult r = trial[k][leastJ];
                reasons.add(String.format(Locale.ROOT, "%s: even the least stressed wire listed (%s) is at %s of "
                        + "breaking strength, over the maximum %s; plain-wire stress is set by the speaking length "
                        + "(%s) and the pitch (%.1f Hz), not by the wire size, so only a shorter speaking length, a "
                        + "lower pitch or a higher maximum can bring it under", Words.key(note.key()),
                        Words.wire(sizes.get(leastJ)), Words.pct(r.breakPct()), Words.pct(max),
                        Words.mm(note.speakingLength()), r.frequency()));
            }
        }
        if (!reasons.isEmpty()) {
            return reasons;
        }
        int k = ChoiceChain.firstUnreachable(cost);
        Note note = notes.get(idx.get(Math.max(k, 0)));
        if (k == 0 && bounds.below() != null) {
            reasons.add(String.format(Locale.ROOT, "%s may be no thicker than %s on %s just below the planned keys "
                    + "(wire never grows toward the treble), but every wire that thin or thinner is over the maximum "
                    + "%s or not in the list", Words.key(note.key()), Words.wire(bounds.below().wire()),
                    Words.key(bounds.below().key()), Words.pct(max)));
        } else if (k == idx.size() - 1 && bounds.above() != null) {
            reasons.add(String.format(Locale.ROOT, "%s may be no thinner than %s on %s just above the planned keys "
                    + "(wire never grows toward the treble), but no wire that thick or thicker is under the maximum "
                    + "%s on every planned key below it", Words.key(note.key()), Words.wire(bounds.above().wire()),
                    Words.key(bounds.above().key()), Words.pct(max)));
        } else {
            reasons.add(String.format(Locale.ROOT, "no wire in the list fits %s: it must be no thicker than the wire "
                    + "of the key below it (wire never grows toward the treble), but the wires that thin are over "
                    + "the maximum %s or not in the list (%d sizes, %s to %s)", Words.key(note.key()), Words.pct(max),
                    sizes.size(), Words.wire(sizes.get(0)), Words.wire(sizes.get(sizes.size() - 1))));
        }
        return reasons;
    }

    /** Why a neighbour step over the limit remains after the plan, and what limits it. */
    private static String whyStep(StepCheck s, List<Note> notes, List<Integer> idx, NoteResult[][] trial,
                                  double[][] cost, List<CoreWire> sizes, ScaleAnalysis after, PlainPlanOptions o) {
        int lowerKey = keyBefore(after, s.afterKey());
        int upperKey = s.afterKey();
        int kLo = idx.indexOf(indexOf(notes, lowerKey));
        int kHi = idx.indexOf(indexOf(notes, upperKey));
        List<NoteResult> lowOptions = options(kLo, trial, cost, after, lowerKey);
        List<NoteResult> highOptions = options(kHi, trial, cost, after, upperKey);
        double bestAbs = Double.POSITIVE_INFINITY;
        NoteResult bestLo = null;
        NoteResult bestHi = null;
        for (NoteResult lo : lowOptions) {
            for (NoteResult hi : highOptions) {
                if (hi.coreDiameter() <= lo.coreDiameter() + 1e-9) {
                    double st = Math.abs(StepSurvey.stepPct(lo, hi));
                    if (st < bestAbs) {
                        bestAbs = st;
                        bestLo = lo;
                        bestHi = hi;
                    }
                }
            }
        }
        Note lowNote = notes.get(indexOf(notes, lowerKey));
        Note highNote = notes.get(indexOf(notes, upperKey));
        String where = String.format(Locale.ROOT, "step %s from %s to %s (%s)", Words.signedPct(s.afterPct()),
                Words.key(lowerKey), Words.key(upperKey), Words.where(s));
        if (bestLo == null) {
            return where + ": no pair of listed wires under the maximum fits these two keys";
        }
        if (bestAbs <= s.limitPct() + 1e-9) {
            return String.format(Locale.ROOT, "%s: a step of %s is possible here, but the plan traded it for "
                    + "closeness to the target and fewer size changes (change cost %s); a lower change cost or "
                    + "another target may remove it", where, Words.pct(bestAbs), Words.trim(o.changeCost()));
        }
        boolean sameWire = Math.abs(bestLo.coreDiameter() - bestHi.coreDiameter()) < 1e-9;
        double stepSame = StepSurvey.stepPct(bestLo, bestHi);
        if (sameWire && stepSame < 0) {
            return String.format(Locale.ROOT, "%s: with the same wire on both keys the tension still falls %s, "
                    + "because the speaking length drops from %s to %s; a smaller step would need a thicker wire on "
                    + "%s, and wire never grows toward the treble (a smoother speaking length here would remove it)",
                    where, Words.pct(-stepSame), Words.mm(lowNote.speakingLength()),
                    Words.mm(highNote.speakingLength()), Words.key(upperKey));
        }
        if (sameWire) {
            return String.format(Locale.ROOT, "%s: the tension rises %s even with the same wire, because the "
                    + "speaking length runs %s to %s; the thinner wires that would even it are over the maximum "
                    + "or not in the list", where, Words.pct(stepSame), Words.mm(lowNote.speakingLength()),
                    Words.mm(highNote.speakingLength()));
        }
        return String.format(Locale.ROOT, "%s: the size list is too coarse here; the closest listed wires (%s on "
                + "%s, %s on %s) still step %s", where, Words.wire(coreOf(bestLo, sizes, notes, lowerKey)),
                Words.key(lowerKey), Words.wire(coreOf(bestHi, sizes, notes, upperKey)),
                Words.key(upperKey), Words.signedPct(StepSurvey.stepPct(bestLo, bestHi)));
    }

    private static CoreWire coreOf(NoteResult r, List<CoreWire> sizes, List<Note> notes, int key) {
        for (CoreWire w : sizes) {
            if (Math.abs(w.diameter() - r.coreDiameter()) < 1e-9) {
                return w;
            }
        }
        return notes.get(indexOf(notes, key)).wire();
    }

    /** The results a key may take: its allowed listed wires when planned, else its present wire. */
    private static List<NoteResult> options(int k, NoteResult[][] trial, double[][] cost, ScaleAnalysis after, int key) {
        List<NoteResult> list = new ArrayList<>();
        if (k < 0) {
            list.add(after.result(key).orElseThrow());
            return list;
        }
        for (int j = 0; j < trial[k].length; j++) {
            if (cost[k][j] < Double.POSITIVE_INFINITY) {
                list.add(trial[k][j]);
            }
        }
        return list;
    }

    private static int keyBefore(ScaleAnalysis a, int key) {
        List<NoteResult> r = a.notes();
        for (int i = 1; i < r.size(); i++) {
            if (r.get(i).key() == key) {
                return r.get(i - 1).key();
            }
        }
        throw new IllegalStateException("no key below " + key);
    }

    private static int indexOf(List<Note> notes, int key) {
        for (int i = 0; i < notes.size(); i++) {
            if (notes.get(i).key() == key) {
                return i;
            }
        }
        return -1;
    }

    /** Why a planned key lies far from its target. */
    private enum FarReason {
        HELD_BY_KEY_BELOW, HELD_BY_KEY_ABOVE, LIST_RUNS_OUT, OVER_MAXIMUM, TRADED
    }

    /**
     * Notes on runs of planned keys further from the target than {@code limitPct}, with what
     * holds each run there: wire that may not grow toward the treble, the end of the size list,
     * the maximum, or the trade against size changes and steps.
     */
    static List<String> deviationNotes(List<KeyChange> changes, List<CoreWire> sizes, int[] choice, double[][] cost,
                                       double limitPct) {
        List<String> out = new ArrayList<>();
        int n = changes.size();
        FarReason[] why = new FarReason[n];
        for (int k = 0; k < n; k++) {
            double dev = changes.get(k).deviationPct();
            if (Math.abs(dev) <= limitPct) {
                continue;
            }
            int j = choice[k];
            int better = dev < 0 ? j - 1 : j + 1; // thicker wire is a lower index
            if (better < 0 || better >= sizes.size()) {
                why[k] = FarReason.LIST_RUNS_OUT;
            } else if (cost[k][better] == Double.POSITIVE_INFINITY) {
                why[k] = FarReason.OVER_MAXIMUM;
            } else if (dev < 0 && k > 0 && better < choice[k - 1]) {
                why[k] = FarReason.HELD_BY_KEY_BELOW;
            } else if (dev > 0 && k < n - 1 && better > choice[k + 1]) {
                why[k] = FarReason.HELD_BY_KEY_ABOVE;
            } else {
                why[k] = FarReason.TRADED;
            }
        }
        int k = 0;
        while (k < n) {
            if (why[k] == null) {
                k++;
                continue;
            }
            int end = k;
            while (end + 1 < n && why[end + 1] == why[k]
                    && Math.signum(changes.get(end + 1).deviationPct()) == Math.signum(changes.get(k).deviationPct())) {
                end++;
            }
            List<Integer> keys = new ArrayList<>();
            double lo = Double.POSITIVE_INFINITY;
            double hi = 0;
            for (int i = k; i <= end; i++) {
                keys.add(changes.get(i).key());
                lo = Math.min(lo, Math.abs(changes.get(i).deviationPct()));
                hi = Math.max(hi, Math.abs(changes.get(i).deviationPct()));
            }
            boolean under = changes.get(k).deviationPct() < 0;
            String run = String.format(Locale.ROOT, "%s %s %.1f to %.1f %% %s the target", Words.keys(keys),
                    keys.size() == 1 ? "is" : "are", lo, hi, under ? "under" : "over");
            if (keys.size() == 1) {
                run = String.format(Locale.ROOT, "%s is %.1f %% %s the target", Words.keys(keys), hi,
                        under ? "under" : "over");
            }
            String thicker = under ? "a thicker" : "a thinner";
            String them = keys.size() == 1 ? "it" : "them";
            out.add(run + ": " + switch (why[k]) {
                case HELD_BY_KEY_BELOW -> thicker + " wire would bring " + them + " nearer, but wire never grows "
                        + "toward the treble and " + Words.key(changes.get(k - 1).key()) + " below has "
                        + Words.wire(changes.get(k - 1).after().wire());
                case HELD_BY_KEY_ABOVE -> thicker + " wire would bring " + them + " nearer, but wire never grows "
                        + "toward the treble and " + Words.key(changes.get(end + 1).key()) + " above has "
                        + Words.wire(changes.get(end + 1).after().wire());
                case LIST_RUNS_OUT -> "the size list has no " + (under ? "thicker" : "thinner") + " wire";
                case OVER_MAXIMUM -> thicker + " wire would be over the maximum percent of breaking strength";
                case TRADED -> thicker + " wire would bring " + them + " nearer, but the plan traded that for "
                        + "fewer size changes and smaller steps";
            });
            k = end + 1;
        }
        return out;
    }

    /** A note on planned strings left in the caution band or above: their stress is set by length and pitch. */
    static java.util.Optional<String> cautionNote(List<KeyChange> changes, AnalysisSettings settings) {
        List<Integer> keys = new ArrayList<>();
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (KeyChange c : changes) {
            double p = c.afterResult().breakPct();
            if (p >= settings.bands().caution() && !c.afterResult().wound()) {
                keys.add(c.key());
                lo = Math.min(lo, p);
                hi = Math.max(hi, p);
            }
        }
        if (keys.isEmpty()) {
            return java.util.Optional.empty();
        }
        return java.util.Optional.of(String.format(Locale.ROOT, "%s stay at or above the caution band (%s to %s of "
                + "breaking strength, caution from %s): plain-wire stress is set by the speaking length and the "
                + "pitch, not by the wire size, so another size cannot bring them down; a shorter speaking length "
                + "would", Words.keys(keys), Words.pct(lo), Words.pct(hi), Words.pct(settings.bands().caution())));
    }
}
