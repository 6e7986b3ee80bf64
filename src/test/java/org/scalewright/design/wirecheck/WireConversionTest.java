package org.scalewright.design.wirecheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Note;
import org.scalewright.model.UnitConversions;
import org.scalewright.model.WireSize;
import org.scalewright.model.WireSizeTable;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;

/**
 * Inch sizes to metric diameters and back, nearest / next larger / next smaller on both sides.
 * Music-wire sizes here follow DESIGN §3: d[in] = (2·size + 5)/1000 (Music Wire Gauge,
 * Machinery's Handbook, from memory; half sizes common practice, no source); metric diameters in
 * 0.025 mm steps (common practice, no source).
 */
class WireConversionTest {
    private static final double IN = UnitConversions.METRES_PER_INCH;

    private static WireSizeTable sizes() {
        List<WireSize> list = new ArrayList<>();
        for (double s = 12; s <= 23; s += 0.5) {
            list.add(new WireSize(s, (2 * s + 5) / 1000 * IN));
        }
        return new WireSizeTable(list);
    }

    private static List<Double> metric() {
        List<Double> list = new ArrayList<>();
        for (int i = 0; i <= 36; i++) {
            list.add((0.700 + 0.025 * i) * 1e-3);
        }
        return list;
    }

    private static Note plainSize(double size) {
        return Note.plain(60, 3, 0.3, CoreWire.ofSize(size, (2 * size + 5) / 1000 * IN));
    }

    private static double convertedMm(WireConversion c, Note n) {
        return c.convert(n).to().diameter() * 1e3;
    }

    @Test
    void inchToMetricPicksTheRightNeighbour() {
        // size 13 = 0.031 in = 0.7874 mm: 0.775 is 0.0124 mm below, 0.800 is 0.0126 mm above
        Note n = plainSize(13);
        assertEquals(0.775, convertedMm(WireConversion.toMetric(SizeRounding.NEAREST, metric()), n), 1e-9);
        assertEquals(0.800, convertedMm(WireConversion.toMetric(SizeRounding.UP, metric()), n), 1e-9);
        assertEquals(0.775, convertedMm(WireConversion.toMetric(SizeRounding.DOWN, metric()), n), 1e-9);
        // size 14.5 = 0.034 in = 0.8636 mm: 0.850 is 0.0136 below, 0.875 is 0.0114 above
        n = plainSize(14.5);
        assertEquals(0.875, convertedMm(WireConversion.toMetric(SizeRounding.NEAREST, metric()), n), 1e-9);
        assertEquals(0.875, convertedMm(WireConversion.toMetric(SizeRounding.UP, metric()), n), 1e-9);
        assertEquals(0.850, convertedMm(WireConversion.toMetric(SizeRounding.DOWN, metric()), n), 1e-9);
    }

    @Test
    void metricToInchPicksTheRightNeighbour() {
        // 0.800 mm = 0.031496 in: 0.031 (size 13) is 0.000496 in below, 0.032 (13.5) 0.000504 above
        Note n = Note.plain(60, 3, 0.3, CoreWire.ofDiameter(0.800e-3));
        WireChange near = WireConversion.toInch(SizeRounding.NEAREST, sizes()).convert(n);
        assertEquals(13, near.to().musicWireSize().getAsDouble(), 1e-12);
        assertEquals(13.5, WireConversion.toInch(SizeRounding.UP, sizes()).convert(n).to().musicWireSize()
                .getAsDouble(), 1e-12);
        assertEquals(13, WireConversion.toInch(SizeRounding.DOWN, sizes()).convert(n).to().musicWireSize()
                .getAsDouble(), 1e-12);
        // 1.000 mm = 0.03937 in: 0.039 (17) below by 0.00037, 0.040 (17.5) above by 0.00063
        n = Note.plain(60, 3, 0.3, CoreWire.ofDiameter(1.000e-3));
        assertEquals(17, WireConversion.toInch(SizeRounding.NEAREST, sizes()).convert(n).to().musicWireSize()
                .getAsDouble(), 1e-12);
        assertEquals(17.5, WireConversion.toInch(SizeRounding.UP, sizes()).convert(n).to().musicWireSize()
                .getAsDouble(), 1e-12);
        assertEquals(0.039 * IN, WireConversion.toInch(SizeRounding.DOWN, sizes()).convert(n).to().diameter(), 1e-12);
    }

    @Test
    void exactMatchesStayInBothDirections() {
        for (SizeRounding r : SizeRounding.values()) {
            WireChange c = WireConversion.toMetric(r, metric()).convert(Note.plain(60, 3, 0.3,
                    CoreWire.ofDiameter(0.900e-3)));
            assertFalse(c.changed(), r.word());
            assertEquals("already a metric diameter", c.remark());
            WireChange i = WireConversion.toInch(r, sizes()).convert(plainSize(14.5));
            assertFalse(i.changed(), r.word());
            assertEquals(14.5, i.to().musicWireSize().getAsDouble(), 1e-12);
        }
    }

    @Test
    void woundStringsKeepTheirCore() {
        Note wound = Note.plain(20, 2, 1.2, CoreWire.ofDiameter(1.23e-3)).withWrap(new Wrap(0.8e-3, 0, WrapMetal.COPPER));
        for (SizeRounding r : SizeRounding.values()) {
            WireChange c = WireConversion.toMetric(r, metric()).convert(wound);
            assertFalse(c.changed());
            assertEquals(1.23e-3, c.to().diameter(), 0);
        }
    }

    @Test
    void aMissingNeighbourFallsBackToTheEndAndSaysSo() {
        Note thin = Note.plain(88, 3, 0.05, CoreWire.ofDiameter(0.650e-3));
        WireChange c = WireConversion.toMetric(SizeRounding.DOWN, metric()).convert(thin);
        assertEquals(0.700e-3, c.to().diameter(), 1e-12);
        assertTrue(c.remark().startsWith("no metric diameter at or below"), c.remark());
    }

    @Test
    void keepChangesNothing() {
        Note n = plainSize(13);
        assertFalse(WireConversion.keep().convert(n).changed());
        assertEquals("wire kept as it is", WireConversion.keep().describe());
    }
}
