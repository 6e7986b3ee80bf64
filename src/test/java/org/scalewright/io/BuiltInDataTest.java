package org.scalewright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.scalewright.model.Materials;
import org.scalewright.model.WireSize;

/** The bundled tables (DESIGN §3 defaults) as the engine sees them. */
class BuiltInDataTest {

    @Test
    @DisplayName("music-wire sizes 12–23 in half steps: d[in] = (2·size + 5)/1000 (Music Wire Gauge, Machinery's "
            + "Handbook, from memory; half sizes common practice, no source)")
    void musicWireSizes() {
        List<WireSize> sizes = BuiltInData.musicWireSizes().sizes();
        assertEquals(23, sizes.size());
        for (WireSize s : sizes) {
            assertEquals((2 * s.size() + 5) / 1000 * 0.0254, s.diameter(), 1e-15, "size " + s.size());
        }
        assertEquals(12, sizes.get(0).size());
        assertEquals(23, sizes.get(22).size());
        assertEquals(0.033 * 0.0254, BuiltInData.musicWireSizes().bySize(14).orElseThrow().diameter(), 1e-15);
        assertTrue(BuiltInData.musicWireSizes().bySize(24).isEmpty());
    }

    @Test
    @DisplayName("metric plain wire 0.700–1.600 mm in 0.025 mm steps, equal to the same diameters read from a sheet")
    void metricPlainWire() throws Exception {
        List<Double> metric = BuiltInData.metricPlainWire();
        assertEquals(37, metric.size());
        StringBuilder sheet = new StringBuilder("key,strings,length_mm,wire_mm\n");
        for (int i = 0; i < metric.size(); i++) {
            assertEquals(0.7e-3 + i * 0.025e-3, metric.get(i), 1e-12);
            sheet.append(i + 1).append(",3,600,").append(String.format(java.util.Locale.ROOT, "%.3f", 0.7 + 0.025 * i))
                    .append('\n');
        }
        var scale = ScaleSheetReader.standard().read(Path.of("m.csv"), sheet.toString().getBytes(StandardCharsets.UTF_8));
        for (int i = 0; i < metric.size(); i++) {
            assertEquals(metric.get(i), scale.notes().get(i).wire().diameter(), 0.0, "exactly the same double");
        }
    }

    @Test
    @DisplayName("materials: steel 7850 kg/m³ (common practice), copper 8960 and iron 7870 kg/m³ (CRC Handbook, from "
            + "memory), E = 200 GPa (Shigley's Table 10-5, from memory)")
    void materials() {
        Materials m = BuiltInData.materials();
        assertEquals(7850, m.steelDensity());
        assertEquals(8960, m.copperDensity());
        assertEquals(7870, m.ironDensity());
        assertEquals(200e9, m.youngsModulus());
    }

    @Test
    @DisplayName("the cautions of DESIGN §8 are bundled: eye protection, staged pitch raise, maker's data")
    void cautions() {
        String all = String.join(" ", BuiltInData.cautions()).toLowerCase(java.util.Locale.ROOT);
        assertTrue(all.contains("eye protection"), all);
        assertTrue(all.contains("stages"), all);
        assertTrue(all.contains("wire maker"), all);
        assertFalse(BuiltInData.cautions().isEmpty());
    }

    @Test
    void defaultSettingsUseTheAstmMinimum() {
        assertEquals(BuiltInData.astmMinimum(), BuiltInData.defaultSettings().strength());
        assertEquals(BuiltInData.materials(), BuiltInData.defaultSettings().materials());
    }
}
