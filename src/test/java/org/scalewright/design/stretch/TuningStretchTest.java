package org.scalewright.design.stretch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.NavigableMap;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.scalewright.design.orders.TestScales;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.InvalidInput;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

class TuningStretchTest {

    private static double cents(StretchCurve c, int key) {
        return c.point(key).orElseThrow().stretchCents().orElseThrow();
    }

    private static ScaleAnalysis analysed() {
        return ScaleAnalyzer.analyze(TestScales.generated(), BuiltInData.defaultSettings());
    }

    @ParameterizedTest
    @EnumSource(OctaveType.class)
    void zeroInharmonicityGivesZeroStretchEverywhere(OctaveType type) {
        NavigableMap<Integer, Double> b = new TreeMap<>();
        for (int k = -2; k <= 88; k++) {
            b.put(k, 0.0);
        }
        StretchCurve c = TuningStretch.of(b, 440, type);
        assertEquals(91, c.points().size());
        assertTrue(c.problems().isEmpty(), c.problems().toString());
        for (StretchPoint p : c.points()) {
            assertEquals(0.0, p.stretchCents().orElseThrow(), 1e-9, "key " + p.key());
        }
    }

    /**
     * Hand-worked two-note case. A4 (key 49) at 440 Hz with B = 4e-4, A5 (key 61) with B = 1e-3.
     * 2:1: A5's fundamental = A4's partial 2 = 2·440·√((1 + 4·4e-4)/(1 + 4e-4)) = 880·√(1.0016/1.0004),
     * so the stretch is 600·log₂(1.0016/1.0004) = 600·log₂(1.0011995) = 1.0377 cents.
     * 4:2: A5's partial 2 = A4's partial 4: 2 f·√(1.004/1.001) = 1760·√(1.0064/1.0004), so
     * f = 880·√(1.0064·1.001/(1.0004·1.004)) = 880·√1.0029916 and the stretch is
     * 600·log₂(1.0029916) = 2.5857 cents.
     */
    @Test
    void handWorkedTwoNoteCaseUpward() {
        NavigableMap<Integer, Double> b = new TreeMap<>();
        b.put(49, 4e-4);
        b.put(61, 1e-3);
        assertEquals(0.0, cents(TuningStretch.of(b, 440, OctaveType.TWO_ONE), 49), 1e-12);
        assertEquals(1.0377, cents(TuningStretch.of(b, 440, OctaveType.TWO_ONE), 61), 1e-4);
        assertEquals(2.5857, cents(TuningStretch.of(b, 440, OctaveType.FOUR_TWO), 61), 1e-4);
        assertEquals(880 * Math.sqrt(1.0016 / 1.0004),
                TuningStretch.of(b, 440, OctaveType.TWO_ONE).point(61).orElseThrow().tunedHz().getAsDouble(), 1e-9);
    }

    /**
     * Hand-worked two-note case downward. A3 (key 37) stays at 220 Hz; A2 (key 25) with
     * B = 1e-4 is tuned so that its partial 2 sounds with A3's fundamental (2:1):
     * 2 f·√((1 + 4e-4)/(1 + 1e-4)) = 220, so f = 110/√(1.0004/1.0001) and the stretch is
     * −600·log₂(1.0004/1.0001) = −600·log₂(1.00029997) = −0.25962 cents (A3's own B does not enter).
     */
    @Test
    void handWorkedTwoNoteCaseDownward() {
        NavigableMap<Integer, Double> b = new TreeMap<>();
        b.put(25, 1e-4);
        b.put(37, 3e-4);
        StretchCurve c = TuningStretch.of(b, 440, OctaveType.TWO_ONE);
        assertEquals(-0.25962, cents(c, 25), 1e-5);
        assertEquals(0.0, cents(c, 37), 1e-12);
    }

    @ParameterizedTest
    @EnumSource(OctaveType.class)
    void stretchGrowsWithInharmonicity(OctaveType type) {
        ScaleAnalysis a = analysed();
        NavigableMap<Integer, Double> b1 = new TreeMap<>();
        a.notes().forEach(r -> b1.put(r.key(), r.inharmonicity()));
        NavigableMap<Integer, Double> b2 = new TreeMap<>();
        b1.forEach((k, v) -> b2.put(k, 2 * v));
        NavigableMap<Integer, Double> b4 = new TreeMap<>();
        b1.forEach((k, v) -> b4.put(k, 4 * v));
        StretchCurve c1 = TuningStretch.of(b1, 440, type);
        StretchCurve c2 = TuningStretch.of(b2, 440, type);
        StretchCurve c4 = TuningStretch.of(b4, 440, type);
        for (int k = 1; k <= 88; k++) {
            if (TuningStretch.EQUAL_TEMPERED_BAND.contains(k)) {
                continue;
            }
            double s1 = Math.abs(cents(c1, k));
            double s2 = Math.abs(cents(c2, k));
            double s4 = Math.abs(cents(c4, k));
            assertTrue(s1 > 0 && s2 > s1 && s4 > s2, "key " + k + ": " + s1 + ", " + s2 + ", " + s4);
        }
    }

    /**
     * Sign and ordering against the published observation that aural tuning stretches the
     * treble sharp and the bass flat, more so the farther from the middle (Railsback,
     * J. Acoust. Soc. Am. 9, 274 (1938), from memory). Inharmonicity from the stiff-string
     * analysis of a generated 88-key scale.
     */
    @ParameterizedTest
    @EnumSource(OctaveType.class)
    void trebleSharpBassFlatGrowingOutwardAsRailsbackObserved(OctaveType type) {
        StretchCurve c = TuningStretch.of(analysed(), type);
        for (int k = 50; k <= 88; k++) {
            assertTrue(cents(c, k) > 0, "treble key " + k + " should be sharp, was " + cents(c, k));
            if (k >= 62) {
                assertTrue(cents(c, k) > cents(c, k - 12), "key " + k + " should be sharper than key " + (k - 12));
            }
        }
        for (int k = 1; k <= 36; k++) {
            assertTrue(cents(c, k) < 0, "bass key " + k + " should be flat, was " + cents(c, k));
            if (k <= 24) {
                assertTrue(cents(c, k) < cents(c, k + 12), "key " + k + " should be flatter than key " + (k + 12));
            }
        }
        assertTrue(cents(c, 88) > cents(c, 61) && cents(c, 1) < cents(c, 25));
    }

    @ParameterizedTest
    @EnumSource(OctaveType.class)
    void a3ToA4StayAtEqualTemperament(OctaveType type) {
        StretchCurve c = TuningStretch.of(analysed(), type);
        assertEquals(88, c.points().size());
        for (int k = 37; k <= 49; k++) {
            assertEquals(0.0, cents(c, k), 0.0, "key " + k);
        }
    }

    @Test
    void higherOctaveTypesStretchMoreWhereBRisesSlowly() {
        // with the same B on every key, 6:3 octaves (partials 6 and 3) are wider than 4:2, wider than 2:1
        NavigableMap<Integer, Double> b = new TreeMap<>();
        for (int k = 1; k <= 88; k++) {
            b.put(k, 5e-4);
        }
        double s21 = cents(TuningStretch.of(b, 440, OctaveType.TWO_ONE), 88);
        double s42 = cents(TuningStretch.of(b, 440, OctaveType.FOUR_TWO), 88);
        double s63 = cents(TuningStretch.of(b, 440, OctaveType.SIX_THREE), 88);
        assertTrue(s21 > 0 && s42 > s21 && s63 > s42, s21 + " " + s42 + " " + s63);
    }

    @Test
    void aMissingOctavePartnerLeavesTheKeyUnknownWithAReason() {
        NavigableMap<Integer, Double> b = new TreeMap<>();
        b.put(49, 4e-4);
        b.put(73, 2e-3); // key 61 missing
        b.put(10, Double.NaN);
        b.put(22, 1e-4);
        StretchCurve c = TuningStretch.of(b, 440, OctaveType.TWO_ONE);
        assertFalse(c.point(73).orElseThrow().known());
        assertTrue(c.point(73).orElseThrow().stretchCents().isEmpty());
        assertFalse(c.point(10).orElseThrow().known());
        assertEquals(3, c.problems().size(), c.problems().toString());
        assertTrue(c.problems().stream().anyMatch(p -> p.startsWith("key 73 (A6)") && p.contains("key 61")),
                c.problems().toString());
    }

    @Test
    void octaveTypesParseAndNameThemselves() {
        assertEquals(OctaveType.TWO_ONE, OctaveType.parse("2:1"));
        assertEquals(OctaveType.FOUR_TWO, OctaveType.parse(" 4:2 "));
        assertEquals(OctaveType.SIX_THREE, OctaveType.parse("6:3"));
        assertEquals(3, OctaveType.SIX_THREE.upperPartial());
        assertEquals(6, OctaveType.SIX_THREE.lowerPartial());
        InvalidInput e = assertThrows(InvalidInput.class, () -> OctaveType.parse("3:1"));
        assertTrue(e.getMessage().contains("'3:1'"), e.getMessage());
    }

    @Test
    void aBadPitchStandardIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> TuningStretch.of(new TreeMap<>(), -440, OctaveType.TWO_ONE));
        assertTrue(e.getMessage().contains("A4 frequency"), e.getMessage());
    }
}
