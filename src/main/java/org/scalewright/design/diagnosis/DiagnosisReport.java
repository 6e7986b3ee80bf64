package org.scalewright.design.diagnosis;

import java.util.List;

/**
 * The result of a section diagnosis.
 *
 * @param request what was asked
 * @param notes   the notes of the range, bass to treble
 * @param finding the finding in plain words with its remedies
 * @param breaks  what the breaks recorded for the instrument say ({@link BreakFindings#NONE} without them)
 */
public record DiagnosisReport(DiagnosisRequest request, List<DiagnosedNote> notes, Finding finding,
                              BreakFindings breaks) {
    public DiagnosisReport {
        notes = List.copyOf(notes);
        breaks = breaks == null ? BreakFindings.NONE : breaks;
    }

    /** A report without recorded breaks. */
    public DiagnosisReport(DiagnosisRequest request, List<DiagnosedNote> notes, Finding finding) {
        this(request, notes, finding, BreakFindings.NONE);
    }

    /** @return the notes that stand out from their section's trend (above or below) */
    public List<DiagnosedNote> standingOut() {
        return notes.stream().filter(DiagnosedNote::standsOut).toList();
    }

    /** @return the highest percent of breaking strength in the range, % */
    public double maxPct() {
        return notes.stream().mapToDouble(DiagnosedNote::breakPct).max().orElse(0);
    }

    /** @return true when every note of the range is under the caution band */
    public boolean underCaution() {
        return maxPct() < request.settings().bands().caution();
    }
}
