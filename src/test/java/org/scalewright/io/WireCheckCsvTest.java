package org.scalewright.io;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.scalewright.design.wirecheck.PitchState;
import org.scalewright.design.wirecheck.StageWords;
import org.scalewright.design.wirecheck.WireCheckReport;
import org.scalewright.design.wirecheck.Asked;
import org.scalewright.model.Scale;

/** The wire-check CSV's comment lines carry the stage advice in the one wording of the tool. */
class WireCheckCsvTest {
    @Test
    void theStageAdviceInTheCommentsIsTheToolsOwnWordsWithTheNoteOverTheBandNamed() throws Exception {
        // the README's example: the demo grand, the invented specimen table, 40 cents flat, 25 % overpull
        Scale s = ScaleSheetReader.standard().read(Path.of("demo-instruments", "grand-190", "grand-190.csv"));
        WireCheckReport r = Asked.run(Asked.of(s, BuiltInData.defaultSettings())
                .withReplacement(StrengthTableReader.read(
                        Path.of("scales", "wire-makers", "specimen-wire-mill-mm-load-n.csv")))
                .withFlat(PitchState.uniform(40)).withOverpull(25));
        List<String> comments = WireCheckCsv.comments(r);
        StageWords w = r.stageWords();
        assertFalse(r.stages().dangerAtTarget().isEmpty(), "the example has a note over the band at the target");
        for (String reason : w.reasons()) {
            assertTrue(comments.contains("  because " + reason), reason + " in " + comments);
        }
        for (String pass : w.passes()) {
            assertTrue(comments.contains("  " + pass), pass + " in " + comments);
        }
        assertTrue(comments.contains("  " + w.closing()), comments.toString());
        assertFalse(comments.stream().anyMatch(c -> c.contains("and under the danger band at its peak")));
    }
}
