package org.scalewright.design.orders;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;

/**
 * Scales made up for tests from simple formulas (input only: no test compares a result with
 * a figure taken from them). 88 keys: 1–8 double-wound monochords, 9–28 single-wound bichords,
 * 29–88 plain-wire trichords, each plain speaking length 2^(0.94/12) times the next key's;
 * stretched lengths given except above key 80.
 */
public final class TestScales {
    private TestScales() {
    }

    /** @return the 88-key test scale */
    public static Scale generated() {
        List<Note> notes = new ArrayList<>();
        for (int k = 1; k <= 88; k++) {
            notes.add(note(k));
        }
        return new Scale("Test scale (generated)", PitchStandard.ISO_16, notes, null);
    }

    static Note note(int k) {
        String section = k <= 28 ? "bass" : "treble";
        if (k <= 8) {
            double l = 1.45 - (k - 1) * 0.012;
            Wrap w = new Wrap((1.20 - 0.03 * (k - 1)) * 1e-3, (1.00 - 0.02 * (k - 1)) * 1e-3, WrapMetal.COPPER);
            return full(k, 1, l, CoreWire.ofDiameter(1.5e-3), w, section);
        }
        if (k <= 28) {
            double l = 1.35 - (k - 9) * 0.012;
            Wrap w = Wrap.single((1.0 - 0.042 * (k - 9)) * 1e-3, WrapMetal.COPPER);
            return full(k, 2, l, CoreWire.ofDiameter((1.3 - 0.0125 * (k - 9)) * 1e-3), w, section);
        }
        double l = 0.05 * Math.pow(2, (88 - k) * 0.94 / 12);
        double d = (0.75 + (88 - k) * 0.006) * 1e-3;
        return full(k, 3, l, CoreWire.ofDiameter(d), null, section);
    }

    private static Note full(int k, int strings, double l, CoreWire wire, Wrap wrap, String section) {
        OptionalDouble stretched = k > 80 ? OptionalDouble.empty() : OptionalDouble.of(l + 0.15);
        OptionalDouble wound = wrap == null ? OptionalDouble.empty() : OptionalDouble.of(l + 0.03);
        return new Note(k, strings, l, wire, wrap, OptionalDouble.empty(), 0, OptionalDouble.empty(), stretched,
                wound, section, "");
    }
}
