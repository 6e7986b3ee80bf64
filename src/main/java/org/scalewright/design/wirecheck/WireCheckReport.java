package org.scalewright.design.wirecheck;

import java.util.List;
import java.util.Locale;
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

    /**
     * @return how many notes reach the danger band at the peak, in one sentence:
     *         {@code 5 notes at or above the danger band (70 %) at the peak, listed first, highest first.}
     */
    public String riskSummary() {
        double danger = request.settings().bands().danger();
        int n = atRisk().size();
        return n == 0 ? String.format(Locale.ROOT, "No note reaches the danger band (%.0f %%) at the peak.", danger)
                : String.format(Locale.ROOT, "%d note%s at or above the danger band (%.0f %%) at the peak, listed "
                        + "first, highest first.", n, n == 1 ? "" : "s", danger);
    }

    /** @return the advice on raising in stages, in words */
    public StageWords stageWords() {
        return StageWords.of(this);
    }

    /**
     * @return the two strength tables compared in one sentence, or "" when the replacement is judged
     *         by the present table
     */
    public String tablesSummary() {
        if (tables.first().name().equals(tables.second().name())) {
            return "";
        }
        return String.format(Locale.ROOT, "Strength tables compared on the replacement wire: the replacement table "
                + "is %+.1f to %+.1f %% stronger than the present one over these diameters.",
                tables.minSecondStrongerPct(), tables.maxSecondStrongerPct());
    }
}
