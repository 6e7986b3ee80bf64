package org.scalewright.report;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.scalewright.design.orders.WireAllowances;
import org.scalewright.io.BuiltInData;

class DefaultSourcesTest {
    @Test
    void theSourcesComeFromTheBuiltInTablesAndTheSettingsInUse() {
        List<String> l = DefaultSources.lines(BuiltInData.defaultSettings(), WireAllowances.DEFAULT);
        String all = String.join("\n", l);
        // the source column of materials.csv, line by line
        assertTrue(all.contains("Steel density 7850 kg/m3: common practice, no source"), all);
        assertTrue(all.contains("Copper density 8960 kg/m3: CRC Handbook of Chemistry and Physics (pure copper), "
                + "from memory"), all);
        assertTrue(all.contains("Youngs modulus 200 GPa: Budynas & Nisbett"), all);
        // the strength table's own notes and the wire-size table's header comments
        // the built-in strength table cites the standard; how it was obtained stays in its resource header
        String strength = l.stream().filter(s -> s.startsWith("Breaking strength")).findFirst().orElseThrow();
        assertTrue(strength.startsWith("Breaking strength - ASTM A228/A228M minimum tensile strength: "
                + "ASTM A228/A228M, steel wire, music spring quality"), strength);
        for (String word : List.of("memory", "How this table", "interwire", "http")) {
            assertFalse(strength.toLowerCase(java.util.Locale.ROOT).contains(word.toLowerCase(java.util.Locale.ROOT)),
                    word + " in: " + strength);
        }
        assertTrue(all.contains("Music Wire Gauge table, Machinery's Handbook, from memory"), all);
        assertTrue(all.contains("150 mm per string for the tuning-pin coil and hitch"), all);
        assertTrue(all.contains("Railsback"), all);
    }
}
