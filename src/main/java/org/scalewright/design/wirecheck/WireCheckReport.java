package org.scalewright.design.wirecheck;

import java.util.List;
import java.util.Optional;

/**
 * The result of a wire check.
 *
 * @param request    what was asked
 * @param notes      one entry per note: those over the danger band at the peak first (highest
 *                   peak first), then the rest from bass to treble
 * @param totals     total tension on the plate in the present state, at the target and at the peak
 * @param tables     the present and replacement strength tables compared on the replacement wire
 * @param stages     the advice on raising in stages
 */
public record WireCheckReport(WireCheckRequest request, List<WireCheckNote> notes, TensionTotals totals,
                              StrengthComparison tables, StageAdvice stages) {

    public WireCheckReport {
        notes = List.copyOf(notes);
    }

    /** @return the notes over the danger band at the peak, highest peak first */
    public List<WireCheckNote> atRisk() {
        return notes.stream().filter(WireCheckNote::overDanger).toList();
    }

    /** @return the notes from bass to treble (for drawing over the curves) */
    public List<WireCheckNote> byKey() {
        return notes.stream().sorted(java.util.Comparator.comparingInt(WireCheckNote::key)).toList();
    }

    /** @return the entry of a key, if the scale has it */
    public Optional<WireCheckNote> note(int key) {
        return notes.stream().filter(n -> n.key() == key).findFirst();
    }

    /** @return the notes whose wire the size conversion changed */
    public List<WireCheckNote> converted() {
        return byKey().stream().filter(n -> n.wireChange().changed()).toList();
    }

    /** @return the conversion remarks worth showing (fell back to the nearest end of the list) */
    public List<WireCheckNote> conversionWarnings() {
        return byKey().stream().filter(n -> n.wireChange().remark().startsWith("no ")).toList();
    }
}
