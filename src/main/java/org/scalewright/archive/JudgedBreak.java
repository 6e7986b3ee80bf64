package org.scalewright.archive;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.scalewright.model.Note;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.StressAtBreak;

/**
 * A recorded break with the stress its string was under when it broke, where that can be told: the
 * pitch at break is known and the break is judged on a scale version holding its key.
 *
 * @param archived the break as kept
 * @param stress   the stress at break and its ratio to the strength table, when known
 */
public record JudgedBreak(ArchivedBreak archived, Optional<StressAtBreak> stress) {

    /**
     * @param settings materials and the strength table the breaks are compared with
     * @return every break of the instrument, by date, each judged on its own scale version
     */
    public static List<JudgedBreak> all(Archive archive, String name, AnalysisSettings settings) {
        Map<Integer, Scale> scales = new HashMap<>();
        List<JudgedBreak> out = new ArrayList<>();
        for (ArchivedBreak b : archive.breaks(name)) {
            Optional<StressAtBreak> stress = Optional.empty();
            if (b.record().breakHz().isPresent() && b.version().isPresent()) {
                Scale scale = scales.computeIfAbsent(b.version().getAsInt(),
                        v -> archive.scaleOf(name, archive.version(name, v)));
                Optional<Note> note = scale.note(b.record().key());
                if (note.isPresent()) {
                    stress = Optional.of(StressAtBreak.of(note.get(), b.record().breakHz().getAsDouble(), settings));
                }
            }
            out.add(new JudgedBreak(b, stress));
        }
        return out;
    }
}
