package org.scalewright.model;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/** The one notation of a plain wire and a wound string (DESIGN §4, README "Wound strings"). */
class WireNotationTest {
    private static final double IN = 0.0254;

    @Test
    void plainWire() {
        assertEquals("#14.5", WireNotation.of(Note.plain(40, 3, 0.6, CoreWire.ofSize(14.5, 0.034 * IN))));
        assertEquals("#16", WireNotation.of(Note.plain(40, 3, 0.6, CoreWire.ofSize(16, 0.037 * IN))));
        assertEquals("1.100 mm", WireNotation.of(Note.plain(40, 3, 0.6, CoreWire.ofDiameter(1.1e-3))));
        assertEquals("0.0433 in", WireNotation.of(Note.plain(40, 3, 0.6, CoreWire.ofDiameter(0.0433 * IN)),
                LengthUnit.IN));
    }

    @Test
    void woundStringWithOutsideDiameter() {
        Note dbl = Note.plain(1, 1, 1.48, CoreWire.ofDiameter(1.6e-3)).withWrap(new Wrap(1.25e-3, 1.08e-3, WrapMetal.COPPER));
        // OD = 1.600 + 2 · 1.250 + 2 · 1.080 = 6.260 mm (hand-worked)
        assertEquals("1.600 / 1.250 + 1.080 mm Cu (OD 6.260)", WireNotation.of(dbl));
        Note single = Note.plain(20, 2, 1.1, CoreWire.ofSize(17, 0.039 * IN)).withWrap(Wrap.single(0.45e-3, WrapMetal.IRON));
        // 0.039 in = 0.9906 mm; OD = 0.9906 + 0.9 = 1.8906 mm
        assertEquals("#17 / 0.450 mm Fe (OD 1.8906)", WireNotation.of(single));
        Note steel = Note.plain(25, 2, 1.0, CoreWire.ofDiameter(1.1e-3)).withWrap(Wrap.single(0.3e-3, WrapMetal.STEEL));
        assertEquals("1.100 / 0.300 mm St (OD 1.700)", WireNotation.of(steel));
    }

    @Test
    void plannedDiametersKeepTheirDigits() {
        // a core planned in 0.025 mm steps and a wrap planned in 0.01 mm steps, with their arithmetic noise
        Wrap w = Wrap.single(104 * 0.01e-3, WrapMetal.COPPER);
        assertEquals("1.075 / 1.040 mm Cu (OD 3.155)", WireNotation.of(OptionalDouble.empty(), 43 * 0.025e-3, w, LengthUnit.MM));
        assertEquals("0.0423 / 0.0409 in Cu (OD 0.1242)",
                WireNotation.of(OptionalDouble.empty(), 43 * 0.025e-3, w, LengthUnit.IN));
    }
}
