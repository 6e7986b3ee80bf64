package org.scalewright.design.orders;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Note;
import org.scalewright.model.Scale;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;
import org.scalewright.physics.ScaleAnalyzer;

class WireOrderTest {

    private static WireOrder order(Scale s, WireAllowances a) {
        return WireOrder.of(ScaleAnalyzer.analyze(s, BuiltInData.defaultSettings()), a);
    }

    private static Note plain(int key, int strings, double length, CoreWire wire, Double stretched) {
        return new Note(key, strings, length, wire, null, OptionalDouble.empty(), 0, OptionalDouble.empty(),
                stretched == null ? OptionalDouble.empty() : OptionalDouble.of(stretched), OptionalDouble.empty(),
                "", "");
    }

    @Test
    void totalsAreTheSumsOfTheRows() {
        WireOrder o = order(TestScales.generated(), WireAllowances.DEFAULT);
        assertTrue(o.rows().size() > 10);
        assertEquals(o.rows().stream().mapToInt(WireOrderRow::strings).sum(), o.totalStrings());
        assertEquals(o.rows().stream().mapToInt(WireOrderRow::pieces).sum(), o.totalPieces());
        assertEquals(o.rows().stream().mapToDouble(WireOrderRow::length).sum(), o.totalLength(), 1e-12);
        assertEquals(o.rows().stream().mapToDouble(WireOrderRow::mass).sum(), o.totalMass(), 1e-15);
        // every plain string of the scale is counted once: keys 29-88, three strings each
        assertEquals(60 * 3, o.totalStrings());
        assertEquals(60 * 2, o.totalPieces());
    }

    /**
     * Hand-worked: one trichord of 1.000 mm wire with a stretched length of 1.000 m and one
     * bichord of the same wire given only a speaking length of 0.400 m; pin allowance 0.150 m,
     * length allowance 0.100 m. Length = 3 × (1.000 + 0.150) + 2 × (0.400 + 0.100 + 0.150)
     * = 3.450 + 1.300 = 4.750 m. Mass per length ρπd²/4 = 7850 × π × 0.25e-6 = 6.1654e-3 kg/m
     * (steel density of the built-in materials), mass = 29.286 g. Pieces: trichord 2 (one looped
     * pair and a single), bichord 1.
     */
    @Test
    void handWorkedLengthMassAndPieces() {
        CoreWire w = CoreWire.ofDiameter(1.0e-3);
        Scale s = new Scale("", null, List.of(plain(40, 3, 0.6, w, 1.0), plain(41, 2, 0.4, w, null)), null);
        WireOrder o = order(s, new WireAllowances(0.150, 0.100, true));
        assertEquals(1, o.rows().size());
        WireOrderRow r = o.rows().get(0);
        assertEquals(4.750, r.length(), 1e-12);
        assertEquals(6.1654e-3, r.massPerLength(), 1e-7);
        assertEquals(29.286e-3, r.mass(), 1e-6);
        assertEquals(5, r.strings());
        assertEquals(3, r.pieces());
        assertEquals(2, r.estimatedStrings());
        assertEquals("40-41", r.keys());
        assertEquals(5, order(s, new WireAllowances(0.150, 0.100, false)).rows().get(0).pieces());
    }

    @Test
    void theSameWireGivenAsSizeOrDiameterIsOneRowAndWoundStringsAreLeftOut() {
        double d = 0.034 * 0.0254; // size 14.5
        Note wound = new Note(10, 2, 1.2, CoreWire.ofDiameter(1.2e-3), Wrap.single(0.8e-3, WrapMetal.COPPER),
                OptionalDouble.empty(), 0, OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty(),
                "", "");
        Scale s = new Scale("", null, List.of(wound, plain(60, 3, 0.2, CoreWire.ofSize(14.5, d), 0.3),
                plain(62, 3, 0.18, CoreWire.ofDiameter(d), 0.28), plain(70, 3, 0.12, CoreWire.ofDiameter(0.8e-3), 0.2)),
                null);
        WireOrder o = order(s, WireAllowances.DEFAULT);
        assertEquals(2, o.rows().size());
        assertEquals(d, o.rows().get(0).diameter(), 1e-12); // thickest first
        assertEquals(14.5, o.rows().get(0).musicWireSize().getAsDouble());
        assertEquals("60, 62", o.rows().get(0).keys());
        assertEquals(6, o.rows().get(0).strings());
        assertEquals(9, o.totalStrings());
    }

    @Test
    void negativeAllowancesAreRefusedNamingTheAllowance() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new WireAllowances(-0.01, 0.1, true));
        assertTrue(e.getMessage().contains("tuning-pin and hitch allowance must be >= 0 mm, was -10"),
                e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new WireAllowances(0.150, 9, true));
    }
}
