package org.scalewright.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

/**
 * A small invented scale for drawing tests (not a check value): keys 1–30, a "bass" section
 * of wound strings (keys 1–10), a "tenor" section with four wound strings (11–14) and plain
 * wire above.
 */
public final class CurveFixtures {
    private CurveFixtures() {
    }

    static Scale scale(double lengthFactor) {
        List<Note> notes = new ArrayList<>();
        for (int key = 1; key <= 30; key++) {
            double length = lengthFactor * (1.40 - 0.025 * key);
            String section = key <= 10 ? "bass" : "tenor";
            boolean wound = key <= 14;
            CoreWire wire = wound ? CoreWire.ofDiameter(key <= 10 ? 1.3e-3 : 1.0e-3) : CoreWire.ofDiameter(1.05e-3);
            Wrap wrap = wound ? Wrap.single(key <= 10 ? 1.0e-3 - key * 4e-5 : 0.5e-3 - (key - 10) * 5e-5,
                    WrapMetal.COPPER) : null;
            notes.add(new Note(key, key <= 10 ? 2 : 3, length, wire, wrap, OptionalDouble.empty(), 0,
                    OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty(), section, ""));
        }
        return new Scale("small invented scale", PitchStandard.ISO_16, notes, null);
    }

    public static ScaleAnalysis analysis(double lengthFactor) {
        return ScaleAnalyzer.analyze(scale(lengthFactor), BuiltInData.defaultSettings());
    }
}
