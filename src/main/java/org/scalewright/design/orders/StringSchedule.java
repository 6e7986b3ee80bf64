package org.scalewright.design.orders;

import java.util.ArrayList;
import java.util.List;
import org.scalewright.model.Note;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;

/**
 * The string schedule of a scale: per key the strings, the plain wire size or the wound
 * string's specification, the lengths, and the per-string tension and percent of breaking
 * strength at the working pitch.
 *
 * @param rows one row per key, bass to treble
 */
public record StringSchedule(List<ScheduleRow> rows) {

    public StringSchedule {
        rows = List.copyOf(rows);
    }

    /** @return the schedule of an analysed scale */
    public static StringSchedule of(ScaleAnalysis analysis) {
        List<ScheduleRow> rows = new ArrayList<>(analysis.notes().size());
        for (NoteResult r : analysis.notes()) {
            Note n = analysis.scale().note(r.key()).orElseThrow();
            rows.add(new ScheduleRow(r.key(), r.noteName(), n.section(), n.strings(), r.frequency(),
                    n.wire().musicWireSize(), n.wire().diameter(), n.wrap(), n.speakingLength(),
                    n.stretchedLength(), r.tension(), r.breakPct(), r.isFlagged()));
        }
        return new StringSchedule(rows);
    }

    /** @return the number of strings over all keys */
    public int totalStrings() {
        return rows.stream().mapToInt(ScheduleRow::strings).sum();
    }
}
