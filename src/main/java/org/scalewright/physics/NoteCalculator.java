package org.scalewright.physics;

import org.scalewright.model.KeyNames;
import org.scalewright.model.Materials;
import org.scalewright.model.Note;
import org.scalewright.model.NumberText;
import org.scalewright.model.PitchStandard;

/**
 * Computes one note's strings at a given pitch. The flags of a single note (bands,
 * implausible values, strength-table range) are raised here; neighbour steps are the
 * {@link ScaleAnalyzer}'s.
 */
public final class NoteCalculator {
    private NoteCalculator() {
    }

    /**
     * @return true when the note's strings have a positive, finite tension at its pitch; false when
     *         T = 4 L² μ f² − K ≤ 0: the wire is too stiff for its speaking length at that pitch, and
     *         no figure of the note (stress, B, headroom) describes a string that can exist
     */
    public static boolean isPossible(NoteResult r) {
        return r.tension() > 0 && Double.isFinite(r.tension());
    }

    /**
     * @param note the note
     * @param r    its result
     * @return the impossibility named for a person: {@code key 1 (A0): no positive tension: a 2.500 mm
     *         wire is too stiff for a speaking length of 60.0 mm at 27.50 Hz (4 L² μ f² − K = −135.6 N)}
     */
    public static String impossibility(Note note, NoteResult r) {
        return "key " + r.key() + " (" + r.noteName() + "): no positive tension: a "
                + NumberText.fixed(r.coreDiameter() * 1e3, 3) + " mm " + (r.wound() ? "core" : "wire")
                + " is too stiff for a speaking length of " + NumberText.fixed(note.speakingLength() * 1e3, 1)
                + " mm at " + NumberText.fixed(r.frequency(), 2) + " Hz (4 L\u00b2 \u03bc f\u00b2 \u2212 K = "
                + NumberText.fixed(r.tension(), 1) + " N)";
    }

    /**
     * @param note     the note
     * @param pitch    the scale's pitch standard
     * @param settings materials, strength table, bands
     * @return the note's result at its working pitch
     */
    public static NoteResult compute(Note note, PitchStandard pitch, AnalysisSettings settings) {
        return computeAt(note, Pitch.working(note, pitch), settings);
    }

    /**
     * @param note      the note
     * @param frequency the pitch to compute at, Hz, &gt; 0
     * @param settings  materials, strength table, bands
     * @return the note's result at {@code frequency}
     */
    public static NoteResult computeAt(Note note, double frequency, AnalysisSettings settings) {
        Materials m = settings.materials();
        double d = note.wire().diameter();
        double length = note.speakingLength();
        double mu = massForFundamental(note, m);
        double k = StringPhysics.stiffness(d, length, m.youngsModulus());
        double t = StringPhysics.tension(length, mu, frequency, k);
        double sigma = StringPhysics.stress(t, d);
        double sigmaB = settings.strength().strengthAt(d);
        double pct = 100.0 * sigma / sigmaB;
        double b = StringPhysics.inharmonicity(k, t);
        double fb = StringPhysics.breakingFrequency(sigmaB, d, k, length, mu);
        double headroom = Pitch.cents(frequency, fb);
        double z = StringPhysics.impedance(t, mu);
        double dl = StringPhysics.elongation(t, note.elongationLength(), d, m.youngsModulus());
        StressBand band = settings.bands().bandOf(pct);
        var flags = NoteFlags.of(note, pct, t, band, settings);
        return new NoteResult(note.key(), KeyNames.name(note.key()), note.section(), frequency, note.strings(),
                note.isWound(), d, mu, k, t, note.strings() * t, sigma, sigmaB, pct, b, headroom, fb, z, dl,
                band, flags);
    }

    /**
     * The mass per length that tunes the note's fundamental: the wound (or plain) string's μ,
     * or, where bare core lies inside the speaking length at either end, the effective μ
     * ({@link StringPhysics#effectiveMassPerLength}). The bare ends are the note's
     * ({@link Note#bareEnds()}): as the sheet's {@code bare_front}/{@code bare_back} give them,
     * else with only the wound length given the bare core (L − wound) split equally between the
     * two ends (DESIGN §3). A wound length equal to or longer than the speaking length leaves no
     * bare core inside it.
     *
     * @param note the note
     * @param m    material densities
     * @return μ for the fundamental, kg/m
     */
    public static double massForFundamental(Note note, Materials m) {
        double d = note.wire().diameter();
        double mu = StringPhysics.massPerLength(d, note.wrap(), m);
        Note.BareEnds bare = note.bareEnds();
        if (!bare.any()) {
            return mu;
        }
        return StringPhysics.effectiveMassPerLength(mu, StringPhysics.plainMassPerLength(d, m.steelDensity()),
                note.speakingLength(), bare.front(), bare.back());
    }
}
