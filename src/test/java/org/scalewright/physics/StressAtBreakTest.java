package org.scalewright.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Note;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;

/** The stress in a string at the pitch it broke at, and its ratio to the strength table. */
class StressAtBreakTest {
    private static final AnalysisSettings SETTINGS = BuiltInData.defaultSettings();

    @Test
    @DisplayName("0.254 mm plain wire, 647.7 mm, broke at 406 Hz: about 2171 MPa (common practice, no source)")
    void tradeCheckValue() {
        Note note = Note.plain(60, 3, 0.6477, CoreWire.ofDiameter(0.254e-3));
        StressAtBreak s = StressAtBreak.of(note, 406, SETTINGS);
        // 4 L² f² ρ with ρ = 7850 kg/m³; the trade figure is given to 4 digits: half a unit in the last
        assertEquals(2171e6, s.stress(), 0.5e6);
        // the stiffness term K/A = π² E d² / (16 L²), hand-worked with E = 200 GPa: 0.019 MPa,
        // nine millionths of the stress: it moves the figure in its sixth digit
        assertEquals(Math.PI * Math.PI * 200e9 * 0.254e-3 * 0.254e-3 / (16 * 0.6477 * 0.6477), s.stiffnessTerm(),
                1e-6 * s.stiffnessTerm());
        assertEquals(0.019e6, s.stiffnessTerm(), 0.0005e6);
        assertTrue(s.stiffnessTerm() / s.stress() < 1e-5, "stiffness share " + s.stiffnessTerm() / s.stress());
        assertEquals(4 * 0.6477 * 0.6477 * 406 * 406 * 7850 - s.stiffnessTerm(), s.stress(), 1e-6);
    }

    @Test
    @DisplayName("the ratio is the stress over the table's strength at that diameter")
    void ratioAgainstTheTable() {
        Note note = Note.plain(60, 3, 0.6477, CoreWire.ofDiameter(0.254e-3));
        StressAtBreak s = StressAtBreak.of(note, 406, SETTINGS);
        double table = SETTINGS.strength().strengthAt(0.254e-3);
        assertEquals(table, s.tableStrength(), 0.0);
        assertEquals(s.stress() / table, s.ratio(), 1e-15);
    }

    @Test
    @DisplayName("plain wire: the stress at break does not depend on the diameter, except the stiffness term")
    void plainWireIndependentOfDiameter() {
        double flexible = 4 * 0.6477 * 0.6477 * 406 * 406 * 7850;
        for (double dmm : new double[] {0.254, 0.8, 1.0, 1.3}) {
            StressAtBreak s = StressAtBreak.of(Note.plain(60, 3, 0.6477, CoreWire.ofDiameter(dmm * 1e-3)), 406,
                    SETTINGS);
            assertEquals(flexible - s.stiffnessTerm(), s.stress(), 1e-6, dmm + " mm");
            assertTrue(s.stiffnessTerm() < 0.6e6, "K/A stays under 0.6 MPa up to 1.3 mm: " + s.stiffnessTerm());
        }
    }

    @Test
    @DisplayName("wound string: the core carries the whole stiff-string tension (hand-worked mass)")
    void woundStringCoreShare() {
        double d = 1.2e-3;
        double w = 0.8e-3;
        double l = 1.2;
        double f = 90;
        Note note = new Note(20, 2, l, CoreWire.ofDiameter(d), Wrap.single(w, WrapMetal.COPPER),
                java.util.OptionalDouble.empty(), 0, java.util.OptionalDouble.empty(),
                java.util.OptionalDouble.empty(), java.util.OptionalDouble.empty(), "", "");
        StressAtBreak s = StressAtBreak.of(note, f, SETTINGS);
        // hand-worked (DESIGN §3): μ = ρs π d²/4 + ρw π² w (d + w)/4 · h, h = √(1 + (w/(π (d + w)))²)
        double h = Math.sqrt(1 + Math.pow(w / (Math.PI * (d + w)), 2));
        double mu = 7850 * Math.PI * d * d / 4 + 8960 * Math.PI * Math.PI * w * (d + w) / 4 * h;
        double k = Math.pow(Math.PI, 3) * 200e9 * Math.pow(d, 4) / (64 * l * l);
        double tension = 4 * l * l * mu * f * f - k;
        assertEquals(tension / (Math.PI * d * d / 4), s.stress(), 1e-9 * s.stress());
    }

    @Test
    void aPitchThatIsNotPositiveIsRefused() {
        Note note = Note.plain(60, 3, 0.6477, CoreWire.ofDiameter(0.254e-3));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> StressAtBreak.of(note, 0, SETTINGS));
        assertTrue(e.getMessage().contains("pitch at break"), e.getMessage());
    }
}
