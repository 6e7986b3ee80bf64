package org.scalewright.design.wirecheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Materials;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.NoteCalculator;
import org.scalewright.physics.StrengthTable;
import org.scalewright.physics.StringPhysics;

/** The wire check: before / after / peak, at-risk ordering, totals and stage advice. */
class WireCheckTest {
    /** Steel 7850 kg/m³ (common practice, no source), E = 200 GPa (Shigley's Table 10-5, from memory). */
    static final Materials MATERIALS = new Materials(7850, 8960, 7870, 200e9);
    /** A test table of 2000 MPa at every diameter (not a real wire: it keeps the hand work simple). */
    static final StrengthTable FLAT_2000 = new StrengthTable("flat 2000 MPa", List.of("test table"),
            new double[]{0.5e-3, 2e-3}, new double[]{2000e6, 2000e6});
    /** A test table falling with diameter, slope −0.145 in log-log. */
    static final StrengthTable SLOPED = new StrengthTable("sloped test table", List.of("test table"),
            new double[]{0.5e-3, 2e-3}, new double[]{2400e6, 2400e6 * Math.pow(4, -0.145)});

    static AnalysisSettings settings(StrengthTable t) {
        return AnalysisSettings.of(MATERIALS, t);
    }

    /** A made-up test scale: wound keys 20–27, plain 28–88 with smoothly shrinking lengths. */
    static Scale testScale() {
        List<Note> notes = new ArrayList<>();
        for (int k = 20; k <= 27; k++) {
            notes.add(Note.plain(k, 2, 1.10 - 0.02 * (k - 20), CoreWire.ofDiameter(1.1e-3))
                    .withWrap(new Wrap(0.5e-3, 0, WrapMetal.COPPER)));
        }
        for (int k = 28; k <= 88; k++) {
            double d = (1.2 - 0.007 * (k - 28)) * 1e-3;
            notes.add(Note.plain(k, 3, 0.98 * Math.pow(0.9465, k - 28), CoreWire.ofDiameter(d)));
        }
        return new Scale("test scale", PitchStandard.ISO_16, notes, null);
    }

    @Test
    void handWorkedPlainNoteBeforeAfterAndPeak() {
        // Hand-worked case: plain wire d = 1.000 mm, L = 0.500 m, key 49 at A4 = 440 Hz, steel 7850 kg/m³,
        // E = 200 GPa, a 2000 MPa table; 40 cents flat, 25 % overpull, so the peak is 10 cents sharp.
        //   4 L² f² ρ  = 4 · 0.25 · 440² · 7850                 = 1519.76 MPa
        //   K          = π³ · 200e9 · (1e-3)⁴ / (64 · 0.25)     = 0.387578 N
        //   A          = π (1e-3)² / 4                          = 7.853982e-7 m²,  K/A = 0.49348 MPa
        //   σ target   = 1519.76 − 0.49348                      = 1519.27 MPa  →  75.963 %
        //   σ peak     = 1519.76 · 2^(20/1200) − 0.49348         = 1536.92 MPa  →  76.846 %
        //   present    = 40 cents flat: T = (4 L² μ f² − K) at f = 440 · 2^(−40/1200)
        Scale s = new Scale("", PitchStandard.ISO_16, List.of(Note.plain(49, 1, 0.5, CoreWire.ofDiameter(1e-3))), null);
        Asked q = Asked.of(s, settings(FLAT_2000)).withFlat(PitchState.uniform(40))
                .withOverpull(25);
        WireCheckNote n = Asked.run(q).notes().get(0);
        assertEquals(75.963, n.breakPctBefore(), 0.001);
        assertEquals(75.963, n.breakPctAfter(), 0.001);
        assertEquals(76.846, n.breakPctPeak(), 0.001);
        assertEquals(10.0, n.peakCentsAboveTarget(), 1e-9);
        assertEquals(440 * Math.pow(2, -40 / 1200.0), n.present().frequency(), 1e-9);
        assertTrue(n.overDanger(), "76.8 % is past the 70 % danger band");
        // headroom: f_b = √((σ_b A + K)/(4 L² μ)), 1200 log2(f_b / 440)
        double mu = 7850 * 7.853982e-7;
        double fb = Math.sqrt((2000e6 * 7.853982e-7 + 0.387578) / (4 * 0.25 * mu));
        assertEquals(1200 * Math.log(fb / 440) / Math.log(2), n.headroomCentsAfter(), 0.01);
    }

    @Test
    void aTableTenPercentStrongerDividesEveryPercentByOnePointOne() {
        Asked q = Asked.of(testScale(), settings(SLOPED))
                .withReplacement(SLOPED.scaled(1.1, "10 % stronger")).withFlat(PitchState.uniform(30))
                .withOverpull(25);
        WireCheckReport same = Asked.run(q.withReplacement(SLOPED));
        WireCheckReport stronger = Asked.run(q);
        for (WireCheckNote n : stronger.notes()) {
            WireCheckNote m = same.note(n.key()).orElseThrow();
            assertEquals(n.breakPctBefore() / 1.1, n.breakPctAfter(), 1e-9 * n.breakPctBefore(), "key " + n.key());
            assertEquals(m.breakPctPeak() / 1.1, n.breakPctPeak(), 1e-9 * m.breakPctPeak(), "key " + n.key());
        }
        StrengthComparison c = stronger.tables();
        assertEquals(10.0, c.minSecondStrongerPct(), 1e-9);
        assertEquals(10.0, c.maxSecondStrongerPct(), 1e-9);
    }

    @Test
    void aPeakTenCentsSharpMultipliesStressByTwoToTheTwentyOverTwelveHundred() {
        double ratio = Math.pow(2, 20 / 1200.0);
        // with stiffness: the tension plus K scales with f², so (σ_peak A + K) / (σ A + K) = 2^(20/1200)
        WireCheckReport r = Asked.run(Asked.of(testScale(), settings(SLOPED))
                .withFlat(PitchState.uniform(40)).withOverpull(25));
        for (WireCheckNote n : r.notes()) {
            double a = StringPhysics.area(n.after().coreDiameter());
            double k = n.after().stiffness();
            assertEquals(ratio, (n.peak().stress() * a + k) / (n.after().stress() * a + k), 1e-12, "key " + n.key());
        }
        // flexible limit (E → 0, K → 0): the stress itself scales by 2^(20/1200)
        Materials limp = new Materials(7850, 8960, 7870, 1e-6);
        WireCheckReport flexible = Asked.run(Asked.of(testScale(), AnalysisSettings.of(limp, SLOPED))
                .withFlat(PitchState.uniform(40)).withOverpull(25));
        for (WireCheckNote n : flexible.notes()) {
            assertEquals(ratio, n.breakPctPeak() / n.breakPctAfter(), 1e-12, "key " + n.key());
        }
    }

    @Test
    void notesOverTheDangerBandComeFirstHighestPeakFirst() {
        WireCheckReport r = Asked.run(Asked.of(testScale(), settings(SLOPED))
                .withReplacement(SLOPED.scaled(0.82, "weaker")).withFlat(PitchState.uniform(60)).withOverpull(30));
        List<WireCheckNote> risk = r.atRisk();
        assertFalse(risk.isEmpty(), "the weaker table must put some notes past the danger band");
        assertTrue(risk.size() < r.notes().size(), "and not all of them");
        for (int i = 0; i < r.notes().size(); i++) {
            WireCheckNote n = r.notes().get(i);
            assertEquals(i < risk.size(), n.overDanger(), "key " + n.key());
            assertEquals(n.breakPctPeak() >= 70, n.overDanger(), "key " + n.key());
            if (i > 0 && i < risk.size()) {
                assertTrue(r.notes().get(i - 1).breakPctPeak() >= n.breakPctPeak());
            }
            if (i > risk.size()) {
                assertTrue(r.notes().get(i - 1).key() < n.key(), "the rest bass to treble");
            }
        }
    }

    @Test
    void totalsAreTheSumsOverTheNotesAndTheConversionAppliesToPlainWireOnly() {
        List<Double> metric = new ArrayList<>();
        for (int i = 0; i <= 40; i++) {
            metric.add((0.7 + 0.025 * i) * 1e-3);
        }
        Asked q = Asked.of(testScale(), settings(SLOPED))
                .withReplacement(FLAT_2000).withConversion(WireConversion.toMetric(SizeRounding.UP, metric))
                .withTarget(new PitchStandard(442)).withFlat(PitchState.uniform(20)).withOverpull(25);
        WireCheckReport r = Asked.run(q);
        double present = 0;
        double after = 0;
        double peak = 0;
        for (WireCheckNote n : r.notes()) {
            present += n.presentNote().strings() * n.present().tension();
            after += n.presentNote().strings() * n.after().tension();
            peak += n.presentNote().strings() * n.peak().tension();
            double target = 442 * Math.pow(2, (n.key() - 49) / 12.0);
            assertEquals(target, n.after().frequency(), 1e-9 * target);
            if (n.presentNote().isWound()) {
                assertEquals(n.presentNote().wire().diameter(), n.replacementNote().wire().diameter(), 0);
            } else {
                assertTrue(n.replacementNote().wire().diameter() >= n.presentNote().wire().diameter() - 1e-7);
            }
            // the replacement, core or plain, is judged by the replacement table
            assertEquals(2000e6, n.after().breakingStrength(), 1e-3);
            assertEquals(SLOPED.strengthAt(n.presentNote().wire().diameter()), n.before().breakingStrength(), 1e-3);
        }
        assertEquals(present, r.totals().present(), 1e-6 * present);
        assertEquals(after, r.totals().afterAtTarget(), 1e-6 * after);
        assertEquals(peak, r.totals().peak(), 1e-6 * peak);
        assertEquals(after - present, r.totals().changeToTarget(), 1e-6);
        assertTrue(r.totals().peak() > r.totals().afterAtTarget());
        assertTrue(q.request().isPitchRaise());
    }

    @Test
    void smallRaiseNeedsNoStagesLargeRaiseGetsAPlanWithinTheLimits() {
        Asked base = Asked.of(testScale(), settings(SLOPED)).withOverpull(25);
        StageAdvice small = Asked.run(base.withFlat(PitchState.uniform(5))).stages();
        assertFalse(small.advised());
        assertEquals(1, small.stages().size());

        WireCheckReport big = Asked.run(base.withFlat(PitchState.uniform(100)));
        StageAdvice a = big.stages();
        assertTrue(a.advised());
        assertTrue(big.totals().changeToPeak() > a.limitNewtons());
        assertTrue(a.stages().size() > 1);
        for (RaiseStage s : a.stages()) {
            assertTrue(s.change() <= a.limitNewtons(), "pass " + s.number());
            assertTrue(s.maxPeakPct() < 70, "pass " + s.number());
        }
        // one pass fewer would break a limit: the plan is the shortest
        List<RaiseStage> fewer = WireCheck.plan(big.request(), big.notes(), big.totals().present(),
                a.stages().size() - 1);
        assertTrue(fewer.stream().anyMatch(s -> s.change() > a.limitNewtons() || s.maxPeakPct() >= 70));
        // a limit in kN is used as given
        StageAdvice kn = Asked.run(base.withFlat(PitchState.uniform(100)).withStageLimit(StageLimit.kiloNewtons(1000)))
                .stages();
        assertEquals(1e6, kn.limitNewtons(), 0);
    }

    @Test
    void notesInTheDangerBandAtTargetAreNamedAsBeyondStaging() {
        WireCheckReport r = Asked.run(Asked.of(testScale(), settings(SLOPED))
                .withReplacement(SLOPED.scaled(0.6, "much weaker")).withFlat(PitchState.uniform(20)).withOverpull(25));
        assertFalse(r.stages().dangerAtTarget().isEmpty());
        for (int key : r.stages().dangerAtTarget()) {
            assertTrue(r.note(key).orElseThrow().breakPctAfter() >= 70);
        }
    }

    @Test
    void perNoteFlatnessIsUsedNoteByNote() {
        WireCheckReport r = Asked.run(Asked.of(testScale(), settings(SLOPED))
                .withFlat(PitchState.measured(java.util.Map.of(30, 10.0, 70, 50.0))).withOverpull(20));
        WireCheckNote n = r.note(50).orElseThrow();
        assertEquals(30.0, n.centsFlat(), 1e-12);
        assertEquals(PitchState.Source.INTERPOLATED, n.flatSource());
        assertEquals(6.0, n.peakCentsAboveTarget(), 1e-9);
        assertEquals(PitchState.Source.MEASURED, r.note(70).orElseThrow().flatSource());
        // the present tension is at the present (flat) pitch
        Note note = r.request().scale().note(50).orElseThrow();
        double present = NoteCalculator.computeAt(note, n.after().frequency() * Math.pow(2, -30 / 1200.0),
                settings(SLOPED)).tension();
        assertEquals(present, n.present().tension(), 1e-9);
    }
}
