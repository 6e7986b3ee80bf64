package org.scalewright.physics;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Scale;

/**
 * The analysis of a whole scale: per-note results, section totals, whole-instrument total
 * tension and all flags.
 *
 * @param scale        the scale analysed
 * @param settings     the settings used
 * @param notes        one result per note, bass to treble
 * @param sections     totals per section, bass to treble (a change of label starts a section)
 * @param totalTension sum over the notes of strings × tension per string, N
 * @param flags        every flag raised, bass to treble
 */
public record ScaleAnalysis(Scale scale, AnalysisSettings settings, List<NoteResult> notes,
                            List<SectionTotal> sections, double totalTension, List<Flag> flags) {

    public ScaleAnalysis {
        notes = List.copyOf(notes);
        sections = List.copyOf(sections);
        flags = List.copyOf(flags);
    }

    /** @return the result of a key, if the scale has it */
    public Optional<NoteResult> result(int key) {
        for (NoteResult r : notes) {
            if (r.key() == key) {
                return Optional.of(r);
            }
        }
        return Optional.empty();
    }

    /**
     * @param range the keys asked about
     * @return for each note of the range whose tension is not positive ({@link NoteCalculator#isPossible}),
     *         bass to treble, the impossibility named ({@link NoteCalculator#impossibility})
     */
    public List<String> impossibleIn(KeyRange range) {
        List<String> out = new ArrayList<>();
        for (NoteResult r : notes) {
            if (range.contains(r.key()) && !NoteCalculator.isPossible(r)) {
                scale.note(r.key()).ifPresent(n -> out.add(scale.layout().placeOf(n.key())
                        + NoteCalculator.impossibility(n, r)));
            }
        }
        return out;
    }

    /** @return the number of notes with at least one flag */
    public long flaggedNoteCount() {
        return notes.stream().filter(NoteResult::isFlagged).count();
    }

    /** @return how many notes carry a flag shown as danger ({@link FlagKind#isDanger()}) */
    public long dangerNoteCount() {
        return notes.stream().filter(r -> r.flags().stream().anyMatch(f -> f.kind().isDanger())).count();
    }
}
