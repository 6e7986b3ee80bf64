package org.scalewright.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
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
import org.scalewright.physics.StrengthTable;

/**
 * An invented, smooth 88-note grand scale for the benchmarks only (not a measured instrument
 * and never a check value). Double-wound bass 1–10, single-wound 11–26, plain wire 27–88.
 * Plain notes: a music-wire size stepping down from 20 to 13 and the speaking length that puts
 * the wire at a percent of breaking strength rising smoothly from 40 to 55 %. Wound notes:
 * speaking length 1.95 m falling to 1.25 m, a tension per string falling from 1650 to 1000 N,
 * a core at about half its breaking strength and a copper wrap sized for that tension.
 */
final class DemoScale {
    private DemoScale() {
    }

    static Scale grand() {
        Materials m = BuiltInData.materials();
        StrengthTable strength = BuiltInData.astmMinimum();
        List<WireSize> sizes = BuiltInData.musicWireSizes().sizes();
        List<Note> notes = new ArrayList<>(88);
        for (int key = 1; key <= 88; key++) {
            double f = Pitch.equalTempered(key, 440);
            if (key >= 27) {
                WireSize size = sizes.get(16 - (key - 27) * 14 / 61); // 20 (0.045 in) down to 13 (0.031 in)
                double d = size.diameter();
                double pct = 40 + 15.0 * (key - 27) / 61;
                double length = Math.sqrt(pct / 100 * strength.strengthAt(d) / (4 * f * f * m.steelDensity()));
                notes.add(new Note(key, 3, round(length, 1e-4), CoreWire.ofSize(size.size(), d), null,
                        OptionalDouble.empty(), 0, OptionalDouble.empty(), OptionalDouble.empty(),
                        OptionalDouble.empty(), key <= 52 ? "tenor" : "treble", ""));
                continue;
            }
            double length = round(1.95 - 0.028 * (key - 1), 1e-3);
            double tension = 1650 - 650.0 * (key - 1) / 25;
            double core = round(Math.sqrt(4 * tension / (Math.PI * 0.5 * strength.strengthAt(1.3e-3))), 1e-5);
            double mu = tension / (4 * length * length * f * f);
            double rest = mu - m.steelDensity() * Math.PI * core * core / 4;
            double c = Math.PI * Math.PI * m.copperDensity() / 4;
            Wrap wrap;
            if (key <= 10) {
                double w1 = 0.5e-3;
                rest -= c * w1 * (core + w1);
                double under = core + 2 * w1;
                wrap = new Wrap(w1, round(positiveRoot(c, c * under, -rest), 1e-5), WrapMetal.COPPER);
            } else {
                wrap = Wrap.single(round(positiveRoot(c, c * core, -rest), 1e-5), WrapMetal.COPPER);
            }
            notes.add(new Note(key, key <= 10 ? 1 : 2, length, CoreWire.ofDiameter(core), wrap,
                    OptionalDouble.empty(), 0, OptionalDouble.empty(), OptionalDouble.of(length + 0.3),
                    OptionalDouble.of(length - 0.12), "bass", ""));
        }
        return new Scale("Invented benchmark grand", PitchStandard.ISO_16, notes, null);
    }

    private static double positiveRoot(double a, double b, double c) {
        return (-b + Math.sqrt(b * b - 4 * a * c)) / (2 * a);
    }

    private static double round(double v, double step) {
        return Math.rint(v / step) * step;
    }
}
