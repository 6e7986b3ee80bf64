package org.scalewright.design.diagnosis;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.NoteCalculator;

/**
 * On the invented demo instruments (whose hot treble groups are planted, see their README), the
 * diagnosis over keys 60–88 names the group, and every change it says brings the range under the
 * caution band does so when applied here, independently, and recomputed. No demo figure is used
 * as a check value: only the band (60 %) and the engine's own suggestions.
 */
class DemoDiagnosisTest {
    private static final KeyRange RANGE = new KeyRange(60, 88);

    private static double maxPct(Scale s, AnalysisSettings settings) {
        return s.notesIn(RANGE).stream().mapToDouble(n -> NoteCalculator.compute(n, s.pitch(), settings).breakPct())
                .max().orElseThrow();
    }

    @Test
    void suggestedChangesAppliedBringTheHotTrebleUnderTheCautionBand() throws Exception {
        for (String demo : List.of("grand-190", "upright-131")) {
            Path file = Path.of("demo-instruments", demo, demo + ".csv");
            assumeTrue(Files.exists(file), "demo not present");
            Scale s = ScaleSheetReader.standard().read(file);
            AnalysisSettings settings = BuiltInData.defaultSettings();
            double caution = settings.bands().caution();
            DiagnosisReport r = SectionDiagnosis.diagnose(DiagnosisRequest.of(s, RANGE, settings,
                    BuiltInData.musicWireSizes(), BuiltInData.metricPlainWire()));
            assertTrue(maxPct(s, settings) >= caution, demo + " starts over the caution band");
            assertTrue(r.standingOut().size() >= 7, demo + ": " + r.standingOut().size());
            assertFalse(r.finding().fixing().isEmpty(), demo);
            for (Remedy m : r.finding().fixing()) {
                double after;
                if (m instanceof LowerPitch p) {
                    after = maxPct(s.withPitch(new PitchStandard(p.newA4())), settings);
                } else if (m instanceof ShorterLengths l) {
                    Scale changed = s;
                    for (Map.Entry<Integer, Double> e : l.newLengths().entrySet()) {
                        Note n = changed.note(e.getKey()).orElseThrow();
                        changed = changed.withNote(n.withSpeakingLength(e.getValue()));
                    }
                    after = maxPct(changed, settings);
                } else if (m instanceof StrongerWire w) {
                    after = maxPct(s, settings.withStrength(settings.strength().scaled(
                            1 + w.requiredStrongerPct() / 100, "required")));
                } else {
                    ThinnerWire t = (ThinnerWire) m;
                    Scale changed = s;
                    for (ThinnerWire.SizeOption o : t.options()) {
                        changed = changed.withNote(changed.note(o.key()).orElseThrow().withWire(o.thinner()));
                    }
                    after = maxPct(changed, settings);
                }
                assertTrue(after < caution, demo + ": " + m.describe() + " gives " + after);
            }
        }
    }
}
