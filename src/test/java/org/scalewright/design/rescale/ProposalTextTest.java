package org.scalewright.design.rescale;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Scale;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

/** The proposal's sentences say what the proposal holds, counted here independently of the planner's report. */
class ProposalTextTest {
    @Test
    void theSentencesAgreeWithTheChangesTheyDescribe() {
        for (long seed = 1; seed <= 4; seed++) {
            Scale scale = TestScales.random(seed);
            ScaleAnalysis present = ScaleAnalyzer.analyze(scale, BuiltInData.defaultSettings());
            KeyRange range = new KeyRange(TestScales.lastWound(scale) + 1, 88);
            Proposal p = PlainPlanner.plan(present, range, PlainPlanner.target(present, range, TargetSpec.loess(0.5),
                    false), PlainPlanOptions.of(PlainPlanOptions.sizesOf(BuiltInData.musicWireSizes()), 70));

            assertTrue(ProposalText.headline(p).startsWith("Plain wire for keys " + range + ", target: "),
                    ProposalText.headline(p));
            long changed = p.changes().stream()
                    .filter(c -> Math.abs(c.before().wire().diameter() - c.after().wire().diameter()) > 1e-12).count();
            assertTrue(ProposalText.changed(p).startsWith("Keys changed: " + changed + " of " + p.changes().size() + ";"),
                    ProposalText.changed(p));

            NoteResult top = p.changes().get(0).afterResult();
            boolean under = true;
            for (KeyChange c : p.changes()) {
                NoteResult a = c.afterResult();
                top = a.breakPct() > top.breakPct() ? a : top;
                under &= a.breakPct() <= 70;
            }
            assertEquals(String.format(Locale.ROOT, "All planned strings at or under 70 %% of breaking strength: %s "
                    + "(highest %.1f %% at key %d %s)", under ? "yes" : "NO", top.breakPct(), top.key(), top.noteName()),
                    ProposalText.maximum(p));

            List<String> lines = ProposalText.summary(p);
            assertEquals(p.limits().size(), lines.stream().filter(l -> l.startsWith("Limit: ")).count());
            assertEquals(p.notes().size(), lines.stream().filter(l -> l.startsWith("Note: ")).count());
            assertTrue(lines.stream().noneMatch(String::isBlank));
        }
    }

    @Test
    void percentsAreWrittenWithoutFloatNoise() {
        assertEquals("70", ProposalText.upToOneDecimal(70));
        assertEquals("72.5", ProposalText.upToOneDecimal(72.5));
        assertEquals("8.1", ProposalText.upToOneDecimal(8.1000000000000001));
        assertEquals("No proposal: one. two.", ProposalText.noProposal(List.of("one.", "two.")));
    }
}
