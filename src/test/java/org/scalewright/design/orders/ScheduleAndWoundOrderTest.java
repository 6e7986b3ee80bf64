package org.scalewright.design.orders;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.Note;
import org.scalewright.model.Scale;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

class ScheduleAndWoundOrderTest {
    private final Scale scale = TestScales.generated();
    private final ScaleAnalysis analysis = ScaleAnalyzer.analyze(scale, BuiltInData.defaultSettings());

    @Test
    void theScheduleHasEveryKeyWithItsStringsAndTheAnalysisFigures() {
        StringSchedule s = StringSchedule.of(analysis);
        assertEquals(88, s.rows().size());
        assertEquals(8 * 1 + 20 * 2 + 60 * 3, s.totalStrings());
        for (ScheduleRow r : s.rows()) {
            Note n = scale.note(r.key()).orElseThrow();
            NoteResult res = analysis.result(r.key()).orElseThrow();
            assertEquals(n.strings(), r.strings());
            assertEquals(n.speakingLength(), r.speakingLength());
            assertEquals(n.stretchedLength(), r.stretchedLength());
            assertEquals(n.isWound(), r.wound());
            assertEquals(res.tension(), r.tension());
            assertEquals(res.breakPct(), r.breakPct());
            assertEquals(res.frequency(), r.frequency());
            assertEquals(res.isFlagged(), r.flagged());
        }
        assertNull(s.rows().get(50).wrap());
        assertTrue(s.rows().get(87).stretchedLength().isEmpty());
    }

    @Test
    void theWoundOrderHasARowPerWoundNoteToBeMadeOncePerString() {
        WoundOrder o = WoundOrder.of(analysis);
        assertEquals(28, o.rows().size());
        assertEquals(8 + 20 * 2, o.totalStrings());
        assertEquals(o.rows().stream().mapToInt(WoundOrderRow::count).sum(), o.totalStrings());
        WoundOrderRow first = o.rows().get(0);
        Note n1 = scale.note(1).orElseThrow();
        assertEquals(1, first.count());
        assertTrue(first.doubleWound());
        assertEquals(n1.wrap().inner(), first.wrapInner());
        assertEquals(n1.wrap().outer(), first.wrapOuter());
        assertEquals(n1.woundLength().getAsDouble(), first.woundLength());
        assertEquals(n1.outsideDiameter(), first.outsideDiameter());
        assertEquals(List.of(1), first.keys());
        WoundOrderRow last = o.rows().get(27);
        assertEquals(28, last.key());
        assertEquals(2, last.count());
        assertFalse(last.doubleWound());
    }
}
