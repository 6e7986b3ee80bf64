package org.scalewright.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.design.rescale.WrapWires;
import org.scalewright.model.WrapMetal;

/**
 * The wrap-wire catalogue: the built-in one offers copper and soft iron finer than the old 0.05 mm
 * steps over the range string makers wind with (the project's requirement, not an outside fact),
 * says where it comes from, and a user's file replaces it, read with line and column for each problem.
 */
class WrapCatalogueReaderTest {
    @TempDir
    Path dir;

    @Test
    void theBuiltInCatalogueIsFineOverTheWoundRangeAndNamesItsSource() throws Exception {
        WrapWires w = BuiltInData.wrapWire();
        for (WrapMetal m : new WrapMetal[] {WrapMetal.COPPER, WrapMetal.IRON}) {
            assertTrue(w.offers(m), m.toString());
            assertTrue(w.thinnest(m) <= 0.20e-3 + 1e-12, m.toString());
            assertTrue(w.thickest(m) >= 2.00e-3 - 1e-12, m.toString());
            for (double d = 0.20e-3; d < 2.0e-3; d += 0.003e-3) {
                double[] around = w.around(d, m);
                double gap = around.length == 1 ? 0 : around[1] - around[0];
                assertTrue(gap <= 0.01e-3 + 1e-12, m + " at " + d + ": gap " + gap);
            }
        }
        try (InputStream in = BuiltInData.class.getResourceAsStream("/org/scalewright/data/wrap-wire.csv")) {
            String text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
            assertTrue(text.lines().filter(l -> l.startsWith("#")).anyMatch(l -> l.toLowerCase().contains("no source")),
                    "the header says plainly where the list comes from");
        }
    }

    @Test
    void aUsersCatalogueReplacesTheBuiltInOne() throws Exception {
        Path f = dir.resolve("maker.csv");
        Files.writeString(f, "# A string maker's winding wire\nmetal,diameter_in\ncopper,0.010\ncopper,0.020\n"
                + "iron,0.015\n");
        WrapWires w = WrapCatalogueReader.read(f);
        assertEquals("A string maker's winding wire", w.description());
        assertArrayEquals(new double[] {0.254e-3, 0.508e-3}, w.around(0.3e-3, WrapMetal.COPPER), 1e-12);
        assertArrayEquals(new double[] {0.381e-3}, w.around(0.3e-3, WrapMetal.IRON), 1e-12);
        assertFalse(w.offers(WrapMetal.STEEL));
    }

    @Test
    void aBrokenCatalogueNamesEachProblemWithLineAndColumn() throws Exception {
        Path f = dir.resolve("bad.csv");
        Files.writeString(f, "# bad\nmetal,diameter_mm\nbrass,0.5\ncopper,-1\ncopper,0.5\ncopper,0.50\n");
        BadInputException e = assertThrows(BadInputException.class, () -> WrapCatalogueReader.read(f));
        assertEquals(3, e.problems().size(), e.getMessage());
        assertEquals(3, e.problems().get(0).line());
        assertEquals("metal", e.problems().get(0).column());
        assertEquals(4, e.problems().get(1).line());
        assertEquals(6, e.problems().get(2).line());
        assertTrue(e.problems().get(2).message().contains("twice"), e.getMessage());
    }

    @Test
    void aBrokenHeaderNamesEveryProblemOfIt() throws Exception {
        Path f = dir.resolve("header.csv");
        Files.writeString(f, "metal,metal,gauge\ncopper,copper,0.5\n");
        BadInputException e = assertThrows(BadInputException.class, () -> WrapCatalogueReader.read(f));
        assertEquals(3, e.problems().size(), e.getMessage());
        assertEquals("more than one metal column", e.problems().get(0).message());
        assertEquals("unknown column; expected metal, and diameter_mm or diameter_in", e.problems().get(1).message());
        assertEquals("gauge", e.problems().get(1).column());
        assertEquals("no diameter column (diameter_mm or diameter_in)", e.problems().get(2).message());
    }
}
