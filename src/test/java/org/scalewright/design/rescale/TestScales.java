package org.scalewright.design.rescale;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Random;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Materials;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.model.WireSize;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;
import org.scalewright.physics.Pitch;
import org.scalewright.physics.StringPhysics;

/**
 * Random but plausible 88-key scales for property tests (seeded, so every run is the same).
 * Invented inputs only: no test uses their figures as expected values, only as material for
 * properties that must hold for any scale.
 */
public final class TestScales {
    private TestScales() {
    }

    /** @return a scale with wound keys 1..lastWound (bass/tenor break inside them) and plain wire above */
    public static Scale random(long seed) {
        Random rnd = new Random(seed);
        Materials m = BuiltInData.materials();
        List<WireSize> sizes = BuiltInData.musicWireSizes().sizes();
        int lastWound = 20 + rnd.nextInt(12);
        int breakAfter = lastWound - 5 - rnd.nextInt(4);
        List<Note> notes = new ArrayList<>();
        double l29 = 0.05 * Math.pow(2, (88 - (lastWound + 1)) * 0.9 / 12);
        for (int key = 1; key <= 88; key++) {
            double f = Pitch.equalTempered(key, 440);
            int strings = key <= 8 ? 1 : key <= lastWound ? 2 : 3;
            String section = key <= breakAfter ? "bass" : key <= 40 ? "tenor" : key <= 60 ? "treble" : "top";
            double jitter = 1 + 0.03 * rnd.nextGaussian();
            if (key > lastWound) {
                double length = measured(0.05 * Math.pow(2, (88 - key) * 0.9 / 12) * jitter);
                double tension = 700 * (1 + 0.05 * rnd.nextGaussian());
                double sigma = 4 * length * length * f * f * m.steelDensity();
                double d = Math.sqrt(tension / sigma / (Math.PI / 4));
                WireSize best = sizes.get(0);
                for (WireSize s : sizes) {
                    if (Math.abs(s.diameter() - d) < Math.abs(best.diameter() - d)) {
                        best = s;
                    }
                }
                notes.add(note(key, strings, length, CoreWire.ofSize(best.size(), best.diameter()), null, section));
            } else {
                double length = measured(Math.min(1.6, l29 * (1 + 0.012 * (lastWound + 1 - key)) * jitter));
                double core = key <= breakAfter ? 1.55e-3 - 0.012e-3 * key : 1.15e-3 - 0.02e-3 * (key - breakAfter);
                core = Math.round(core * 1e5) / 1e5;
                double tension = (key <= breakAfter ? 1300 : 950) * (1 + 0.06 * rnd.nextGaussian());
                double k = StringPhysics.stiffness(core, length, m.youngsModulus());
                double mu = WrapSolver.neededMassPerLength(tension, length, f, k);
                WindingRule rule = key <= lastWound / 3 ? WindingRule.outerRatio(0.9) : WindingRule.single();
                Wrap exact = WrapSolver.exact(core, mu, rule, WrapMetal.COPPER, m).orElseThrow();
                Wrap wrap = new Wrap(round(exact.inner()), exact.isDouble() ? round(exact.outer()) : 0, WrapMetal.COPPER);
                notes.add(note(key, strings, length, CoreWire.ofDiameter(core), wrap, section));
            }
        }
        return new Scale("random test scale " + seed, PitchStandard.ISO_16, notes, null);
    }

    /** @return a length as a sheet holds it, measured to 0.1 mm (a sheet writes a computed length to 0.1 mm) */
    private static double measured(double metres) {
        return Math.round(metres * 1e4) / 1e4;
    }

    private static double round(double w) {
        return Math.max(0.05e-3, Math.round(w * 1e5) / 1e5);
    }

    static Note note(int key, int strings, double length, CoreWire wire, Wrap wrap, String section) {
        return new Note(key, strings, length, wire, wrap, OptionalDouble.empty(), 0, OptionalDouble.empty(),
                OptionalDouble.empty(), OptionalDouble.empty(), section, "");
    }

    /**
     * A bass as a rebuilder measures it (invented test input, not a check value): wound keys 1..wound,
     * speaking lengths running from {@code lowest} to {@code highest} metres, cores stepping by 0.05 mm
     * every few keys, the first {@code doubles} keys double-wound, tensions scattered about a falling
     * line as measured strings are, wraps rounded to 0.01 mm (what a micrometer reads), and four plain
     * keys above.
     */
    public static Scale bass(String title, long seed, int wound, int doubles, double lowest, double highest,
                             double lowCore, double lowTension) {
        Random rnd = new Random(seed);
        Materials m = BuiltInData.materials();
        List<Note> notes = new ArrayList<>();
        for (int key = 1; key <= wound + 4; key++) {
            double f = Pitch.equalTempered(key, 440);
            double t = (key - 1.0) / (wound - 1.0);
            double length = measured(lowest * Math.pow(highest / lowest, Math.min(t, 1.0 + (key - wound) * 0.02)));
            if (key > wound) {
                double sigma = 4 * length * length * f * f * m.steelDensity();
                double d = Math.round(Math.sqrt(750 / sigma / (Math.PI / 4)) / 0.025e-3) * 0.025e-3;
                notes.add(note(key, 3, length, CoreWire.ofDiameter(d), null, "tenor"));
                continue;
            }
            double core = Math.round((lowCore - 0.05e-3 * ((key - 1) / 4)) * 1e5) / 1e5;
            double tension = lowTension * (1 - 0.25 * t) * (1 + 0.02 * rnd.nextGaussian());
            double k = StringPhysics.stiffness(core, length, m.youngsModulus());
            double mu = WrapSolver.neededMassPerLength(tension, length, f, k);
            WindingRule rule = key <= doubles ? WindingRule.outerRatio(0.9) : WindingRule.single();
            Wrap exact = WrapSolver.exact(core, mu, rule, WrapMetal.COPPER, m).orElseThrow();
            Wrap wrap = new Wrap(round(exact.inner()), exact.isDouble() ? round(exact.outer()) : 0, WrapMetal.COPPER);
            notes.add(note(key, key <= 8 ? 1 : 2, length, CoreWire.ofDiameter(core), wrap, "bass"));
        }
        return new Scale(title, PitchStandard.ISO_16, notes, null);
    }

    /** @return the key of the last wound note */
    public static int lastWound(Scale s) {
        int last = 0;
        for (Note n : s.notes()) {
            if (n.isWound()) {
                last = n.key();
            }
        }
        return last;
    }
}
