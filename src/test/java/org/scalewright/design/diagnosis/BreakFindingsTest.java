package org.scalewright.design.diagnosis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.BreakActivity;
import org.scalewright.model.BreakPlace;
import org.scalewright.model.CoreWire;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.model.StringBreak;

/**
 * What recorded breaks add to a diagnosis, on a scale made for the test: keys 40-60 of plain wire,
 * lengths falling smoothly toward the treble, sections "treble" (40-50) and "capo" (51-60), key 55
 * 15 % too long (hot) and key 45 10 % too short (cool).
 */
class BreakFindingsTest {
    private static DiagnosisRequest request(KeyRange range) {
        List<Note> notes = new ArrayList<>();
        for (int k = 40; k <= 60; k++) {
            double l = 0.62 * Math.pow(0.9445, k - 40) * (k == 55 ? 1.15 : k == 45 ? 0.9 : 1.0);
            Note n = Note.plain(k, 3, l, CoreWire.ofDiameter(0.95e-3));
            notes.add(new Note(k, 3, l, n.wire(), null, OptionalDouble.empty(), 0, OptionalDouble.empty(),
                    OptionalDouble.empty(), OptionalDouble.empty(), k <= 50 ? "treble" : "capo", ""));
        }
        Scale scale = new Scale("test", PitchStandard.ISO_16, notes, null);
        return DiagnosisRequest.of(scale, range, BuiltInData.defaultSettings(), BuiltInData.musicWireSizes(),
                BuiltInData.metricPlainWire());
    }

    private static StringBreak at(int key, Double hz, BreakActivity during, BreakPlace place, String batch) {
        return new StringBreak(LocalDate.of(2026, 5, key % 28 + 1), key, OptionalInt.empty(),
                hz == null ? OptionalDouble.empty() : OptionalDouble.of(hz), during, place, batch, "");
    }

    private static DiagnosisReport diagnose(KeyRange range, List<StringBreak> breaks) {
        return SectionDiagnosis.diagnose(request(range), breaks);
    }

    @Test
    void breaksOnTheHotNoteFollowStressOneSectionOnePlaceOneBatch() {
        List<StringBreak> breaks = List.of(
                at(55, 800.0, BreakActivity.PITCH_RAISE, BreakPlace.FRONT_BEARING, "coil 7"),
                at(55, null, BreakActivity.TUNING, BreakPlace.FRONT_BEARING, "coil 7"),
                at(56, null, BreakActivity.PLAYING, BreakPlace.UNKNOWN, ""),
                at(30, null, BreakActivity.PLAYING, BreakPlace.UNKNOWN, ""));
        DiagnosisReport r = diagnose(new KeyRange(45, 60), breaks);
        BreakFindings f = r.breaks();
        assertEquals(3, f.strings().size());
        assertEquals(1, f.outsideRange());
        assertTrue(f.followsStress(), "55 stands out high, 56 is above the section's middle");
        assertEquals(Optional.of("capo"), f.section());
        assertEquals(Optional.of(BreakPlace.FRONT_BEARING), f.place());
        assertEquals(Optional.of("coil 7"), f.batch());
        String words = String.join("\n", r.finding().explanation());
        assertTrue(words.contains("Recorded breaks: 3 strings broke on keys 45-60 (55 D#5 \u00d72, 56 E5); 1 more "
                + "outside keys 45-60"), words);
        assertTrue(words.contains("The breaks follow stress"), words);
        assertTrue(words.contains("all lie in one section (capo)"), words);
        assertTrue(words.contains("2 of the 2 with a recorded place broke at the front bearing"), words);
        assertTrue(words.contains("wire of batch 'coil 7'"), words);
        assertTrue(words.contains("Wear eye protection"), "a break in a pitch raise brings the caution");
        // the stress at break is the stress at the break pitch (physics.StressAtBreak), beside the working one
        BrokenString hot = f.strings().stream().filter(s -> s.atBreak().isPresent()).findFirst().orElseThrow();
        double working = hot.working().stress();
        double ratio = 800.0 / hot.working().frequency();
        assertEquals(working * ratio * ratio, hot.atBreak().orElseThrow().stress(),
                1e-3 * working, "stress grows as f² (less the stiffness term)");
    }

    @Test
    void breaksOnTheCoolNoteDoNotFollowStressAndTellNoCautionWithoutAPitchRaise() {
        List<StringBreak> breaks = List.of(
                at(45, null, BreakActivity.TUNING, BreakPlace.TUNING_PIN, "a"),
                at(46, null, BreakActivity.PLAYING, BreakPlace.HITCH_PIN, "b"));
        DiagnosisReport r = diagnose(new KeyRange(40, 50), breaks);
        BreakFindings f = r.breaks();
        assertFalse(f.followsStress(), "45 stands out low");
        assertEquals(Optional.empty(), f.section(), "the range holds only one section");
        assertEquals(Optional.empty(), f.place());
        assertEquals(Optional.empty(), f.batch());
        String words = String.join("\n", r.finding().explanation());
        assertTrue(words.contains("do not follow stress"), words);
        assertTrue(words.contains("different places along the string"), words);
        assertTrue(words.contains("more than one batch"), words);
        assertTrue(words.contains("No pitch at break was recorded"), words);
        assertFalse(words.contains("Wear eye protection"), words);
    }

    @Test
    void aBreakUnderTheTablesStrengthIsReadAsAWeakOrDamagedWire() {
        DiagnosisRequest q = request(new KeyRange(50, 60));
        double working = SectionDiagnosis.diagnose(q).notes().stream().filter(n -> n.key() == 52).findFirst()
                .orElseThrow().result().frequency();
        DiagnosisReport r = SectionDiagnosis.diagnose(q, List.of(at(52, working * 1.01, BreakActivity.TUNING,
                BreakPlace.BRIDGE, "")));
        assertTrue(r.breaks().strings().get(0).atBreak().orElseThrow().ratio() < 0.9);
        assertTrue(String.join("\n", r.finding().explanation()).contains("the wire was weaker than the table"));
    }

    @Test
    void noBreaksLeaveTheFindingAsItWas() {
        DiagnosisRequest q = request(new KeyRange(50, 60));
        assertEquals(SectionDiagnosis.diagnose(q).finding(), SectionDiagnosis.diagnose(q, List.of()).finding());
        assertEquals(BreakFindings.NONE, SectionDiagnosis.diagnose(q, List.of()).breaks());
    }
}
