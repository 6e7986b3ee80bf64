package org.scalewright.design.wirecheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.Note;
import org.scalewright.model.NumberText;
import org.scalewright.model.Scale;
import org.scalewright.model.UnitConversions;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.NoteCalculator;
import org.scalewright.physics.Pitch;

/**
 * The one wording of a wire check's results (stage advice, totals, the at-risk summary) and the
 * one reading of its inputs (stage limit, cents flat, overpull), shared by both front ends.
 */
class WireCheckWordsTest {
    private static final Asked BASE = Asked.of(WireCheckTest.testScale(),
            WireCheckTest.settings(WireCheckTest.SLOPED)).withOverpull(25);

    @Test
    void aSmallRaiseSaysStagingIsNotNeededAndNamesTheLimit() {
        WireCheckReport r = Asked.run(BASE.withFlat(PitchState.uniform(5)));
        StageWords w = r.stageWords();
        assertEquals("Raise in stages: not needed by these figures (no peak in the danger band; total tension change "
                + "within 5 % of the present total).", w.headline());
        assertTrue(w.reasons().isEmpty() && w.passes().isEmpty() && w.plan().isEmpty() && w.closing().isEmpty());
    }

    @Test
    void aLargeRaiseGivesReasonsAPlanAndOneLinePerPass() {
        WireCheckReport r = Asked.run(BASE.withFlat(PitchState.uniform(100)));
        StageWords w = r.stageWords();
        StageAdvice a = r.stages();
        assertEquals("Raise in stages: advised, because", w.headline());
        assertEquals(a.reasons(), w.reasons().subList(0, a.reasons().size()));
        int n = a.stages().size();
        assertEquals("Plan: " + n + " passes, each raising every note by 1/" + n + " of how flat it is, tuned 25 % "
                + "sharp of that step:", w.plan());
        assertEquals(n, w.passes().size());
        RaiseStage first = a.stages().get(0);
        assertTrue(w.passes().get(0).startsWith("pass 1: to " + Math.round(100 * first.endFraction())
                + " % of the raise; total "), w.passes().get(0));
        assertTrue(w.passes().get(0).endsWith("key " + first.maxPeakKey() + " "
                + org.scalewright.model.KeyNames.name(first.maxPeakKey())), w.passes().get(0));
        assertEquals("Each pass stays within the stage limit of 5 % of the present total ("
                + String.format(java.util.Locale.ROOT, "%.1f", a.limitNewtons() / 1e3) + " kN), and every note stays "
                + "under the danger band (70 %) at every pass's peak.", w.closing());
        for (RaiseStage st : a.stages()) {
            assertTrue(st.inDanger().isEmpty() && st.maxPeakPct() < 70, "pass " + st.number());
        }
        assertEquals("7.5 kN", StageLimit.kiloNewtons(7.5).describe(7500));
    }

    @Test
    void keysInTheDangerBandAtTheTargetAreNamedAsBeyondStaging() {
        WireCheckReport r = Asked.run(Asked.of(WireCheckTest.testScale(),
                        WireCheckTest.settings(WireCheckTest.SLOPED))
                .withReplacement(WireCheckTest.SLOPED.scaled(0.6, "much weaker")).withFlat(PitchState.uniform(20))
                .withOverpull(25));
        List<Integer> keys = r.stages().dangerAtTarget();
        String last = r.stageWords().reasons().get(r.stageWords().reasons().size() - 1);
        StringBuilder named = new StringBuilder(keys.size() == 1 ? "key " : "keys ");
        for (int i = 0; i < keys.size(); i++) {
            named.append(i == 0 ? "" : ", ").append(StageWords.keyList(List.of(keys.get(i))).substring(4))
                    .append(" (").append(NumberText.fixed(r.note(keys.get(i)).orElseThrow().breakPctAfter(), 1))
                    .append(" % at the target)");
        }
        assertTrue(last.startsWith(named.toString()), last);
        assertTrue(last.contains("staging cannot help " + (keys.size() == 1 ? "it" : "them")), last);
        assertEquals("key 49 A4", StageWords.keyList(List.of(49)));
        assertEquals("keys 1 A0, 88 C8", StageWords.keyList(List.of(1, 88)));
    }

    /**
     * The test scale with key 60 lengthened so that it sits just over the danger band (about
     * 70.1 %) at the target pitch itself, as key 68 of the demo grand does with the specimen table.
     */
    static Scale oneNoteJustOverDanger() {
        Scale s = WireCheckTest.testScale();
        AnalysisSettings st = WireCheckTest.settings(WireCheckTest.SLOPED);
        Note n = s.note(60).orElseThrow();
        double pct = NoteCalculator.compute(n, s.pitch(), st).breakPct();
        // percent of breaking strength goes nearly as L²; one correction step for the stiffness term
        for (int i = 0; i < 3; i++) {
            n = n.withSpeakingLength(n.speakingLength() * Math.sqrt(70.1 / pct));
            pct = NoteCalculator.compute(n, s.pitch(), st).breakPct();
        }
        Note lengthened = n;
        return s.withNotes(s.notes().stream().map(x -> x.key() == 60 ? lengthened : x).toList());
    }

    @Test
    void aNoteOverTheDangerBandAtTheTargetIsNamedAndNoPassClaimsEveryNoteStaysUnder() {
        Scale s = oneNoteJustOverDanger();
        WireCheckReport r = Asked.run(Asked.of(s, WireCheckTest.settings(WireCheckTest.SLOPED))
                .withFlat(PitchState.uniform(100)).withOverpull(25));
        WireCheckNote key60 = r.note(60).orElseThrow();
        assertTrue(key60.breakPctAfter() >= 70 && key60.breakPctAfter() < 70.3, "" + key60.breakPctAfter());
        StageAdvice a = r.stages();
        assertTrue(a.advised() && a.hasPlan());
        assertEquals(List.of(60), a.dangerAtTarget());
        StageWords w = r.stageWords();
        String pctAtTarget = NumberText.fixed(key60.breakPctAfter(), 1);
        String stuck = w.reasons().get(w.reasons().size() - 1);
        assertTrue(stuck.startsWith("key 60 G#5 (" + pctAtTarget + " % at the target)"), stuck);

        // every note at every pass's peak, worked here from the pass's definition (DESIGN §5):
        // pass i of n ends at i/n of the raise and peaks C·overpull/n cents above that
        AnalysisSettings repl = WireCheckTest.settings(WireCheckTest.SLOPED);
        int n = a.stages().size();
        double highest60 = 0;
        for (RaiseStage st : a.stages()) {
            double max = 0;
            int maxKey = 0;
            for (WireCheckNote x : r.byKey()) {
                double c = x.centsFlat();
                double cents = -c * (1 - st.endFraction()) + c / n * 0.25;
                double pct = NoteCalculator.computeAt(x.replacementNote(),
                        Pitch.shiftedByCents(x.after().frequency(), cents), repl).breakPct();
                if (pct > max) {
                    max = pct;
                    maxKey = x.key();
                }
                boolean listed = st.inDanger().stream().anyMatch(o -> o.key() == x.key());
                assertEquals(pct >= 70, listed, "pass " + st.number() + " key " + x.key());
            }
            assertEquals(max, st.maxPeakPct(), 1e-9, "pass " + st.number());
            assertEquals(maxKey, st.maxPeakKey());
            highest60 = Math.max(highest60, st.inDanger().stream().filter(o -> o.key() == 60)
                    .mapToDouble(RaiseStage.Over::pct).max().orElse(0));
        }
        RaiseStage last = a.stages().get(n - 1);
        assertEquals(60, last.maxPeakKey(), "the note over the band is the highest at the last pass's peak");
        assertTrue(last.maxPeakPct() > key60.breakPctAfter());
        assertTrue(w.passes().get(n - 1).contains("key 60 G#5, in the danger band"), w.passes().get(n - 1));

        assertFalse(w.closing().contains("and under the danger band at its peak"), w.closing());
        assertTrue(w.closing().contains("Every note but key 60 G#5 stays under the danger band (70 %) at every "
                + "pass's peak"), w.closing());
        assertTrue(w.closing().contains("key 60 G#5 is at " + pctAtTarget + " % at the target itself and reaches "
                + NumberText.fixed(highest60, 1) + " % at a pass's peak"), w.closing());
    }

    @Test
    void totalsInKiloNewtonsAndPoundsForceWithTheChangeFromThePresent() {
        TensionTotals t = new TensionTotals(200_000, 205_000, 210_000, 220_000);
        List<TensionTotals.State> states = t.states();
        assertEquals(4, states.size());
        assertEquals("present (present wire, present pitch): 200.0 kN (44,962 lbf)", states.get(0).words());
        // 10 kN = 2248.09 lbf (NIST SP 811: 1 lbf = 4.4482216152605 N)
        assertEquals(2248.09, UnitConversions.newtonsToLbf(10_000), 0.005);
        assertEquals("replacement at target: 210.0 kN (47,210 lbf), +10.0 kN (+2,248 lbf, +5.0 %)",
                states.get(2).words());
        assertEquals(10.0, states.get(3).changePct(), 1e-12);
    }

    @Test
    void theAtRiskSummaryCountsTheNotesAtThePeak() {
        WireCheckReport calm = Asked.run(BASE.withFlat(PitchState.uniform(5)));
        assertEquals("No note reaches the danger band (70 %) at the peak.", calm.riskSummary());
        WireCheckReport risky = Asked.run(Asked.of(WireCheckTest.testScale(),
                        WireCheckTest.settings(WireCheckTest.SLOPED))
                .withReplacement(WireCheckTest.SLOPED.scaled(0.6, "much weaker")).withFlat(PitchState.uniform(20)));
        int n = risky.atRisk().size();
        assertTrue(n > 1);
        assertEquals(n + " notes at or above the danger band (70 %) at the peak, listed first, highest first.",
                risky.riskSummary());
        assertTrue(risky.tablesSummary().startsWith("Strength tables compared on the replacement wire: the "
                + "replacement table is -40.0 to -40.0 % stronger"), risky.tablesSummary());
        assertEquals("", calm.tablesSummary());
    }

    @Test
    void stageLimitIsReadAsAPercentOrAForceWithADecimalPointOrComma() {
        assertEquals(StageLimit.percentOfTotal(5), StageLimit.parse("5%"));
        assertEquals(StageLimit.percentOfTotal(7.5), StageLimit.parse(" 7,5 % "));
        assertEquals(StageLimit.kiloNewtons(10), StageLimit.parse("10kN"));
        assertEquals(StageLimit.kiloNewtons(9.5), StageLimit.parse("9500 N"));
        assertEquals(StageLimit.kiloNewtons(12.5), StageLimit.parse("12,5 KN"));
        // 2200 lbf × 4.4482216152605 N/lbf (NIST SP 811)
        assertEquals(2200 * 4.4482216152605, StageLimit.parse("2200lbf").newtons(0), 1e-9);
        for (String bad : new String[] {"lots", "0%", "5", "-3kN", "", "1,2,3kN"}) {
            InvalidInput e = assertThrows(InvalidInput.class, () -> StageLimit.parse(bad), bad);
            assertEquals("stage limit: expected a percent of the present total or a force > 0, such as 5%, 10kN "
                    + "or 2200lbf, was '" + bad.strip() + "'", e.getMessage());
        }
    }

    @Test
    void centsFlatAndOverpullAsAUserGivesThem() {
        assertEquals(PitchState.uniform(-1200), PitchState.flatBy(-1200));
        assertEquals("cents flat must be -1200 to 1200, was 5000",
                assertThrows(InvalidInput.class, () -> PitchState.flatBy(5000)).getMessage());
        assertEquals(100.0, WireCheckRequest.overpull(100));
        assertEquals("overpull must be 0 to 100 %, was 150",
                assertThrows(InvalidInput.class, () -> WireCheckRequest.overpull(150)).getMessage());
        assertEquals("30 cents flat on every note", PitchState.uniform(30).describe());
    }
}
