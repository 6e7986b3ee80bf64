package org.scalewright.design.diagnosis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Materials;
import org.scalewright.model.Note;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;
import org.scalewright.physics.NoteCalculator;

class LengthSolverTest {
    @Test
    void tradeCheckValueInTheFlexibleLimit() {
        // DESIGN §3 check value from the trade (common practice, no source): 0.254 mm plain steel wire,
        // 647.7 mm speaking length, 406 Hz: 4 L² f² ρ = 2171 MPa. With E → 0 (no stiffness term) the
        // length for 2171 MPa at 406 Hz must come back as 647.7 mm (to the 4 figures of the check value).
        Materials limp = new Materials(7850, 8960, 7870, 1e-6);
        Note n = Note.plain(40, 1, 1.0, CoreWire.ofDiameter(0.254e-3));
        assertEquals(0.6477, LengthSolver.lengthFor(n, 406, 2171e6, limp), 0.0005);
    }

    @Test
    void handWorkedFlexibleLength() {
        // Hand-worked case: σ = 1000 MPa at 1000 Hz, ρ = 7850, no stiffness:
        // L = √(σ / (4 f² ρ)) = √(1e9 / 3.14e10) = 0.178458 m
        Materials limp = new Materials(7850, 8960, 7870, 1e-6);
        Note n = Note.plain(70, 3, 0.2, CoreWire.ofDiameter(0.9e-3));
        assertEquals(0.178458, LengthSolver.lengthFor(n, 1000, 1000e6, limp), 1e-6);
    }

    @Test
    void withStiffnessTheLengthFoundGivesTheStressAsked() {
        Note plain = Note.plain(80, 3, 0.08, CoreWire.ofDiameter(0.8e-3));
        Note wound = Note.plain(20, 2, 1.1, CoreWire.ofDiameter(1.2e-3)).withWrap(new Wrap(0.6e-3, 0.5e-3,
                WrapMetal.COPPER));
        for (Note n : new Note[]{plain, wound}) {
            double f = n.key() == 80 ? 2637.0 : 82.4;
            double l = LengthSolver.lengthFor(n, f, 1200e6, DiagnosisScales.MATERIALS);
            double sigma = NoteCalculator.computeAt(n.withSpeakingLength(l), f,
                    DiagnosisScales.settings(DiagnosisScales.FLAT_2000)).stress();
            assertEquals(1200e6, sigma, 1e-3);
        }
    }
}
