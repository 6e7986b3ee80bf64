package org.scalewright.physics;

import java.util.ArrayList;
import java.util.List;
import org.scalewright.model.KeyNames;
import org.scalewright.model.Note;
import org.scalewright.model.NumberText;
import org.scalewright.model.Scale;

/** Analyses a whole scale: every note, neighbour steps, section and instrument totals. */
public final class ScaleAnalyzer {
    private ScaleAnalyzer() {
    }

    /**
     * @param scale    the scale, at its own pitch standard
     * @param settings materials, strength table, bands, neighbour step
     * @return the analysis; the scale is not changed
     */
    public static ScaleAnalysis analyze(Scale scale, AnalysisSettings settings) {
        List<Note> notes = scale.notes();
        int n = notes.size();
        NoteResult[] results = new NoteResult[n];
        for (int i = 0; i < n; i++) {
            results[i] = NoteCalculator.compute(notes.get(i), scale.pitch(), settings);
        }
        addNeighbourSteps(results, settings.neighbourStepPct());
        addWireOrder(results, notes);
        List<Flag> allFlags = new ArrayList<>();
        double total = 0;
        for (NoteResult r : results) {
            allFlags.addAll(r.flags());
            total += load(r);
        }
        return new ScaleAnalysis(scale, settings, List.of(results), sections(results), total, allFlags);
    }

    private static void addNeighbourSteps(NoteResult[] results, double limitPct) {
        for (int i = 1; i < results.length; i++) {
            NoteResult below = results[i - 1];
            NoteResult here = results[i];
            double step = 100.0 * (here.tension() - below.tension()) / below.tension();
            if (Math.abs(step) > limitPct) {
                List<Flag> flags = new ArrayList<>(here.flags());
                flags.add(new Flag(here.key(), FlagKind.NEIGHBOUR_STEP,
                        "tension per string " + NumberText.signed(step, 1) + " % from key " + below.key() + " ("
                        + KeyNames.name(below.key()) + "), more than " + NumberText.fixed(limitPct, 0) + " %"));
                results[i] = withFlags(here, flags);
            }
        }
    }

    private static void addWireOrder(NoteResult[] results, List<Note> notes) {
        List<List<Flag>> order = NoteFlags.wireOrder(notes);
        for (int i = 0; i < results.length; i++) {
            if (!order.get(i).isEmpty()) {
                List<Flag> flags = new ArrayList<>(results[i].flags());
                flags.addAll(order.get(i));
                results[i] = withFlags(results[i], flags);
            }
        }
    }

    private static NoteResult withFlags(NoteResult r, List<Flag> flags) {
        return new NoteResult(r.key(), r.noteName(), r.section(), r.frequency(), r.strings(), r.wound(),
                r.coreDiameter(), r.massPerLength(), r.stiffness(), r.tension(), r.noteTension(), r.stress(),
                r.breakingStrength(), r.breakPct(), r.inharmonicity(), r.headroomCents(), r.breakingFrequency(),
                r.impedance(), r.elongation(), r.band(), flags);
    }

    /**
     * @return the tension a note puts on the plate, N: its strings' tension, or nothing for a note
     *         with no positive tension (impossible as specified; it is flagged, and a negative figure
     *         would only hide the others in a total)
     */
    private static double load(NoteResult r) {
        return NoteCalculator.isPossible(r) ? r.noteTension() : 0;
    }

    private static List<SectionTotal> sections(NoteResult[] results) {
        List<SectionTotal> out = new ArrayList<>();
        int start = 0;
        for (int i = 1; i <= results.length; i++) {
            if (i == results.length || !results[i].section().equals(results[start].section())) {
                double t = 0;
                int strings = 0;
                for (int j = start; j < i; j++) {
                    t += load(results[j]);
                    strings += results[j].strings();
                }
                out.add(new SectionTotal(results[start].section(), results[start].key(), results[i - 1].key(),
                        i - start, strings, t));
                start = i;
            }
        }
        return out;
    }
}
