package org.scalewright.report;

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
        assertTrue(all.contains("as republished by music and spring wire makers"), all);
        assertTrue(all.contains("Music Wire Gauge table, Machinery's Handbook, from memory"), all);
        assertTrue(all.contains("150 mm per string for the tuning-pin coil and hitch"), all);
        assertTrue(all.contains("Railsback"), all);
    }
}
