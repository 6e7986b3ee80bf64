package org.scalewright.design.diagnosis;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.TreeMap;
import org.scalewright.model.CoreWire;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.model.WireSize;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.NoteCalculator;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.StrengthTable;
import org.scalewright.physics.StringPhysics;

/**
 * The changes that would bring a range under the caution band. Each is computed to aim just
 * under the band, rounded to what a technician would set (A4 down to 0.1 Hz, lengths down to
 * 0.5 mm, strength up to 0.1 %), applied to a copy of the scale and recomputed through the
 * physics: its effect is the recomputed highest percent of the range. A thinner size is the
 * largest of the next {@link #MAX_STEPS_THINNER} thinner sizes that brings the note under the
 * band; when none does, the better of them is shown with its (not enough) effect.
 */
public final class Remedies {
    /**
     * Thinner sizes are tried only this many steps down the size list (one full music-wire size,
     * or 0.05 mm metric): further down the tension and tone of the note change too much to count
     * as the same string.
     */
    public static final int MAX_STEPS_THINNER = 2;

    private Remedies() {
    }

    /**
     * A copy of the scale tuned to another pitch standard; notes with an explicit pitch move by
     * the same ratio.
     *
     * @param scale the scale
     * @param newA4 the new pitch standard, Hz, in (0, 1000)
     */
    public static Scale atPitchStandard(Scale scale, double newA4) {
        double ratio = newA4 / scale.pitch().a4();
        List<Note> notes = scale.notes().stream().map(n -> n.pitchHz().isPresent()
                ? n.withPitch(OptionalDouble.of(n.pitchHz().getAsDouble() * ratio), n.cents()) : n).toList();
        return scale.withNotes(notes).withPitch(new PitchStandard(newA4));
    }

    /**
     * @return the highest percent of breaking strength over the notes of {@code range}, recomputed, %
     */
    public static double maxPct(Scale scale, KeyRange range, AnalysisSettings settings) {
        double max = Double.NEGATIVE_INFINITY;
        for (Note n : scale.notesIn(range)) {
            max = Math.max(max, NoteCalculator.compute(n, scale.pitch(), settings).breakPct());
        }
        return max;
    }

    static List<Remedy> all(DiagnosisRequest request, List<DiagnosedNote> notes, StressCause cause) {
        double aim = SectionDiagnosis.aim(request.settings());
        List<DiagnosedNote> inRange = notes.stream().filter(n -> request.range().contains(n.key())).toList();
        LowerPitch pitch = lowerPitch(request, inRange, aim);
        StrongerWire stronger = strongerWire(request, inRange, aim);
        ShorterLengths lengths = shorterLengths(request, inRange);
        ThinnerWire thinner = thinnerWire(request, inRange, aim);
        List<Remedy> list = new ArrayList<>();
        if (cause == StressCause.WIRE) {
            list.add(stronger);
            list.add(thinner);
            list.add(lengths);
            list.add(pitch);
        } else {
            list.add(lengths);
            list.add(pitch);
            list.add(stronger);
            list.add(thinner);
        }
        return list;
    }

    static LowerPitch lowerPitch(DiagnosisRequest request, List<DiagnosedNote> notes, double aim) {
        double ratio = Double.POSITIVE_INFINITY;
        for (DiagnosedNote d : notes) {
            NoteResult r = d.result();
            double fAim = StringPhysics.breakingFrequency(aim / 100 * r.breakingStrength(), r.coreDiameter(),
                    r.stiffness(), d.speakingLength(), r.massPerLength());
            ratio = Math.min(ratio, fAim / r.frequency());
        }
        Scale scale = request.scale();
        double a4 = scale.pitch().a4();
        double newA4 = Math.min(a4, roundDown(a4 * ratio, 0.1));
        double after = maxPct(atPitchStandard(scale, newA4), request.range(), request.settings());
        return new LowerPitch(a4, newA4, after, after < request.settings().bands().caution());
    }

    static StrongerWire strongerWire(DiagnosisRequest request, List<DiagnosedNote> notes, double aim) {
        AnalysisSettings settings = request.settings();
        double caution = settings.bands().caution();
        double factor = notes.stream().mapToDouble(d -> d.breakPct() / aim).max().orElse(1);
        double requiredPct = Math.max(0, roundUp(100 * (factor - 1), 0.1));
        StrengthTable present = settings.strength();
        double withRequired = maxPct(request.scale(), request.range(),
                settings.withStrength(present.scaled(1 + requiredPct / 100, present.name() + " +" + requiredPct + " %")));
        List<StrongerWire.TableOption> options = new ArrayList<>();
        for (StrengthTable t : request.candidates()) {
            double m = maxPct(request.scale(), request.range(), settings.withStrength(t));
            options.add(new StrongerWire.TableOption(t, m, m < caution));
        }
        return new StrongerWire(present.name(), requiredPct, withRequired, withRequired < caution, options);
    }

    static ShorterLengths shorterLengths(DiagnosisRequest request, List<DiagnosedNote> notes) {
        TreeMap<Integer, Double> was = new TreeMap<>();
        TreeMap<Integer, Double> now = new TreeMap<>();
        Scale changed = request.scale();
        for (DiagnosedNote d : notes) {
            if (d.lengthNeeded().isPresent()) {
                double l = d.lengthNeeded().getAsDouble();
                was.put(d.key(), d.speakingLength());
                now.put(d.key(), l);
                changed = changed.withNote(changed.note(d.key()).orElseThrow().withSpeakingLength(l));
            }
        }
        double after = maxPct(changed, request.range(), request.settings());
        return new ShorterLengths(was, now, after, after < request.settings().bands().caution());
    }

    static ThinnerWire thinnerWire(DiagnosisRequest request, List<DiagnosedNote> notes, double aim) {
        AnalysisSettings settings = request.settings();
        List<ThinnerWire.SizeOption> options = new ArrayList<>();
        List<Integer> wound = new ArrayList<>();
        Scale changed = request.scale();
        for (DiagnosedNote d : notes) {
            if (d.breakPct() < aim) {
                continue;
            }
            Note note = request.scale().note(d.key()).orElseThrow();
            if (note.isWound()) {
                wound.add(d.key());
                continue;
            }
            ThinnerWire.SizeOption chosen = null;
            int tried = 0;
            for (CoreWire w : thinnerThan(note.wire(), request)) {
                NoteResult r = NoteCalculator.compute(note.withWire(w), request.scale().pitch(), settings);
                ThinnerWire.SizeOption o = new ThinnerWire.SizeOption(d.key(), note.wire(), w, d.breakPct(),
                        r.breakPct(), 100 * (r.tension() / d.result().tension() - 1), r.breakPct() < aim);
                tried++;
                if (o.enough()) {
                    chosen = o;
                    break;
                }
                if (chosen == null || o.pctAfter() < chosen.pctAfter()) {
                    chosen = o;
                }
                if (tried == MAX_STEPS_THINNER) {
                    break;
                }
            }
            if (chosen != null) {
                options.add(chosen);
                changed = changed.withNote(note.withWire(chosen.thinner()));
            }
        }
        double after = maxPct(changed, request.range(), settings);
        return new ThinnerWire(options, wound, after, after < settings.bands().caution());
    }

    /**
     * The offered wires thinner than {@code w}, thickest first, in the wire's own size system:
     * music-wire sizes for a wire given by size or with a size's diameter, else metric diameters
     * where the wire is one, else whichever list has a diameter closer to it.
     */
    static List<CoreWire> thinnerThan(CoreWire w, DiagnosisRequest request) {
        double d = w.diameter();
        double tol = 1e-7;
        boolean inch;
        if (request.sizes() == null) {
            inch = false;
        } else if (request.metricDiameters().isEmpty()) {
            inch = true;
        } else if (w.musicWireSize().isPresent() || request.sizes().byDiameter(d).isPresent()) {
            inch = true;
        } else if (request.metricDiameters().stream().anyMatch(m -> Math.abs(m - d) < tol)) {
            inch = false;
        } else {
            double toInch = request.sizes().sizes().stream().mapToDouble(s -> Math.abs(s.diameter() - d)).min()
                    .orElse(Double.POSITIVE_INFINITY);
            double toMetric = request.metricDiameters().stream().mapToDouble(m -> Math.abs(m - d)).min()
                    .orElse(Double.POSITIVE_INFINITY);
            inch = toInch <= toMetric;
        }
        List<CoreWire> out = new ArrayList<>();
        if (inch) {
            List<WireSize> sizes = request.sizes().sizes();
            for (int i = sizes.size() - 1; i >= 0; i--) {
                if (sizes.get(i).diameter() < d - tol) {
                    out.add(CoreWire.ofSize(sizes.get(i).size(), sizes.get(i).diameter()));
                }
            }
        } else {
            List<Double> metric = request.metricDiameters();
            for (int i = metric.size() - 1; i >= 0; i--) {
                if (metric.get(i) < d - tol) {
                    out.add(CoreWire.ofDiameter(metric.get(i)));
                }
            }
        }
        return out;
    }

    /** @return v rounded down to a multiple of step */
    static double roundDown(double v, double step) {
        return Math.floor(v / step) * step;
    }

    /** @return v rounded up to a multiple of step */
    static double roundUp(double v, double step) {
        return Math.ceil(v / step) * step;
    }
}
