package org.scalewright.design.diagnosis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.scalewright.model.CoreWire;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Note;
import org.scalewright.model.NumberText;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.model.WireSize;
import org.scalewright.model.WireSizeTable;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.NoteCalculator;
import org.scalewright.physics.StrengthTable;

/** The section diagnosis: standing-out notes, cause, and remedies that really work when applied. */
class SectionDiagnosisTest {
    private static final AnalysisSettings FLAT = DiagnosisScales.settings(DiagnosisScales.FLAT_2000);

    private static List<Double> metric() {
        List<Double> list = new ArrayList<>();
        for (int i = 0; i <= 36; i++) {
            list.add((0.700 + 0.025 * i) * 1e-3);
        }
        return list;
    }

    /** Music-wire sizes by DESIGN §3: d[in] = (2·size + 5)/1000 (from memory / common practice). */
    private static WireSizeTable sizes() {
        List<WireSize> list = new ArrayList<>();
        for (double s = 12; s <= 23; s += 0.5) {
            list.add(new WireSize(s, (2 * s + 5) / 1000 * 0.0254));
        }
        return new WireSizeTable(list);
    }

    private static DiagnosisReport diagnose(Scale s, KeyRange range, AnalysisSettings settings) {
        return SectionDiagnosis.diagnose(DiagnosisRequest.of(s, range, settings, sizes(), metric()));
    }

    /** Recomputes the highest percent of breaking strength of the range, independently of the engine. */
    private static double maxPct(Scale s, KeyRange range, AnalysisSettings settings) {
        return s.notesIn(range).stream().mapToDouble(n -> NoteCalculator.compute(n, s.pitch(), settings).breakPct())
                .max().orElseThrow();
    }

    @Test
    void findsAPlantedHotNote() {
        // key 70's speaking length made 12 % long: its stress rises by about 1.12² = 1.25, to about 54 %
        Scale s = DiagnosisScales.plain(k -> 38 + 8 * (k - 40) / 48.0, k -> k == 70 ? 1.12 : 1.0, 0.9e-3);
        DiagnosisReport r = diagnose(s, new KeyRange(60, 80), FLAT);
        List<DiagnosedNote> out = r.standingOut();
        assertEquals(1, out.size(), out.toString());
        DiagnosedNote hot = out.get(0);
        assertEquals(70, hot.key());
        assertEquals(100 * (1.12 * 1.12 - 1), hot.trendDeviationPct(), 1.0);
        assertEquals(12.0, 100 * (hot.speakingLength() / hot.trendLength() - 1), 0.5);
        assertEquals(StressCause.LENGTH_AND_PITCH, r.finding().cause());
        // the length that puts it back on the trend is its neighbours' curve
        assertEquals(hot.speakingLength() / 1.12, hot.lengthForTrend().getAsDouble(), 0.003 * hot.speakingLength());
        // under the caution band: nothing needs changing, but the trend length is offered
        assertTrue(r.underCaution());
        assertTrue(r.finding().remedies().isEmpty());
        for (DiagnosedNote n : r.notes()) {
            assertTrue(n.key() >= 60 && n.key() <= 80);
        }
    }

    @Test
    void theTrendLengthIsOneFigureInTheTableAndInTheText() {
        // the planted hot note of findsAPlantedHotNote: the text names its trend length, which
        // must be the very figure the table and the CSV show (DiagnosedNote.trendLength), rounded once
        // a second case where the length that would put the note's percent on the trend is not the
        // trend of lengths: the hot note also has a thicker wire, weaker on the steep table
        Scale s = DiagnosisScales.plain(k -> 38 + 8 * (k - 40) / 48.0, k -> k == 70 ? 1.12 : 1.0, 0.9e-3);
        Scale thick = s.withNote(s.note(70).orElseThrow().withWire(CoreWire.ofDiameter(0.98e-3)));
        for (boolean steep : new boolean[] {false, true}) {
            DiagnosisReport r = steep ? diagnose(thick, new KeyRange(60, 80), DiagnosisScales.settings(
                    DiagnosisScales.STEEP)) : diagnose(s, new KeyRange(60, 80), FLAT);
            DiagnosedNote hot = r.standingOut().get(0);
            assertEquals(70, hot.key());
            if (steep) {
                assertFalse(FindingWriter.mm(hot.trendLength()).equals(FindingWriter.mm(
                        hot.lengthForTrend().getAsDouble())), "the two lengths differ here");
            }
            String trendMm = FindingWriter.mm(hot.trendLength());
            assertEquals(NumberText.fixed(hot.trendLength() * 1e3, 1), trendMm);
            String text = String.join("\n", r.finding().explanation());
            java.util.regex.Matcher m = java.util.regex.Pattern.compile("70 \\S+ ([0-9.]+) mm \\(now").matcher(text);
            int seen = 0;
            while (m.find()) {
                assertEquals(trendMm, m.group(1), text);
                seen++;
            }
            assertTrue(seen >= 1, text);
            assertTrue(text.contains("where the trend gives " + trendMm + " mm"), text);
        }
    }

    @Test
    void aComparedTableIsReportedWhenNothingRunsHigh() {
        Scale s = DiagnosisScales.plain(DiagnosisScales::smoothPct, k -> 1.0, 0.9e-3);
        KeyRange range = new KeyRange(50, 88);
        StrengthTable weaker = DiagnosisScales.FLAT_2000.scaled(0.85, "maker W");
        StrengthTable stronger = DiagnosisScales.FLAT_2000.scaled(1.05, "maker S");
        DiagnosisReport r = SectionDiagnosis.diagnose(DiagnosisRequest.of(s, range, FLAT, sizes(), metric())
                .withCandidates(List.of(weaker, stronger)));
        assertTrue(r.underCaution() && r.standingOut().isEmpty());
        String text = String.join("\n", r.finding().explanation());
        double now = maxPct(s, range, FLAT);
        for (StrengthTable t : List.of(weaker, stronger)) {
            double with = maxPct(s, range, DiagnosisScales.settings(t));
            String expected = "With '" + t.name() + "' the highest note of the range would be at "
                    + NumberText.fixed(with, 1) + " % of breaking strength (now " + NumberText.fixed(now, 1) + " %)";
            assertTrue(text.contains(expected), text);
        }
        // 2000 MPa × 0.85: every percent divided by 0.85, so the highest rises from about 54 % to about 63 %,
        // into the caution band, which the finding says
        assertTrue(maxPct(s, range, DiagnosisScales.settings(weaker)) >= 60);
        assertTrue(text.contains("'maker W' the highest note of the range would be at "
                + NumberText.fixed(maxPct(s, range, DiagnosisScales.settings(weaker)), 1)
                + " % of breaking strength (now " + NumberText.fixed(now, 1) + " %), in the caution band"), text);
    }

    @Test
    void ignoresASmoothSection() {
        Scale s = DiagnosisScales.plain(DiagnosisScales::smoothPct, k -> 1.0, 0.9e-3);
        DiagnosisReport r = diagnose(s, new KeyRange(50, 88), FLAT);
        assertTrue(r.standingOut().isEmpty());
        for (DiagnosedNote n : r.notes()) {
            assertTrue(Math.abs(n.trendDeviationPct()) < 1, "key " + n.key() + ": " + n.trendDeviationPct());
        }
        assertEquals(StressCause.NONE, r.finding().cause());
        assertTrue(r.finding().remedies().isEmpty());
        assertFalse(r.finding().inspect().isEmpty());
    }

    @Test
    void aRangeOfOnlyTheBreakingNotesIsComparedWithTheRestOfItsSection() {
        Scale s = DiagnosisScales.plain(DiagnosisScales::smoothPct, k -> k >= 64 && k <= 71 ? 1.12 : 1.0, 0.9e-3);
        DiagnosisReport r = diagnose(s, new KeyRange(64, 71), FLAT);
        assertEquals(8, r.standingOut().size());
    }

    @Test
    void aThickWireOnAWeakPartOfTheTableIsTheWiresDoing() {
        // one note strung with 1.0 mm among 0.8 mm on a table falling steeply with diameter
        Scale base = DiagnosisScales.plain(DiagnosisScales::smoothPct, k -> 1.0, 0.8e-3);
        Note n = base.note(70).orElseThrow();
        Scale s = base.withNote(n.withWire(CoreWire.ofDiameter(1.0e-3)));
        DiagnosisReport r = diagnose(s, new KeyRange(60, 80), DiagnosisScales.settings(DiagnosisScales.STEEP));
        assertEquals(List.of(70), r.standingOut().stream().map(DiagnosedNote::key).toList());
        DiagnosedNote hot = r.standingOut().get(0);
        assertEquals(0, hot.share().lengthPct(), 0.5);
        assertTrue(hot.share().strengthPct() > 10, "strength share " + hot.share().strengthPct());
        assertEquals(StressCause.WIRE, r.finding().cause());
    }

    @Test
    void theSuggestedChangesAppliedBringTheRangeUnderTheCautionBand() {
        // a smooth section at 45–55 % with keys 64–70 made 12 % long: about 63–66 %, over the 60 % caution band
        Scale s = DiagnosisScales.plain(DiagnosisScales::smoothPct, k -> k >= 64 && k <= 70 ? 1.12 : 1.0, 0.9e-3);
        KeyRange range = new KeyRange(60, 80);
        StrengthTable plenty = DiagnosisScales.FLAT_2000.scaled(1.2, "20 % stronger test table");
        StrengthTable little = DiagnosisScales.FLAT_2000.scaled(1.05, "5 % stronger test table");
        DiagnosisRequest q = DiagnosisRequest.of(s, range, FLAT, sizes(), metric()).withCandidates(List.of(plenty, little));
        DiagnosisReport r = SectionDiagnosis.diagnose(q);
        assertTrue(maxPct(s, range, FLAT) >= 60, "the test range must start over the caution band");
        assertFalse(r.underCaution());
        Finding f = r.finding();
        assertEquals(StressCause.LENGTH_AND_PITCH, f.cause());
        assertEquals(4, f.remedies().size());

        LowerPitch pitch = find(f, LowerPitch.class);
        assertTrue(pitch.fixes());
        assertTrue(pitch.lowerByHz() > 0);
        double atNewPitch = maxPct(s.withPitch(new PitchStandard(pitch.newA4())), range, FLAT);
        assertTrue(atNewPitch < 60, "at A4 = " + pitch.newA4() + ": " + atNewPitch);
        assertTrue(atNewPitch > 59.0, "not lowered further than needed: " + atNewPitch);
        assertEquals(atNewPitch, pitch.maxPctAfter(), 1e-9);

        ShorterLengths lengths = find(f, ShorterLengths.class);
        assertTrue(lengths.fixes());
        Scale shorter = s;
        for (Map.Entry<Integer, Double> e : lengths.newLengths().entrySet()) {
            Note n = shorter.note(e.getKey()).orElseThrow();
            assertTrue(e.getValue() < n.speakingLength());
            shorter = shorter.withNote(n.withSpeakingLength(e.getValue()));
        }
        assertTrue(maxPct(shorter, range, FLAT) < 60);
        assertEquals(maxPct(shorter, range, FLAT), lengths.maxPctAfter(), 1e-9);

        StrongerWire stronger = find(f, StrongerWire.class);
        assertTrue(stronger.fixes());
        AnalysisSettings required = FLAT.withStrength(DiagnosisScales.FLAT_2000.scaled(
                1 + stronger.requiredStrongerPct() / 100, "required"));
        assertTrue(maxPct(s, range, required) < 60);
        assertEquals(List.of(plenty.name()), stronger.thatWouldDo().stream().map(o -> o.table().name()).toList());
        assertTrue(maxPct(s, range, FLAT.withStrength(plenty)) < 60);
        assertTrue(maxPct(s, range, FLAT.withStrength(little)) >= 60);

        // a flat table gives a thinner size no higher strength: the engine must say it is not enough
        ThinnerWire thinner = find(f, ThinnerWire.class);
        assertFalse(thinner.fixes());
        assertTrue(thinner.maxPctAfter() >= 60);
    }

    @Test
    void aThinnerSizeWorksWhereTheTableRisesSteeplyForThinnerWire() {
        // all 1.0 mm on the steep table; keys 68–70 lengths 5 % long: about +10 %, just over the band
        AnalysisSettings steep = DiagnosisScales.settings(DiagnosisScales.STEEP);
        Scale s = DiagnosisScales.plain(k -> 55.5, k -> k >= 68 && k <= 70 ? 1.05 : 1.0, 1.0e-3);
        KeyRange range = new KeyRange(60, 80);
        double start = maxPct(s, range, steep);
        assertTrue(start >= 60 && start < 62.5, "test set-up: " + start);
        DiagnosisReport r = diagnose(s, range, steep);
        ThinnerWire thinner = find(r.finding(), ThinnerWire.class);
        assertTrue(thinner.fixes(), thinner.describe());
        Scale changed = s;
        for (ThinnerWire.SizeOption o : thinner.options()) {
            assertTrue(o.thinner().diameter() < o.present().diameter());
            assertTrue(o.tensionChangePct() < 0, "a thinner wire at the same stress carries less tension");
            changed = changed.withNote(changed.note(o.key()).orElseThrow().withWire(o.thinner()));
        }
        assertTrue(maxPct(changed, range, steep) < 60);
    }

    @Test
    void everyFixingRemedyOfTheFindingRecomputesUnderTheBand() {
        Scale s = DiagnosisScales.plain(k -> 58, k -> k % 7 == 0 ? 1.08 : 1.0, 0.9e-3);
        DiagnosisReport r = diagnose(s, new KeyRange(45, 85), FLAT);
        assertFalse(r.finding().fixing().isEmpty());
        for (Remedy m : r.finding().fixing()) {
            assertTrue(m.maxPctAfter() < 60, m.describe());
        }
    }

    private static <T extends Remedy> T find(Finding f, Class<T> kind) {
        return f.remedies().stream().filter(kind::isInstance).map(kind::cast).findFirst().orElseThrow();
    }
}
