package org.scalewright.design.diagnosis;

import java.util.ArrayList;
import java.util.List;
import java.util.function.IntToDoubleFunction;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Materials;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.StrengthTable;

/** Made-up test scales for the diagnosis tests (test inputs, not check values). */
final class DiagnosisScales {
    /** Steel 7850 kg/m³ (common practice, no source), E = 200 GPa (Shigley's Table 10-5, from memory). */
    static final Materials MATERIALS = new Materials(7850, 8960, 7870, 200e9);
    /** A test table of 2000 MPa at every diameter. */
    static final StrengthTable FLAT_2000 = new StrengthTable("flat 2000 MPa", List.of("test table"),
            new double[]{0.5e-3, 2e-3}, new double[]{2000e6, 2000e6});
    /** A test table whose strength falls steeply with diameter (log-log slope about −0.74). */
    static final StrengthTable STEEP = new StrengthTable("steep test table", List.of("test table"),
            new double[]{0.7e-3, 1.0e-3}, new double[]{2600e6, 2000e6});

    private DiagnosisScales() {
    }

    static AnalysisSettings settings(StrengthTable t) {
        return AnalysisSettings.of(MATERIALS, t);
    }

    /**
     * Plain wire keys 40–88 in one section, lengths chosen so that the flexible stress 4 L² f² ρ
     * equals {@code pctAt(k)} % of 2000 MPa, times {@code lengthFactor(k)} on the length.
     */
    static Scale plain(IntToDoubleFunction pctAt, IntToDoubleFunction lengthFactor, double d) {
        List<Note> notes = new ArrayList<>();
        for (int k = 40; k <= 88; k++) {
            double f = 440 * Math.pow(2, (k - 49) / 12.0);
            double sigma = pctAt.applyAsDouble(k) / 100 * 2000e6;
            double l = Math.sqrt(sigma / (4 * f * f * 7850)) * lengthFactor.applyAsDouble(k);
            notes.add(Note.plain(k, 3, l, CoreWire.ofDiameter(d)).withSection("treble"));
        }
        return new Scale("test", PitchStandard.ISO_16, notes, null);
    }

    /** A smooth plain section: percent of breaking strength rising from 45 to 55 %. */
    static double smoothPct(int k) {
        return 45 + 10 * (k - 40) / 48.0;
    }
}
