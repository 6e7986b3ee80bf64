package org.scalewright.design.orders;

import java.util.ArrayList;
import java.util.List;
import org.scalewright.model.Note;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;

/**
 * The wound strings of a scale as an order for a string maker: one row per note with a wound
 * string, to be made as many times as the note has strings.
 *
 * @param rows one row per wound note, bass to treble
 */
public record WoundOrder(List<WoundOrderRow> rows) {

    public WoundOrder {
        rows = List.copyOf(rows);
    }

    /** @return the wound-string order of an analysed scale (empty when it has no wound strings) */
    public static WoundOrder of(ScaleAnalysis analysis) {
        List<WoundOrderRow> rows = new ArrayList<>();
        for (NoteResult r : analysis.notes()) {
            Note n = analysis.scale().note(r.key()).orElseThrow();
            if (!n.isWound()) {
                continue;
            }
            rows.add(new WoundOrderRow(r.key(), r.noteName(), n.section(), r.frequency(), n.strings(),
                    n.wire().diameter(), n.wire().musicWireSize(), n.wrap().inner(), n.wrap().outer(),
                    n.wrap().metal(), n.stretchedLength(), n.woundLength(), n.speakingLength(), r.tension(),
                    r.massPerLength()));
        }
        return new WoundOrder(rows);
    }

    /** @return the number of wound strings to make: the sum of the rows' counts */
    public int totalStrings() {
        return rows.stream().mapToInt(WoundOrderRow::count).sum();
    }
}
