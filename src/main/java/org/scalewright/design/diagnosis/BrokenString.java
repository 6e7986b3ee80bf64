package org.scalewright.design.diagnosis;

import java.util.Optional;
import org.scalewright.model.StringBreak;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.StressAtBreak;

/**
 * A recorded break on a note of the diagnosed range.
 *
 * @param record  the break as recorded
 * @param working the note at its working pitch (percent of breaking strength, headroom)
 * @param atBreak the stress at the pitch it broke at, when that pitch was recorded
 */
public record BrokenString(StringBreak record, NoteResult working, Optional<StressAtBreak> atBreak) {
    public int key() {
        return record.key();
    }
}
