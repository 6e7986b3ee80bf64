package org.scalewright.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Random;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Materials;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;

/**
 * The per-note results and the scale analysis against the formulas of DESIGN §3, worked in
 * the test from the inputs (hand-worked formulas, not the engine's own helpers), and the
 * flags against their thresholds. Sizes and lengths here are chosen for the test, not taken
 * from any instrument.
 */
class ScaleAnalyzerTest {
    private static final AnalysisSettings S = BuiltInData.defaultSettings();
    private static final Materials M = S.materials();
    private static final double E = 200e9;
    private static final double PI = Math.PI;

    static Note note(int key, int strings, double length, double d, Wrap wrap, Double pitchHz, String section) {
        return new Note(key, strings, length, CoreWire.ofDiameter(d), wrap,
                pitchHz == null ? OptionalDouble.empty() : OptionalDouble.of(pitchHz), 0, OptionalDouble.empty(),
                OptionalDouble.empty(), OptionalDouble.empty(), section, "");
    }

    static Note plain(int key, double length, double d) {
        return note(key, 3, length, d, null, null, "");
    }

    /** μ by the DESIGN §3 formula, worked here. */
    static double mu(double d, Wrap w) {
        double mu = 7850 * PI * d * d / 4;
        if (w != null) {
            double rho = w.metal() == WrapMetal.COPPER ? 8960 : w.metal() == WrapMetal.IRON ? 7870 : 7850;
            // each layer's turn is √((π D)² + w²) long, D its centre line's diameter (helix geometry)
            double d1 = d + w.inner();
            double d2 = d + 2 * w.inner() + w.outer();
            mu += rho * PI * w.inner() * Math.hypot(PI * d1, w.inner()) / 4;
            mu += rho * PI * w.outer() * Math.hypot(PI * d2, w.outer()) / 4;
        }
        return mu;
    }

    static double k(double d, double length) {
        return PI * PI * PI * E * Math.pow(d, 4) / (64 * length * length);
    }

    /** @return the pitch at which a note's tension per string is {@code t}, Hz (inverse of T = 4L²μf² − K) */
    static double pitchForTension(Note n, double t) {
        double l = n.speakingLength();
        return Math.sqrt((t + k(n.wire().diameter(), l)) / (4 * l * l * mu(n.wire().diameter(), n.wrap())));
    }

    /** @return the pitch at which a note is at {@code pct} % of the default table's strength, Hz */
    static double pitchForPct(Note n, double pct) {
        double d = n.wire().diameter();
        return pitchForTension(n, pct / 100 * S.strength().strengthAt(d) * PI * d * d / 4);
    }

    static boolean has(NoteResult r, FlagKind kind) {
        return r.flags().stream().anyMatch(f -> f.kind() == kind);
    }

    @Test
    @DisplayName("plain note: every result from the DESIGN §3 formulas (hand-worked)")
    void plainNoteResults() {
        Note n = new Note(52, 3, 0.330, CoreWire.ofDiameter(0.925e-3), null, OptionalDouble.empty(), 0,
                OptionalDouble.of(0.040), OptionalDouble.of(0.520), OptionalDouble.empty(), "treble", "");
        NoteResult r = NoteCalculator.compute(n, PitchStandard.ISO_16, S);
        double d = 0.925e-3;
        double l = 0.330;
        double f = 440 * Math.pow(2, 3 / 12.0); // C5
        double mu = 7850 * PI * d * d / 4;
        double k = k(d, l);
        double t = 4 * l * l * mu * f * f - k;
        double a = PI * d * d / 4;
        double sigmaB = S.strength().strengthAt(d);
        assertEquals(f, r.frequency(), 1e-9);
        assertEquals("C5", r.noteName());
        assertEquals("treble", r.section());
        assertEquals(mu, r.massPerLength(), mu * 1e-12);
        assertEquals(k, r.stiffness(), k * 1e-12);
        assertEquals(t, r.tension(), t * 1e-12);
        assertEquals(3 * t, r.noteTension(), t * 1e-12);
        assertEquals(t / a, r.stress(), t / a * 1e-12);
        assertEquals(sigmaB, r.breakingStrength(), 0);
        assertEquals(100 * t / a / sigmaB, r.breakPct(), 1e-9);
        assertEquals(k / t, r.inharmonicity(), 1e-15);
        double fb = Math.sqrt((sigmaB * a + k) / (4 * l * l * mu));
        assertEquals(fb, r.breakingFrequency(), fb * 1e-12);
        assertEquals(1200 * Math.log(fb / f) / Math.log(2), r.headroomCents(), 1e-9);
        assertEquals(Math.sqrt(t * mu), r.impedance(), 1e-12);
        assertEquals(t * 0.520 / (E * a), r.elongation(), 1e-15); // over the stretched length given
        assertFalse(r.wound());
        assertEquals(d, r.coreDiameter(), 0);
    }

    @Test
    @DisplayName("wound note: mass from core and both wraps, stiffness from the core alone, stress on the core")
    void woundNoteResults() {
        Wrap w = new Wrap(0.6e-3, 1.3e-3, WrapMetal.COPPER);
        Note n = note(5, 1, 1.60, 1.5e-3, w, null, "bass");
        NoteResult r = NoteCalculator.compute(n, new PitchStandard(442), S);
        double d = 1.5e-3;
        double f = 442 * Math.pow(2, -44 / 12.0);
        double mu = mu(d, w);
        double k = k(d, 1.60);
        double t = 4 * 1.60 * 1.60 * mu * f * f - k;
        assertTrue(r.wound());
        assertEquals(f, r.frequency(), 1e-9);
        assertEquals(mu, r.massPerLength(), mu * 1e-12);
        assertEquals(k, r.stiffness(), k * 1e-12);
        assertEquals(t, r.tension(), t * 1e-12);
        assertEquals(t, r.noteTension(), t * 1e-12); // a monochord
        assertEquals(t / (PI * d * d / 4), r.stress(), 1e-3);
        assertEquals(t * 1.60 / (E * PI * d * d / 4), r.elongation(), 1e-15); // speaking length: no total given
        // the wrap carries no load: a wound string is far less stressed than a plain one of the same length and pitch
        NoteResult bare = NoteCalculator.compute(n.withWrap(null), new PitchStandard(442), S);
        assertTrue(r.stress() > 10 * bare.stress());
    }

    @Test
    @DisplayName("headroom: at the breaking frequency the stress equals the breaking strength")
    void headroomDefinition() {
        for (Note n : List.of(plain(60, 0.25, 0.9e-3), note(10, 1, 1.4, 1.3e-3, Wrap.single(1.0e-3, WrapMetal.COPPER),
                null, ""), note(30, 2, 0.9, 1.0e-3, Wrap.single(0.3e-3, WrapMetal.IRON), null, ""))) {
            NoteResult r = NoteCalculator.compute(n, PitchStandard.ISO_16, S);
            NoteResult atBreak = NoteCalculator.computeAt(n, r.breakingFrequency(), S);
            assertEquals(100.0, atBreak.breakPct(), 1e-9);
            assertEquals(r.breakingStrength(), atBreak.stress(), r.breakingStrength() * 1e-12);
            assertEquals(0.0, atBreak.headroomCents(), 1e-9);
            assertEquals(r.breakingFrequency(), Pitch.shiftedByCents(r.frequency(), r.headroomCents()), 1e-9);
            assertTrue(has(atBreak, FlagKind.OVER_STRENGTH) || has(atBreak, FlagKind.DANGER));
        }
    }

    @Test
    @DisplayName("per note = strings × per string; section totals and whole total add up; a repeated label is a new section")
    void totals() {
        List<Note> notes = new ArrayList<>();
        notes.add(note(1, 1, 1.5, 1.4e-3, new Wrap(0.5e-3, 1.2e-3, WrapMetal.COPPER), null, "bass"));
        notes.add(note(2, 1, 1.48, 1.4e-3, new Wrap(0.5e-3, 1.15e-3, WrapMetal.COPPER), null, "bass"));
        notes.add(note(3, 2, 1.45, 1.2e-3, Wrap.single(1.1e-3, WrapMetal.COPPER), null, "bass"));
        notes.add(note(4, 3, 1.00, 1.0e-3, null, null, "tenor"));
        notes.add(note(5, 3, 0.98, 1.0e-3, null, null, "tenor"));
        notes.add(note(6, 3, 0.96, 1.0e-3, null, null, "treble"));
        notes.add(note(7, 3, 0.94, 1.0e-3, null, null, "tenor"));
        ScaleAnalysis a = ScaleAnalyzer.analyze(new Scale("t", PitchStandard.ISO_16, notes, null), S);
        double sum = 0;
        for (NoteResult r : a.notes()) {
            assertEquals(r.strings() * r.tension(), r.noteTension(), 1e-9);
            sum += r.noteTension();
        }
        assertEquals(sum, a.totalTension(), 1e-9);
        List<SectionTotal> s = a.sections();
        assertEquals(4, s.size());
        assertEquals(new SectionTotal("bass", 1, 3, 3, 4, sectionSum(a, 1, 3)), s.get(0));
        assertEquals(new SectionTotal("tenor", 4, 5, 2, 6, sectionSum(a, 4, 5)), s.get(1));
        assertEquals(new SectionTotal("treble", 6, 6, 1, 3, sectionSum(a, 6, 6)), s.get(2));
        assertEquals(new SectionTotal("tenor", 7, 7, 1, 3, sectionSum(a, 7, 7)), s.get(3));
        assertEquals(sum, s.stream().mapToDouble(SectionTotal::tension).sum(), 1e-9);
    }

    private static double sectionSum(ScaleAnalysis a, int first, int last) {
        double t = 0;
        for (int k = first; k <= last; k++) {
            t += a.result(k).orElseThrow().noteTension();
        }
        return t;
    }

    @ParameterizedTest(name = "{0} % → {1}")
    @CsvSource({"20, LOW, LOW_STRESS", "29.9, LOW, LOW_STRESS", "30.1, NORMAL, ", "45, NORMAL, ", "59.9, NORMAL, ",
            "60.1, CAUTION, CAUTION", "69.9, CAUTION, CAUTION", "70.1, DANGER, DANGER", "99.9, DANGER, DANGER",
            "100.1, DANGER, OVER_STRENGTH", "150, DANGER, OVER_STRENGTH"})
    @DisplayName("stress band flags at the default 30 / 60 / 70 % thresholds (common practice, no source)")
    void stressBands(double pct, StressBand band, FlagKind flag) {
        Note n = plain(50, 0.40, 0.95e-3);
        NoteResult r = NoteCalculator.computeAt(n, pitchForPct(n, pct), S);
        assertEquals(pct, r.breakPct(), 1e-9);
        assertEquals(band, r.band());
        List<FlagKind> bandFlags = r.flags().stream().map(Flag::kind).filter(k -> k == FlagKind.LOW_STRESS
                || k == FlagKind.CAUTION || k == FlagKind.DANGER || k == FlagKind.OVER_STRENGTH).toList();
        assertEquals(flag == null ? List.of() : List.of(flag), bandFlags);
    }

    @Test
    @DisplayName("band edges: 30 % is normal, 60 % caution, 70 % danger; user bands move them")
    void bandEdges() {
        StressBands b = StressBands.DEFAULT;
        assertEquals(StressBand.LOW, b.bandOf(29.999));
        assertEquals(StressBand.NORMAL, b.bandOf(30));
        assertEquals(StressBand.NORMAL, b.bandOf(59.999));
        assertEquals(StressBand.CAUTION, b.bandOf(60));
        assertEquals(StressBand.DANGER, b.bandOf(70));
        Note n = plain(50, 0.40, 0.95e-3);
        AnalysisSettings strict = S.withBands(new StressBands(35, 50, 55));
        assertEquals(StressBand.CAUTION, NoteCalculator.computeAt(n, pitchForPct(n, 52), strict).band());
        assertEquals(StressBand.LOW, NoteCalculator.computeAt(n, pitchForPct(n, 33), strict).band());
    }

    @Test
    @DisplayName("neighbour step: flagged above 8 % per-string tension change from the key below, either way")
    void neighbourSteps() {
        Note a = plain(40, 0.62, 1.0e-3);
        Note b = plain(41, 0.60, 1.0e-3);
        Note c = plain(42, 0.58, 1.0e-3);
        Note d = plain(43, 0.56, 1.0e-3);
        double t = 700;
        List<Note> notes = List.of(pinned(a, t), pinned(b, t * 1.079), pinned(c, t * 1.079 * 1.081),
                pinned(d, t * 1.079 * 1.081 * 0.919));
        ScaleAnalysis an = ScaleAnalyzer.analyze(new Scale("", PitchStandard.ISO_16, notes, null), S);
        assertEquals(t * 1.079, an.result(41).orElseThrow().tension(), 1e-6);
        assertFalse(has(an.result(40).orElseThrow(), FlagKind.NEIGHBOUR_STEP));
        assertFalse(has(an.result(41).orElseThrow(), FlagKind.NEIGHBOUR_STEP), "+7.9 % is within 8 %");
        assertTrue(has(an.result(42).orElseThrow(), FlagKind.NEIGHBOUR_STEP), "+8.1 % is a step");
        assertTrue(has(an.result(43).orElseThrow(), FlagKind.NEIGHBOUR_STEP), "−8.1 % is a step");
        Flag f = an.flags().stream().filter(x -> x.kind() == FlagKind.NEIGHBOUR_STEP && x.key() == 42).findFirst()
                .orElseThrow();
        assertTrue(f.detail().contains("+8.1 %") && f.detail().contains("key 41"), f.detail());
        // a user-set step of 10 % no longer flags 8.1 %
        ScaleAnalysis loose = ScaleAnalyzer.analyze(an.scale(), S.withNeighbourStep(10));
        assertTrue(loose.notes().stream().noneMatch(r -> has(r, FlagKind.NEIGHBOUR_STEP)));
    }

    private static Note pinned(Note n, double tension) {
        return n.withPitch(OptionalDouble.of(pitchForTension(n, tension)), 0);
    }

    @Test
    @DisplayName("implausible but legal values are analysed and flagged: 7 mm plain wire, 4 m length, > 100 %")
    void implausibleValues() {
        Note thick = plain(40, 0.62, 7e-3);
        Note longString = note(10, 1, 4.0, 1.2e-3, Wrap.single(0.8e-3, WrapMetal.COPPER), null, "");
        Note hot = plain(60, 0.40, 0.9e-3);
        hot = hot.withPitch(OptionalDouble.of(pitchForPct(hot, 120)), 0);
        ScaleAnalysis a = ScaleAnalyzer.analyze(new Scale("", PitchStandard.ISO_16, List.of(thick, longString, hot),
                null), S);
        NoteResult t = a.result(40).orElseThrow();
        assertTrue(has(t, FlagKind.IMPLAUSIBLE));
        assertTrue(has(t, FlagKind.OUTSIDE_STRENGTH_TABLE), "7 mm is beyond the ASTM table's 0.250 in (6.35 mm)");
        assertTrue(Double.isFinite(t.breakPct()) && t.tension() > 0);
        NoteResult l = a.result(10).orElseThrow();
        assertTrue(l.flags().stream().anyMatch(f -> f.kind() == FlagKind.IMPLAUSIBLE && f.detail().contains("4000 mm")),
                l.flags().toString());
        NoteResult h = a.result(60).orElseThrow();
        assertEquals(120, h.breakPct(), 1e-9);
        assertTrue(has(h, FlagKind.OVER_STRENGTH));
        assertTrue(h.headroomCents() < 0);
        // an implausible value is shown as danger, as the danger band and a wire over strength are
        assertTrue(FlagKind.IMPLAUSIBLE.isDanger() && FlagKind.DANGER.isDanger() && FlagKind.OVER_STRENGTH.isDanger());
        assertEquals(FlagKind.Severity.CAUTION, FlagKind.NEIGHBOUR_STEP.severity());
        assertFalse(FlagKind.LOW_STRESS.isDanger() || FlagKind.OUTSIDE_STRENGTH_TABLE.isDanger());
        assertEquals(3, a.dangerNoteCount());
        // a sensible plain string raises none of these
        NoteResult ok = NoteCalculator.compute(plain(40, 0.62, 1.0e-3), PitchStandard.ISO_16, S);
        assertFalse(has(ok, FlagKind.IMPLAUSIBLE) || has(ok, FlagKind.OUTSIDE_STRENGTH_TABLE)
                || has(ok, FlagKind.OVER_STRENGTH));
    }

    @Test
    @DisplayName("a wire too stiff to reach pitch is flagged, not a crash")
    void tooStiff() {
        Note n = note(40, 1, 0.03, 3e-3, null, 20.0, "");
        NoteResult r = NoteCalculator.compute(n, PitchStandard.ISO_16, S);
        assertTrue(r.tension() < 0);
        assertTrue(r.flags().stream().anyMatch(f -> f.kind() == FlagKind.IMPLAUSIBLE && f.detail().contains("stiff")));
        assertEquals(0.0, r.impedance());
    }

    @Test
    @DisplayName("extended bass keys 0 and −1 and a short keyboard are analysed like any other")
    void extendedAndShortKeyboards() {
        Wrap w = new Wrap(0.6e-3, 1.4e-3, WrapMetal.COPPER);
        List<Note> ext = List.of(note(-1, 1, 1.95, 1.5e-3, w, null, "bass"), note(0, 1, 1.93, 1.5e-3, w, null, "bass"),
                note(1, 1, 1.91, 1.5e-3, w, null, "bass"));
        ScaleAnalysis a = ScaleAnalyzer.analyze(new Scale("", PitchStandard.ISO_16, ext, null), S);
        assertEquals(List.of(-1, 0, 1), a.notes().stream().map(NoteResult::key).toList());
        assertEquals("G0", a.notes().get(0).noteName());
        assertEquals("G#0", a.notes().get(1).noteName());
        assertEquals(24.4997, a.notes().get(0).frequency(), 0.00005); // G0 (piano key frequency table, from memory)
        assertEquals(27.5, a.notes().get(2).frequency(), 1e-9);
        assertTrue(a.notes().get(0).tension() > 0);
        assertEquals(new SectionTotal("bass", -1, 1, 3, 3, a.totalTension()), a.sections().get(0));

        // a short keyboard: keys 16–73 (C2–C#6)
        List<Note> shortKb = new ArrayList<>();
        for (int k = 16; k <= 73; k++) {
            shortKb.add(plain(k, 1.2 * Math.pow(2, -(k - 16) / 14.0), 1.0e-3));
        }
        ScaleAnalysis s = ScaleAnalyzer.analyze(new Scale("", PitchStandard.ISO_16, shortKb, null), S);
        assertEquals(58, s.notes().size());
        assertEquals("C2", s.notes().get(0).noteName());
        assertEquals(1, s.sections().size());
        assertEquals(174, s.sections().get(0).strings());
    }

    @Test
    @DisplayName("the analysis keeps its inputs, collects every note's flags in key order")
    void analysisRecord() {
        List<Note> notes = List.of(plain(60, 0.25, 0.9e-3), plain(40, 0.62, 5e-3), plain(50, 0.40, 0.95e-3));
        Scale scale = new Scale("x", PitchStandard.ISO_16, notes, null);
        ScaleAnalysis a = ScaleAnalyzer.analyze(scale, S);
        assertSame(scale, a.scale());
        assertSame(S, a.settings());
        List<Flag> expected = new ArrayList<>();
        a.notes().forEach(r -> expected.addAll(r.flags()));
        assertEquals(expected, a.flags());
        assertEquals(a.notes().stream().filter(NoteResult::isFlagged).count(), a.flaggedNoteCount());
        assertEquals(List.of(40, 50, 60), a.notes().stream().map(NoteResult::key).toList());
        assertTrue(a.result(41).isEmpty());
    }

    @Test
    @DisplayName("A4 = 442: T + K scales by (442/440)² (DESIGN §3, hand-worked)")
    void pitchStandard() {
        Note n = plain(49, 0.40, 0.95e-3);
        NoteResult at440 = NoteCalculator.compute(n, PitchStandard.ISO_16, S);
        NoteResult at442 = NoteCalculator.compute(n, new PitchStandard(442), S);
        double k = at440.stiffness();
        assertEquals((at440.tension() + k) * Math.pow(442 / 440.0, 2), at442.tension() + k, 1e-9);
        assertEquals(at440.headroomCents() - 1200 * Math.log(442 / 440.0) / Math.log(2), at442.headroomCents(), 1e-9);
    }

    @Test
    @DisplayName("random notes (seeded): stiffer lowers tension, plain stress ignores d when flexible, headroom ↔ % break")
    void properties() {
        Random rnd = new Random(20240601L);
        Materials stiffer = new Materials(M.steelDensity(), M.copperDensity(), M.ironDensity(), 1.5 * M.youngsModulus());
        AnalysisSettings stiff = new AnalysisSettings(stiffer, S.strength(), S.bands(), S.neighbourStepPct(),
                S.plausible());
        for (int i = 0; i < 2000; i++) {
            int key = 1 + rnd.nextInt(88);
            // a speaking length roughly suited to the key (shorter by about 2^(0.9/12) per key), ±20 %
            double length = Math.min(2.0, 0.052 * Math.pow(2, (88 - key) * 0.9 / 12) * (0.8 + 0.4 * rnd.nextDouble()));
            double d = (0.75 + rnd.nextDouble() * 0.8) * 1e-3;
            Wrap wrap = null;
            if (rnd.nextBoolean()) {
                double w1 = (0.15 + rnd.nextDouble() * 1.0) * 1e-3;
                double w2 = rnd.nextBoolean() ? (0.3 + rnd.nextDouble() * 1.2) * 1e-3 : 0;
                wrap = new Wrap(w1, w2, WrapMetal.values()[rnd.nextInt(3)]);
            }
            Note n = note(key, 1 + rnd.nextInt(3), length, d, wrap, null, "");
            NoteResult r = NoteCalculator.compute(n, PitchStandard.ISO_16, S);
            String what = "note " + i + ": " + n;
            assertTrue(r.tension() > 0, what);

            // stiffness rises → tension at the same pitch falls, by exactly the rise in K
            NoteResult rs = NoteCalculator.compute(n, PitchStandard.ISO_16, stiff);
            assertTrue(rs.tension() < r.tension(), what);
            assertEquals(rs.stiffness() - r.stiffness(), r.tension() - rs.tension(), 1e-9 * r.tension(), what);
            assertEquals(1.5 * r.stiffness(), rs.stiffness(), 1e-12 * r.stiffness(), what);

            // % of breaking strength and headroom describe the same margin: 100/pct = (f_b/f)²(1 + B) − B
            double ratio2 = Math.pow(2, r.headroomCents() / 600);
            double b = r.inharmonicity();
            assertEquals(100 / r.breakPct(), ratio2 * (1 + b) - b, 1e-9 * (100 / r.breakPct()), what);
            assertEquals(r.breakPct() < 100, r.headroomCents() > 0, what);

            if (wrap == null) {
                // plain wire: flexible stress 4 L² f² ρ whatever the diameter; stiff stress = that − K/A
                double f = r.frequency();
                double flexible = 4 * length * length * f * f * 7850;
                double other = d * (0.6 + rnd.nextDouble());
                double muOther = StringPhysics.plainMassPerLength(other, 7850);
                assertEquals(flexible, StringPhysics.stress(StringPhysics.flexibleTension(length, muOther, f), other),
                        flexible * 1e-12, what);
                assertEquals(flexible - r.stiffness() / (PI * d * d / 4), r.stress(), flexible * 1e-12, what);
            } else {
                // wound: the wrap adds mass and tension, not stiffness
                NoteResult bare = NoteCalculator.compute(n.withWrap(null), PitchStandard.ISO_16, S);
                assertEquals(bare.stiffness(), r.stiffness(), 0, what);
                assertTrue(r.tension() > bare.tension(), what);
            }
        }
    }
}
