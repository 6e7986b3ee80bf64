package org.scalewright.app.stretch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.scalewright.design.stretch.OctaveType;
import org.scalewright.design.stretch.StretchCurve;
import org.scalewright.design.stretch.StretchPoint;
import org.scalewright.model.CoreWire;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.TestSheets;

/** The Tuning stretch tab's view model on the demo grand, without a display. */
class StretchViewModelTest {
    private ScaleSession session;
    private StretchViewModel vm;

    @BeforeEach
    void openDemoGrand() throws Exception {
        session = new ScaleSession();
        session.open(TestSheets.demoGrand(), false);
        vm = new StretchViewModel(session);
    }

    private static double cents(StretchCurve c, int key) {
        return c.point(key).orElseThrow().stretchCents().orElseThrow();
    }

    @Test
    void theMiddleStaysAtEqualTemperamentAndTheEndsStretchOutward() {
        StretchCurve c = vm.curve();
        assertEquals(88, c.points().size());
        for (int k = 37; k <= 49; k++) {
            assertEquals(0.0, cents(c, k), 1e-9, "key " + k + " is held at equal temperament (DESIGN §5)");
        }
        // sign only: aural tuning stretches the treble sharp and the bass flat (Railsback, J. Acoust. Soc. Am. 1938)
        assertTrue(cents(c, 88) > 0, "treble sharp");
        assertTrue(cents(c, 1) < 0, "bass flat");
        assertTrue(vm.summaryProperty().get().startsWith("2:1 octaves at A4 = 440"), vm.summaryProperty().get());
    }

    @Test
    void anEditOfATrebleWireChangesTheCurveThere() {
        double before = cents(vm.curve(), 80);
        StretchCurve old = vm.curve();
        assertTrue(session.edit("wire of key 68", s -> s.withNote(
                s.note(68).orElseThrow().withWire(CoreWire.ofDiameter(1.2e-3)))));
        assertNotEquals(old, vm.curve(), "the curve is recomputed after an edit");
        assertNotEquals(before, cents(vm.curve(), 80), 1e-6);
        for (int k = 37; k <= 49; k++) {
            assertEquals(0.0, cents(vm.curve(), k), 1e-9);
        }
        session.undo();
        assertEquals(before, cents(vm.curve(), 80), 1e-12);
    }

    @Test
    void aNewA4AndAnotherOctaveTypeRedraw() {
        double twoOne = cents(vm.curve(), 88);
        vm.octaveProperty().set(OctaveType.SIX_THREE);
        assertEquals(OctaveType.SIX_THREE, vm.curve().octave());
        assertNotEquals(twoOne, cents(vm.curve(), 88), 1e-6);
        assertEquals(1, vm.drawnProperty().get().size());
        vm.showAllProperty().set(true);
        assertEquals(3, vm.drawnProperty().get().size());
        assertTrue(session.setA4(415));
        assertEquals(415, vm.curve().a4(), 1e-12);
        StretchPoint a4 = vm.curve().point(49).orElseThrow();
        assertEquals(415, a4.tunedHz().orElseThrow(), 1e-9);
    }

    @Test
    void noScaleNoCurve() {
        StretchViewModel empty = new StretchViewModel(new ScaleSession());
        assertNull(empty.curve());
        assertTrue(empty.drawnProperty().get().isEmpty());
    }
}
