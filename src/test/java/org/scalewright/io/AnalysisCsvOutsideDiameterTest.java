package org.scalewright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

/** The results CSV shows a wound string's outside diameter beside its wire, given by wraps or by OD. */
class AnalysisCsvOutsideDiameterTest {
    @TempDir
    Path dir;

    @Test
    void theOutsideDiameterStandsBesideTheWire() throws Exception {
        Path sheet = Files.writeString(dir.resolve("two.csv"), "key,strings,length_mm,wire_mm,wrap1_mm,wrap2_mm,od_mm,od1_mm\n"
                + "1,1,1400,1.5,1.2,1.0,,\n"
                + "2,1,1390,1.5,,,5.9,3.9\n"
                + "60,3,300,1.0,,,,\n", StandardCharsets.UTF_8);
        ScaleAnalysis a = ScaleAnalyzer.analyze(ScaleSheetReader.standard().read(sheet), BuiltInData.defaultSettings());
        List<List<String>> rows = AnalysisCsv.rows(a);
        int od = AnalysisCsv.HEADER.indexOf("od_mm");
        int wire = AnalysisCsv.HEADER.indexOf("wire");
        // hand-worked: 1.5 + 2 x 1.2 + 2 x 1.0 = 5.9 mm; the second string is the same one given by its diameters
        assertEquals("5.9", rows.get(0).get(od));
        assertEquals("5.9", rows.get(1).get(od));
        assertEquals(rows.get(0).get(wire), rows.get(1).get(wire), "one notation, however the string was entered");
        assertEquals("", rows.get(2).get(od), "plain wire has no outside diameter");
    }
}
