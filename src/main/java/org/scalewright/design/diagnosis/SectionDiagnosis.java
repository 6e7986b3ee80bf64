package org.scalewright.design.diagnosis;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.Note;
import org.scalewright.model.Scale;
import org.scalewright.model.StringBreak;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.NoteCalculator;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.StringPhysics;

/**
 * Diagnoses a key range where strings break (DESIGN §5, diagnose): per note stress, percent of
 * breaking strength, headroom and the pitch at which the string reaches the table's strength;
 * the notes standing out from a robust smooth trend of their section; and a finding: what sets
 * the stress (length and pitch, or the wire), which changes would bring the range under the
 * caution band, each verified by recomputing, and what a technician should inspect.
 *
 * <p>A section is a run of consecutive notes of the scale with the same section label and the
 * same kind of string (plain or wound); its trend is fitted over all its notes, also those
 * outside the range, so that a range of only the breaking notes is still compared with its
 * neighbours.
 */
public final class SectionDiagnosis {
    /** The remedies aim this many percentage points under the caution band, so that it is clearly left. */
    public static final double AIM_BELOW_CAUTION = 0.5;

    private SectionDiagnosis() {
    }

    /**
     * @param request the scale, range, settings and candidate tables
     * @return the report; the scale is not changed
     * @throws InvalidInput when the range holds a note whose tension is not positive (DESIGN §3), one
     *         line per such key; such notes outside the range are left out of their section's trend
     */
    public static DiagnosisReport diagnose(DiagnosisRequest request) {
        Scale scale = request.scale();
        AnalysisSettings settings = request.settings();
        double aim = aim(settings);
        List<DiagnosedNote> out = new ArrayList<>();
        List<Note> notes = possibleNotes(request);
        int start = 0;
        for (int i = 1; i <= notes.size(); i++) {
            if (i == notes.size() || !sameSection(notes.get(i), notes.get(start))) {
                List<Note> section = notes.subList(start, i);
                if (section.stream().anyMatch(n -> request.range().contains(n.key()))) {
                    out.addAll(section(request, section, aim));
                }
                start = i;
            }
        }
        Finding finding = FindingWriter.write(request, out);
        return new DiagnosisReport(request, out, finding);
    }

    /**
     * A diagnosis that also takes in the breaks recorded for the instrument: how many broke where in
     * the range, at what stress and headroom, and whether they follow stress, one section, a bearing
     * point or one batch of wire ({@link BreakFindings}); their paragraphs follow the finding's.
     *
     * @param request the scale, range, settings and candidate tables
     * @param breaks  the instrument's recorded breaks, any keys (those outside the range are only counted)
     * @return the report with {@link DiagnosisReport#breaks()}; the scale is not changed
     * @throws InvalidInput as {@link #diagnose(DiagnosisRequest)}
     */
    public static DiagnosisReport diagnose(DiagnosisRequest request, List<StringBreak> breaks) {
        DiagnosisReport plain = diagnose(request);
        BreakFindings found = BreakFindings.of(request, plain.notes(), breaks);
        return new DiagnosisReport(request, plain.notes(), plain.finding().withMore(found.words()), found);
    }

    /**
     * @return the notes of the scale with a positive tension; a note without one has no stress to
     *         compare, so it is left out of its section's trend
     * @throws InvalidInput naming each note of the range with no positive tension
     */
    private static List<Note> possibleNotes(DiagnosisRequest request) {
        List<Note> possible = new ArrayList<>();
        List<String> impossible = new ArrayList<>();
        for (Note n : request.scale().notes()) {
            NoteResult r = NoteCalculator.compute(n, request.scale().pitch(), request.settings());
            if (NoteCalculator.isPossible(r)) {
                possible.add(n);
            } else if (request.range().contains(n.key())) {
                impossible.add(request.scale().layout().placeOf(n.key()) + NoteCalculator.impossibility(n, r));
            }
        }
        if (!impossible.isEmpty()) {
            impossible.add("keys " + request.range() + " are not diagnosed: correct the speaking length or wire of "
                    + (impossible.size() == 1 ? "that key" : "those keys") + " in the sheet, or diagnose a range "
                    + "without " + (impossible.size() == 1 ? "it" : "them"));
            throw new InvalidInput(String.join("\n", impossible));
        }
        return possible;
    }

    /** @return the percent the remedies aim for: just under the caution band, % */
    static double aim(AnalysisSettings settings) {
        return settings.bands().caution() - AIM_BELOW_CAUTION;
    }

    private static boolean sameSection(Note a, Note b) {
        return a.section().equals(b.section()) && a.isWound() == b.isWound();
    }

    private static List<DiagnosedNote> section(DiagnosisRequest request, List<Note> section, double aim) {
        AnalysisSettings settings = request.settings();
        int n = section.size();
        double[] keys = new double[n];
        double[] pct = new double[n];
        double[] lnL = new double[n];
        double[] lnF = new double[n];
        double[] lnMass = new double[n];
        double[] lnStrength = new double[n];
        NoteResult[] results = new NoteResult[n];
        for (int i = 0; i < n; i++) {
            Note note = section.get(i);
            NoteResult r = NoteCalculator.compute(note, request.scale().pitch(), settings);
            results[i] = r;
            keys[i] = note.key();
            pct[i] = r.breakPct();
            lnL[i] = Math.log(note.speakingLength());
            lnF[i] = Math.log(r.frequency());
            lnMass[i] = Math.log(r.massPerLength() / StringPhysics.area(r.coreDiameter()));
            lnStrength[i] = Math.log(r.breakingStrength());
        }
        SectionTrend trend = SectionTrend.fit(keys, pct, request.marginPct());
        double[] t = trend.trend();
        double[] tL = trend.trendOf(lnL);
        double[] tF = trend.trendOf(lnF);
        double[] tM = trend.trendOf(lnMass);
        double[] tS = trend.trendOf(lnStrength);
        List<DiagnosedNote> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Note note = section.get(i);
            if (!request.range().contains(note.key())) {
                continue;
            }
            NoteResult r = results[i];
            double dev = SectionTrend.deviationPct(pct[i], t[i]);
            boolean standsOut = Math.abs(dev) > request.marginPct();
            DiagnosedNote.Shares shares = new DiagnosedNote.Shares(pctOf(2 * (lnL[i] - tL[i])),
                    pctOf(2 * (lnF[i] - tF[i])), pctOf(lnMass[i] - tM[i]), pctOf(-(lnStrength[i] - tS[i])));
            OptionalDouble forTrend = standsOut && dev > 0
                    ? OptionalDouble.of(LengthSolver.lengthFor(note, r.frequency(),
                    t[i] / 100 * r.breakingStrength(), settings.materials()))
                    : OptionalDouble.empty();
            OptionalDouble needed = r.breakPct() >= aim
                    ? OptionalDouble.of(Remedies.roundDown(LengthSolver.lengthFor(note, r.frequency(),
                    aim / 100 * r.breakingStrength(), settings.materials()), 0.0005))
                    : OptionalDouble.empty();
            out.add(new DiagnosedNote(r, note.speakingLength(), t[i], dev, standsOut, Math.exp(tL[i]), shares,
                    forTrend, needed));
        }
        return out;
    }

    private static double pctOf(double logRatio) {
        return 100.0 * (Math.exp(logRatio) - 1);
    }
}
