package org.scalewright.design.rescale;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import org.scalewright.design.SmoothTrend;
import org.scalewright.model.CoreWire;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Materials;
import org.scalewright.model.Note;
import org.scalewright.model.Wrap;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.NoteCalculator;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.Pitch;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;
import org.scalewright.physics.StringPhysics;

/**
 * Designs the wound strings of a range. For each wound key and core, the wrap diameter(s) come
 * from the mass the target tension needs, stiffness and helix included ({@link WrapSolver}); the
 * exact wrap is then rounded to the wrap wire available, trying the listed wires either side of
 * it. Where a single wrap would pass a settable diameter the string is double-wound. Plain keys
 * in the range are skipped with a note.
 *
 * <p>Which core and which rounding each key gets — or whether it keeps its present string — is
 * settled for all planned keys at once by an exact dynamic programme ({@link ChoiceChain})
 * minimising Σ ((T − T*)/T*)² + ¼ Σ (ln B/B*)² over keys whose core is chosen
 * + {@link #SMOOTH_WEIGHT} Σ (T_k/T*_k − T_{k−1}/T*_{k−1})² + change cost × core changes
 * + step cost × Σ (fraction by which a neighbour step exceeds the limit), with every core at or
 * under the maximum percent of breaking strength and chosen cores never growing toward the treble
 * (so core changes + 1 is the number of distinct cores). B* is a robust smooth trend of the B
 * the present cores would have at the target tension.
 *
 * <p>Never rougher than its input: where the plan's largest neighbour step in per-string tension
 * or largest deviation from the target inside the planned keys passes the present strings', the
 * key that makes it so most keeps its present string and the programme runs again.
 *
 * <p>A key whose exact wrap lies beyond the listed wire takes the end wire only within the
 * neighbour-step limit of its target; otherwise the wrap wire is named too thin or too thick and,
 * with no other option, the plan is not possible ({@link PlanNotPossible}).
 *
 * <p>"Join the break": the tension target is made continuous through each change of section
 * among the planned keys ({@link TargetCurve#join}), and the cores of the n keys either side are
 * chosen so that B follows a log-linear line from the key below the joined keys to the key
 * above them, as closely as the core list, the maximum and the wrap wire allow.
 */
public final class WoundPlanner {
    /**
     * Weight of the squared log deviation of B from its aim against the squared relative
     * deviation of tension from its target, for keys whose core is chosen: tension first,
     * B as smooth as the cores then allow.
     */
    static final double B_WEIGHT = 0.25;
    /**
     * Weight of the squared difference between neighbours' fractions of their targets: a plan whose
     * strings lie off the target lies off it alike from key to key, so the tension curve keeps the
     * target's shape (a plain choice, no source).
     */
    static final double SMOOTH_WEIGHT = 1.0;

    private WoundPlanner() {
    }

    /**
     * The cores the designer chooses from by default: every present core of the wound keys in the range
     * and every music-wire size between the thinnest and the thickest of them.
     *
     * @param musicWire music-wire diameters, m
     * @return core diameters, m, thickest first, each once
     */
    public static List<Double> presentCores(ScaleAnalysis present, KeyRange range, List<Double> musicWire) {
        TreeSet<Double> set = new TreeSet<>();
        for (NoteResult r : plannedKeys(present, range)) {
            set.add(present.scale().notes().get(present.notes().indexOf(r)).wire().diameter());
        }
        if (set.isEmpty()) {
            return List.of();
        }
        double lo = set.first();
        double hi = set.last();
        for (double d : musicWire) {
            if (d >= lo - 1e-9 && d <= hi + 1e-9) {
                set.add(d);
            }
        }
        List<Double> out = new ArrayList<>();
        for (double d : set.descendingSet()) {
            if (out.isEmpty() || out.get(out.size() - 1) - d > 1e-9) {
                out.add(d);
            }
        }
        return out;
    }

    /** @return the present results of the wound keys in the range, bass to treble */
    public static List<NoteResult> plannedKeys(ScaleAnalysis present, KeyRange range) {
        return PlannedKeys.results(present, range, true);
    }

    /**
     * The target for the wound keys of a range, from their present values.
     *
     * @param quantity   tension or core percent of breaking strength
     * @param perSection one smooth trend per section, joined continuously (needs a {@link TargetSpec.Loess})
     * @throws PlanNotPossible when the range holds no wound keys
     */
    public static TargetCurve target(ScaleAnalysis present, KeyRange range, TargetSpec spec, TargetQuantity quantity,
                                     boolean perSection) {
        return PlannedKeys.target(present, range, spec, quantity, perSection, true);
    }

    /**
     * @param present the analysis of the present scale (its settings are used throughout)
     * @param range   the keys to design; plain keys in it are skipped
     * @param target  the target in {@code options.quantity()}, covering every wound key of the range
     * @param options wrap wire, winding, cores, maximum, join
     * @return the proposal; the present scale is not changed
     * @throws PlanNotPossible when a key cannot meet its target under the constraints, with the reasons
     */
    public static Proposal plan(ScaleAnalysis present, KeyRange range, TargetCurve target, WoundPlanOptions options) {
        List<Note> notes = present.scale().notes();
        PlannedKeys planned = PlannedKeys.select(present, range, true, target);
        List<Integer> idx = planned.index();
        List<Integer> skipped = planned.skipped();
        List<Integer> breaks = breaks(notes, idx);
        TargetCurve aim = target;
        if (options.joinBreakKeys() > 0) {
            for (int p : breaks) {
                aim = joinAt(aim, notes.get(idx.get(p - 1)).key(), notes.get(idx.get(p)).key(), options.joinBreakKeys());
            }
        }
        Job job = new Job(present, notes, idx, options, aim);
        job.settleCores(breaks);
        job.buildOptions();
        Note[] chosen = job.solve();
        double[] input = job.roughness(null);

        List<Note> newNotes = new ArrayList<>(notes);
        for (int k = 0; k < idx.size(); k++) {
            newNotes.set(idx.get(k), chosen[k]);
        }
        ScaleAnalysis after = ScaleAnalyzer.analyze(present.scale().withNotes(newNotes), present.settings());
        List<KeyChange> changes = new ArrayList<>();
        Set<Integer> plannedKeys = new HashSet<>();
        for (int k = 0; k < idx.size(); k++) {
            int i = idx.get(k);
            NoteResult a = after.notes().get(i);
            double t = aim.at(notes.get(i).key());
            changes.add(new KeyChange(notes.get(i), after.scale().notes().get(i), present.notes().get(i), a, t,
                    100.0 * (options.quantity().of(a) / t - 1.0)));
            plannedKeys.add(notes.get(i).key());
        }
        List<StepCheck> steps = StepSurvey.survey(present, after, plannedKeys, present.settings().neighbourStepPct());
        List<String> limits = new ArrayList<>();
        for (StepCheck s : steps) {
            if (!s.withinLimit()) {
                limits.add(whyStep(s, changes, after, options));
            }
        }
        List<String> remarks = new ArrayList<>();
        if (!skipped.isEmpty()) {
            remarks.add(Words.keys(skipped) + ": plain wire, skipped (the wound-string designer plans wound strings only)");
        }
        List<Integer> kept = new ArrayList<>();
        for (int k = 0; k < idx.size(); k++) {
            if (job.forced[k]) {
                kept.add(notes.get(idx.get(k)).key());
            }
        }
        if (!kept.isEmpty()) {
            remarks.add(Words.keys(kept) + ": present strings kept: the designed ones would have left the planned keys "
                    + "rougher than they are (a larger neighbour step or a larger deviation from the target)");
        }
        remarks.add(roughnessNote(input, changes, idx, options));
        if (job.rougherThanInput) {
            limits.add("the planned keys are rougher than the present strings, and the present strings that would "
                    + "help cannot be kept: their cores are not in the core list given (" + mmList(options.cores())
                    + "); add them to the list, or plan with the present cores");
        }
        for (int p : breaks) {
            remarks.add(breakNote(present, after, notes.get(idx.get(p - 1)).key(), notes.get(idx.get(p)).key(),
                    options.joinBreakKeys()));
        }
        if (breaks.isEmpty() && options.joinBreakKeys() > 0) {
            remarks.add("no break to join: the planned wound keys hold no change of section label");
        }
        return new Proposal("wound strings", range, present, after, options.quantity(), aim, changes, steps,
                options.maxBreakPct(), remarks, limits);
    }

    /** @return the largest neighbour step and deviation inside the planned keys, before → after */
    private static String roughnessNote(double[] input, List<KeyChange> changes, List<Integer> idx,
                                        WoundPlanOptions o) {
        double step = 0;
        double dev = 0;
        for (int k = 0; k < changes.size(); k++) {
            dev = Math.max(dev, Math.abs(changes.get(k).deviationPct()));
            if (k > 0 && idx.get(k) == idx.get(k - 1) + 1) {
                step = Math.max(step, Math.abs(StepSurvey.stepPct(changes.get(k - 1).afterResult(),
                        changes.get(k).afterResult())));
            }
        }
        return String.format(Locale.ROOT, "inside the planned keys: largest neighbour step in per-string tension "
                + "%.1f %% → %.1f %%, largest deviation from the target %.1f %% → %.1f %% (a plan is never rougher "
                + "than the strings it starts from)", 100 * input[0], step, 100 * input[1], dev);
    }

    /** @return positions p in the planned list where planned p − 1 and p are scale neighbours of different sections */
    private static List<Integer> breaks(List<Note> notes, List<Integer> idx) {
        List<Integer> out = new ArrayList<>();
        for (int p = 1; p < idx.size(); p++) {
            if (idx.get(p) == idx.get(p - 1) + 1
                    && !notes.get(idx.get(p)).section().equals(notes.get(idx.get(p - 1)).section())) {
                out.add(p);
            }
        }
        return out;
    }

    private static TargetCurve joinAt(TargetCurve t, int lowerKey, int upperKey, int blend) {
        TargetCurve joined = TargetCurve.join(t.part(t.firstKey(), lowerKey), t.part(upperKey, t.lastKey()), blend, 0.5);
        return joined.describedAs(t.description() + ", joined through the break " + lowerKey + "/" + upperKey);
    }

    /** The state of one design run. */
    private static final class Job {
        final ScaleAnalysis present;
        final AnalysisSettings settings;
        final Materials materials;
        final List<Note> notes;
        final List<Integer> idx;
        final WoundPlanOptions options;
        final TargetCurve target;
        final int n;
        final double limit;
        boolean[] free;
        double[] aimB;
        /** core diameters with a wire index: those offered and every present core, thickest first */
        List<Double> cores;
        /** core diameters a key whose core is chosen may take, thickest first */
        List<Double> offered;
        /** per key: the option that keeps the present string */
        int[] keep;
        /** per key: the plan keeps the present string (it was better there) */
        boolean[] forced;
        /** per key: the present string may be kept (its core is among those the key may take) */
        boolean[] keepable;
        /** the plan stays rougher than its input where only present strings outside the core list would help */
        boolean rougherThanInput;
        boolean monotone;
        /** per key: the candidate notes, their results, costs and core indices */
        List<List<Note>> optNotes;
        List<List<NoteResult>> optResults;
        double[][] cost;
        int[][] wire;
        String[] problem;

        Job(ScaleAnalysis present, List<Note> notes, List<Integer> idx, WoundPlanOptions options, TargetCurve target) {
            this.present = present;
            this.settings = present.settings();
            this.materials = settings.materials();
            this.notes = notes;
            this.idx = idx;
            this.options = options;
            this.target = target;
            this.n = idx.size();
            this.limit = settings.neighbourStepPct() / 100.0;
        }

        Note note(int k) {
            return notes.get(idx.get(k));
        }

        /** @return the tension the target asks of key k with core diameter d, N */
        double targetTension(int k, double d) {
            double v = target.at(note(k).key());
            return options.quantity() == TargetQuantity.TENSION ? v
                    : v / 100.0 * settings.strength().strengthAt(d) * StringPhysics.area(d);
        }

        double stiffness(int k, double d) {
            return StringPhysics.stiffness(d, note(k).speakingLength(), materials.youngsModulus());
        }

        /** Decides which keys' cores are free, what B they aim at and which cores are tried. */
        void settleCores(List<Integer> breaks) {
            free = new boolean[n];
            boolean choose = !options.cores().isEmpty();
            boolean join = options.joinBreakKeys() > 0 && !breaks.isEmpty();
            monotone = choose || join;
            double[] base = new double[n];
            for (int k = 0; k < n; k++) {
                double d = note(k).wire().diameter();
                base[k] = stiffness(k, d) / targetTension(k, d);
            }
            if (choose) {
                base = smoothLog(base);
                Arrays.fill(free, true);
            }
            aimB = base.clone();
            TreeSet<Double> tried = new TreeSet<>(options.cores());
            if (!choose) {
                for (int k = 0; k < n; k++) {
                    tried.add(note(k).wire().diameter());
                }
            }
            if (join) {
                for (int p : breaks) {
                    int loRef = Math.max(0, p - options.joinBreakKeys() - 1);
                    int hiRef = Math.min(n - 1, p + options.joinBreakKeys());
                    double kLo = note(loRef).key();
                    double span = note(hiRef).key() - kLo;
                    for (int k = loRef + 1; k < hiRef; k++) {
                        free[k] = true;
                        double t = (note(k).key() - kLo) / span;
                        aimB[k] = Math.exp(Math.log(base[loRef]) + t * (Math.log(base[hiRef]) - Math.log(base[loRef])));
                    }
                    if (!choose) {
                        double thin = note(hiRef).wire().diameter();
                        double thick = note(loRef).wire().diameter();
                        for (double c = thin; c <= thick + 1e-9; c += WoundPlanOptions.JOIN_CORE_STEP) {
                            tried.add(Math.round(c * 1e7) / 1e7);
                        }
                    }
                }
            }
            offered = distinctDescending(tried);
            for (int k = 0; k < n; k++) {
                tried.add(note(k).wire().diameter());
            }
            cores = distinctDescending(tried);
        }

        private static List<Double> distinctDescending(TreeSet<Double> set) {
            List<Double> out = new ArrayList<>();
            for (double d : set.descendingSet()) {
                if (out.isEmpty() || out.get(out.size() - 1) - d > 1e-9) {
                    out.add(d);
                }
            }
            return out;
        }

        int coreIndex(double d) {
            for (int j = 0; j < cores.size(); j++) {
                if (Math.abs(cores.get(j) - d) < 1e-9) {
                    return j;
                }
            }
            throw new IllegalStateException("core " + d + " not among those tried");
        }

        /** Builds every key's options: each core it may take × the listed wraps nearest the exact one. */
        void buildOptions() {
            optNotes = new ArrayList<>();
            optResults = new ArrayList<>();
            cost = new double[n][];
            wire = new int[n][];
            problem = new String[n];
            keep = new int[n];
            forced = new boolean[n];
            keepable = new boolean[n];
            for (int k = 0; k < n; k++) {
                List<Note> ns = new ArrayList<>();
                List<NoteResult> rs = new ArrayList<>();
                List<Double> cs = new ArrayList<>();
                List<Integer> ws = new ArrayList<>();
                Note present = note(k);
                List<Double> mine = free[k] ? offered : List.of(present.wire().diameter());
                String nearestWhy = null;
                double nearestGap = Double.POSITIVE_INFINITY;
                int overMax = 0;
                NoteResult leastStressed = null;
                double leastStressedTarget = 0;
                for (double d : mine) {
                    CoreWire core = Math.abs(present.wire().diameter() - d) < 1e-9 ? present.wire()
                            : CoreWire.ofDiameter(d);
                    double t = targetTension(k, d);
                    String why = wraps(k, core, t, ns, rs);
                    double gap = Math.abs(d - present.wire().diameter());
                    if (why != null && gap < nearestGap) {
                        nearestWhy = why;
                        nearestGap = gap;
                    }
                    while (cs.size() < ns.size()) {
                        NoteResult r = rs.get(cs.size());
                        ws.add(coreIndex(d));
                        if (r.breakPct() > options.maxBreakPct()) {
                            overMax++;
                            if (leastStressed == null || r.breakPct() < leastStressed.breakPct()) {
                                leastStressed = r;
                                leastStressedTarget = t;
                            }
                            cs.add(Double.POSITIVE_INFINITY);
                            continue;
                        }
                        double dev = r.tension() / t - 1.0;
                        double c = dev * dev;
                        if (free[k]) {
                            double lb = Math.log(r.inharmonicity() / aimB[k]);
                            c += B_WEIGHT * lb * lb;
                        }
                        cs.add(c);
                    }
                }
                if (cs.stream().allMatch(c -> c == Double.POSITIVE_INFINITY)) {
                    problem[k] = overMax == 0 && nearestWhy != null ? nearestWhy : overMax > 0
                            ? String.format(Locale.ROOT, "%s: %s %.3f mm would be at %s of breaking strength "
                                    + "even with the lightest listed wrap near its target (%.0f N), over the maximum "
                                    + "%s; a thicker core or a lower target is needed", Words.key(present.key()),
                                    free[k] ? "even the least stressed core tried," : "its core",
                                    leastStressed.coreDiameter() * 1e3, Words.pct(leastStressed.breakPct()),
                                    leastStressedTarget, Words.pct(options.maxBreakPct()))
                            : String.format(Locale.ROOT, "%s: none of the cores tried (%s) can carry a wrap for its "
                                    + "target; each alone is already at or above it", Words.key(present.key()),
                                    mmList(mine));
                }
                // the present string, kept as it is: the plan may keep it where it is better
                NoteResult now = this.present.notes().get(idx.get(k));
                keep[k] = ns.size();
                ns.add(present);
                rs.add(now);
                ws.add(coreIndex(present.wire().diameter()));
                double t0 = targetTension(k, present.wire().diameter());
                double dev0 = now.tension() / t0 - 1.0;
                keepable[k] = mine.stream().anyMatch(x -> Math.abs(x - present.wire().diameter()) < 1e-9);
                double c0 = now.breakPct() > options.maxBreakPct() || !keepable[k] ? Double.POSITIVE_INFINITY
                        : dev0 * dev0;
                if (free[k] && c0 < Double.POSITIVE_INFINITY) {
                    double lb = Math.log(now.inharmonicity() / aimB[k]);
                    c0 += B_WEIGHT * lb * lb;
                }
                cs.add(c0);
                optNotes.add(ns);
                optResults.add(rs);
                cost[k] = cs.stream().mapToDouble(Double::doubleValue).toArray();
                wire[k] = ws.stream().mapToInt(Integer::intValue).toArray();
            }
        }

        /**
         * @param muEffective the mass per length that tunes the note to its target, kg/m
         * @return the wound part's mass per length that gives it, the note's bare core ends (kept
         *         from the present string) counted as the analysis counts them
         */
        double woundPartMass(Note n0, double core, double muEffective) {
            Note.BareEnds bare = n0.bareEnds();
            if (!bare.any()) {
                return muEffective;
            }
            return StringPhysics.woundMassForEffective(muEffective,
                    StringPhysics.plainMassPerLength(core, materials.steelDensity()), n0.speakingLength(),
                    bare.front(), bare.back());
        }

        /**
         * Adds key k's listed-wire wraps on the given core to {@code ns}/{@code rs}.
         *
         * @return why none can be made, or null
         */
        String wraps(int k, CoreWire core, double t, List<Note> ns, List<NoteResult> rs) {
            Note n0 = note(k);
            double d = core.diameter();
            double f = Pitch.working(n0, present.scale().pitch());
            double kk = stiffness(k, d);
            double mu = woundPartMass(n0, d, WrapSolver.neededMassPerLength(t, n0.speakingLength(), f, kk));
            WindingRule rule = rule(n0.wrap(), d, mu);
            Optional<Wrap> exact = WrapSolver.exact(d, mu, rule, n0.wrap().metal(), materials);
            if (exact.isEmpty()) {
                double coreOnly = StringPhysics.tension(n0.speakingLength(),
                        StringPhysics.plainMassPerLength(d, materials.steelDensity()), f, kk);
                return String.format(Locale.ROOT, "%s: the core %.2f mm alone%s already gives %.0f N at pitch, at or "
                        + "above the target %.0f N; a thinner core or a higher target is needed", Words.key(n0.key()),
                        d * 1e3, rule.kind() == WindingRule.Kind.FIXED_INNER ? " with the fixed inner wrap" : "",
                        coreOnly, t);
            }
            Wrap w0 = exact.get();
            WrapWires list = options.wraps();
            if (!list.offers(w0.metal())) {
                return String.format(Locale.ROOT, "%s: the wrap wire (%s) holds no %s wire", Words.key(n0.key()),
                        list.description(), w0.metal().sheetName());
            }
            double thickest = list.thickest(w0.metal());
            double thinnest = list.thinnest(w0.metal());
            double widest = Math.max(w0.inner(), w0.outer());
            double narrowest = w0.isDouble() ? Math.min(w0.inner(), w0.outer()) : w0.inner();
            boolean beyond = widest > thickest * (1 + 1e-9) || narrowest < thinnest * (1 - 1e-9);
            int before = ns.size();
            NoteResult closest = null;
            for (Wrap w : WrapSolver.roundedCandidates(w0, d, mu, list, materials)) {
                Note candidate = keepLabels(n0, n0.withWire(core).withWrap(w));
                NoteResult r = NoteCalculator.computeAt(candidate, f, settings);
                if (!(r.tension() > 0)) {
                    continue;
                }
                if (closest == null || Math.abs(r.tension() / t - 1) < Math.abs(closest.tension() / t - 1)) {
                    closest = r;
                }
                // a wire at the end of the list stands in for one beyond it only within the neighbour-step limit
                if (beyond && Math.abs(r.tension() / t - 1.0) > limit) {
                    continue;
                }
                ns.add(candidate);
                rs.add(r);
            }
            if (ns.size() > before) {
                return null;
            }
            String wrapWords = w0.isDouble() ? String.format(Locale.ROOT, "%.2f + %.2f mm", w0.inner() * 1e3,
                    w0.outer() * 1e3) : String.format(Locale.ROOT, "%.2f mm", w0.inner() * 1e3);
            String with = closest == null ? "" : String.format(Locale.ROOT, "; with the nearest listed wrap it would "
                    + "be at %.0f N (%s)", closest.tension(), Words.signedPct(100 * (closest.tension() / t - 1)));
            if (widest > thickest * (1 + 1e-9)) {
                return String.format(Locale.ROOT, "%s: the wrap wire is too thin: the thickest listed wrap, %.2f mm, "
                        + "cannot make up the mass the target %.0f N needs on the core %.2f mm (it needs a wrap of %s)%s",
                        Words.key(n0.key()), thickest * 1e3, t, d * 1e3, wrapWords, with);
            }
            if (narrowest < thinnest * (1 - 1e-9)) {
                return String.format(Locale.ROOT, "%s: the wrap wire is too thick: the thinnest listed wrap, %.2f mm, "
                        + "puts more mass on the core %.2f mm than the target %.0f N allows (it needs a wrap of %s)%s",
                        Words.key(n0.key()), thinnest * 1e3, d * 1e3, t, wrapWords, with);
            }
            return String.format(Locale.ROOT, "%s: no listed wrap wire (%s) makes up the mass the target %.0f N needs",
                    Words.key(n0.key()), list.description(), t);
        }

        WindingRule rule(Wrap present, double d, double mu) {
            if (options.doubleAbove().isPresent()) {
                Optional<Wrap> single = WrapSolver.exact(d, mu, WindingRule.single(), present.metal(), materials);
                if (single.isPresent() && single.get().inner() > options.doubleAbove().getAsDouble()) {
                    return WindingRule.outerRatio(present.isDouble() ? present.outer() / present.inner()
                            : options.doubleRatio());
                }
                return WindingRule.single();
            }
            return present.isDouble() ? WindingRule.outerRatio(present.outer() / present.inner()) : WindingRule.single();
        }

        /** @return the chosen note per key */
        Note[] solve() {
            List<String> reasons = new ArrayList<>();
            for (String p : problem) {
                if (p != null) {
                    reasons.add(p);
                }
            }
            if (!reasons.isEmpty()) {
                throw new PlanNotPossible(reasons);
            }
            List<NoteResult> all = present.notes();
            int first = idx.get(0);
            int last = idx.get(n - 1);
            double stepCost = options.stepCost();
            if (stepCost > 0) {
                for (int j = 0; j < cost[0].length; j++) {
                    if (first > 0 && cost[0][j] < Double.POSITIVE_INFINITY) {
                        cost[0][j] += PlainPlanner.excessCost(all.get(first - 1).tension(),
                                optResults.get(0).get(j).tension(), limit, stepCost);
                    }
                }
                for (int j = 0; j < cost[n - 1].length; j++) {
                    if (last + 1 < all.size() && cost[n - 1][j] < Double.POSITIVE_INFINITY) {
                        cost[n - 1][j] += PlainPlanner.excessCost(optResults.get(n - 1).get(j).tension(),
                                all.get(last + 1).tension(), limit, stepCost);
                    }
                }
            }
            ChoiceChain.StepCost step = (k, i, j) -> {
                if (idx.get(k) != idx.get(k - 1) + 1) {
                    return 0;
                }
                NoteResult lo = optResults.get(k - 1).get(i);
                NoteResult hi = optResults.get(k).get(j);
                // smoothness: neighbours the same fraction off their targets (the tension curve follows the target's shape)
                double dLo = lo.tension() / targetTension(k - 1, lo.coreDiameter());
                double dHi = hi.tension() / targetTension(k, hi.coreDiameter());
                double smooth = SMOOTH_WEIGHT * (dHi - dLo) * (dHi - dLo);
                return smooth + (stepCost == 0 ? 0 : PlainPlanner.excessCost(lo.tension(), hi.tension(), limit, stepCost));
            };
            ChoiceChain.Allowed allowed = (k, i, j) -> !monotone || !free[k - 1] && !free[k]
                    || i == keep[k - 1] || j == keep[k] || wire[k - 1][i] <= wire[k][j];
            double[] input = roughness(null);
            while (true) {
                double[][] c = new double[n][];
                for (int k = 0; k < n; k++) {
                    c[k] = cost[k].clone();
                    if (forced[k]) {
                        Arrays.fill(c[k], Double.POSITIVE_INFINITY);
                        c[k][keep[k]] = 0;
                    }
                }
                ChoiceChain.Result r = ChoiceChain.solve(c, wire, options.changeCost(), step, allowed);
                if (r == null) {
                    throw new PlanNotPossible(List.of(String.format(Locale.ROOT, "no choice of cores (%s) keeps the "
                            + "cores from growing toward the treble while every core stays at or under the maximum %s "
                            + "at its target", mmList(offered), Words.pct(options.maxBreakPct()))));
                }
                int worse = rougherAt(r.choice(), input);
                if (worse < 0) {
                    Note[] out = new Note[n];
                    for (int k = 0; k < n; k++) {
                        out[k] = optNotes.get(k).get(r.choice()[k]);
                    }
                    return out;
                }
                forced[worse] = true;
            }
        }

        /**
         * The roughness of the planned keys: the largest neighbour step in per-string tension between
         * planned scale neighbours, and the largest deviation from the target.
         *
         * @param choice the option per key, or null for the present strings
         * @return {largest |step|, largest |deviation|}, fractions
         */
        double[] roughness(int[] choice) {
            double stepMax = 0;
            double devMax = 0;
            for (int k = 0; k < n; k++) {
                NoteResult r = optResults.get(k).get(choice == null ? keep[k] : choice[k]);
                devMax = Math.max(devMax, Math.abs(options.quantity().of(r) / target.at(note(k).key()) - 1));
                if (k > 0 && idx.get(k) == idx.get(k - 1) + 1) {
                    NoteResult lo = optResults.get(k - 1).get(choice == null ? keep[k - 1] : choice[k - 1]);
                    stepMax = Math.max(stepMax, Math.abs(r.tension() / lo.tension() - 1));
                }
            }
            return new double[] {stepMax, devMax};
        }

        /**
         * @return a key index where the plan is rougher than the input and the present string is not yet
         *         kept (the worst such key), or -1 when the plan is nowhere rougher than the input
         */
        int rougherAt(int[] choice, double[] input) {
            double[] plan = roughness(choice);
            if (plan[0] <= input[0] + 1e-12 && plan[1] <= input[1] + 1e-12) {
                return -1;
            }
            int worst = -1;
            double worstBy = 0;
            for (int k = 0; k < n; k++) {
                if (forced[k] || choice[k] == keep[k] || !keepable[k]) {
                    continue;
                }
                NoteResult r = optResults.get(k).get(choice[k]);
                double by = Math.abs(options.quantity().of(r) / target.at(note(k).key()) - 1) - input[1];
                if (k > 0 && idx.get(k) == idx.get(k - 1) + 1) {
                    NoteResult lo = optResults.get(k - 1).get(choice[k - 1]);
                    by = Math.max(by, Math.abs(r.tension() / lo.tension() - 1) - input[0]);
                }
                if (k + 1 < n && idx.get(k + 1) == idx.get(k) + 1) {
                    NoteResult hi = optResults.get(k + 1).get(choice[k + 1]);
                    by = Math.max(by, Math.abs(hi.tension() / r.tension() - 1) - input[0]);
                }
                if (by > worstBy) {
                    worstBy = by;
                    worst = k;
                }
            }
            if (worst < 0) {
                rougherThanInput = true;
            }
            return worst;
        }

        /** @return exp of a robust smooth trend of the logs */
        private double[] smoothLog(double[] v) {
            double[] keys = new double[v.length];
            double[] logs = new double[v.length];
            for (int k = 0; k < v.length; k++) {
                keys[k] = note(k).key();
                logs[k] = Math.log(v[k]);
            }
            double[] fit = SmoothTrend.robustFit(keys, logs, SmoothTrend.DEFAULT_BANDWIDTH,
                    SmoothTrend.DEFAULT_ROBUSTNESS_ITERATIONS).values();
            double[] out = new double[v.length];
            for (int k = 0; k < v.length; k++) {
                out[k] = Math.exp(fit[k]);
            }
            return out;
        }
    }

    /** Keeps the present core and wrap objects when unchanged, so an unchanged note stays equal. */
    private static Note keepLabels(Note present, Note designed) {
        Note out = designed;
        if (Math.abs(present.wire().diameter() - designed.wire().diameter()) < 1e-9) {
            out = out.withWire(present.wire());
        }
        Wrap p = present.wrap();
        Wrap d = designed.wrap();
        if (Math.abs(p.inner() - d.inner()) < 1e-10 && Math.abs(p.outer() - d.outer()) < 1e-10 && p.metal() == d.metal()) {
            out = out.withWrap(p);
        }
        return out;
    }

    private static String mmList(List<Double> metres) {
        List<String> s = new ArrayList<>();
        for (int i = metres.size() - 1; i >= 0; i--) {
            s.add(String.format(Locale.ROOT, "%.3f", metres.get(i) * 1e3).replaceAll("0$", ""));
        }
        return String.join(", ", s) + " mm";
    }

    private static String breakNote(ScaleAnalysis before, ScaleAnalysis after, int lowerKey, int upperKey, int join) {
        NoteResult bl = before.result(lowerKey).orElseThrow();
        NoteResult bu = before.result(upperKey).orElseThrow();
        NoteResult al = after.result(lowerKey).orElseThrow();
        NoteResult au = after.result(upperKey).orElseThrow();
        return String.format(Locale.ROOT, "break %d/%d (%s/%s)%s: tension %.0f → %.0f N before (%s), %.0f → %.0f N "
                + "after (%s); B %.2e → %.2e before (%s), %.2e → %.2e after (%s)", lowerKey, upperKey, bl.section(),
                bu.section(), join > 0 ? ", joined over " + join + " keys each side" : "", bl.tension(), bu.tension(),
                Words.signedPct(StepSurvey.stepPct(bl, bu)), al.tension(), au.tension(),
                Words.signedPct(StepSurvey.stepPct(al, au)), bl.inharmonicity(), bu.inharmonicity(),
                Words.signedPct(100 * (bu.inharmonicity() / bl.inharmonicity() - 1)), al.inharmonicity(),
                au.inharmonicity(), Words.signedPct(100 * (au.inharmonicity() / al.inharmonicity() - 1)));
    }

    /** Why a neighbour step over the limit remains after the design. */
    private static String whyStep(StepCheck s, List<KeyChange> changes, ScaleAnalysis after, WoundPlanOptions o) {
        int upperKey = s.afterKey();
        int lowerKey = s.kind() == StepCheck.Kind.INSIDE_SECTION ? keyBelow(after, upperKey) : s.firstKey();
        KeyChange lo = null;
        KeyChange hi = null;
        for (KeyChange c : changes) {
            if (c.key() == lowerKey) {
                lo = c;
            }
            if (c.key() == upperKey) {
                hi = c;
            }
        }
        String where = String.format(Locale.ROOT, "step %s from %s to %s (%s)", Words.signedPct(s.afterPct()),
                Words.key(lowerKey), Words.key(upperKey), Words.where(s));
        if (lo == null || hi == null) {
            KeyChange planned = lo == null ? hi : lo;
            return String.format(Locale.ROOT, "%s: the neighbour outside the planned keys keeps its present string, "
                    + "and %s is %s from its target; plan both, or choose a target that meets the neighbour", where,
                    Words.key(planned.key()), Words.signedPct(planned.deviationPct()));
        }
        double targetStep = 100.0 * (hi.target() / lo.target() - 1.0);
        if (o.quantity() == TargetQuantity.TENSION && Math.abs(targetStep) > s.limitPct()) {
            return String.format(Locale.ROOT, "%s: the target itself steps %s here; a smoother target would remove it",
                    where, Words.signedPct(targetStep));
        }
        if (!lo.changed() && !hi.changed()) {
            return String.format(Locale.ROOT, "%s: both keep their present strings, which no listed wrap on the cores "
                    + "tried improves on without leaving the keys rougher", where);
        }
        return String.format(Locale.ROOT, "%s: with the listed wrap wire (%s) and the cores tried, the closest "
                + "choice leaves %s %s and %s %s from the target", where, o.wraps().description(),
                Words.key(lo.key()), Words.signedPct(lo.deviationPct()), Words.key(hi.key()),
                Words.signedPct(hi.deviationPct()));
    }

    private static int keyBelow(ScaleAnalysis a, int key) {
        List<NoteResult> r = a.notes();
        for (int i = 1; i < r.size(); i++) {
            if (r.get(i).key() == key) {
                return r.get(i - 1).key();
            }
        }
        return key;
    }
}
