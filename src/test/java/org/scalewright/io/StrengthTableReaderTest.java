package org.scalewright.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.model.UnitConversions;
import org.scalewright.physics.StrengthTable;

/**
 * A wire maker's strength table file (DESIGN §4). The tables here are made up for the test
 * (round numbers), not any maker's data; conversions use NIST SP 811 factors.
 */
class StrengthTableReaderTest {
    @TempDir
    Path dir;

    private StrengthTable read(String text) throws Exception {
        return StrengthTableReader.read(Files.writeString(dir.resolve("maker.csv"), text));
    }

    private List<SheetProblem> problems(String text) throws IOException {
        Path f = Files.writeString(dir.resolve("bad.csv"), text);
        return assertThrows(BadInputException.class, () -> StrengthTableReader.read(f)).problems();
    }

    private void only(String text, int line, String column, String fragment) throws IOException {
        List<SheetProblem> ps = problems(text);
        assertEquals(1, ps.size(), ps.toString());
        SheetProblem p = ps.get(0);
        assertEquals(line, p.line(), p.toString());
        assertEquals(column, p.column(), p.toString());
        assertTrue(p.message().contains(fragment), p.toString());
        assertTrue(p.toString().startsWith("bad.csv"), p.toString());
    }

    @Test
    @DisplayName("tensile_mpa in mm; name and source notes from the comments")
    void megapascals() throws Exception {
        StrengthTable t = read("""
                # Test maker, polished piano wire
                # figures made up for the test
                diameter_mm,tensile_mpa
                0.8,2400
                1.0,2300
                1.6,2100
                """);
        assertEquals("Test maker, polished piano wire", t.name());
        assertEquals(List.of("Test maker, polished piano wire", "figures made up for the test"), t.sourceNotes());
        assertArrayEquals(new double[] {0.8e-3, 1.0e-3, 1.6e-3}, t.diameters(), 1e-18);
        assertEquals(2300e6, t.strengthAt(1.0e-3), 1e-3);
        assertEquals(Math.sqrt(2400e6 * 2300e6), t.strengthAt(Math.sqrt(0.8e-3 * 1.0e-3)), 1e-3); // log-log
    }

    @Test
    @DisplayName("tensile_ksi in inches: 1 ksi = 6.894 757 MPa, 1 in = 25.4 mm (NIST SP 811)")
    void ksi() throws Exception {
        StrengthTable t = read("diameter_in,tensile_ksi\n0.030,330\n0.040,315\n");
        assertEquals(0.030 * 0.0254, t.minDiameter(), 1e-18);
        assertEquals(330 * 6.894757e6, t.strengthAt(0.030 * 0.0254), 330 * 0.0000005e6 + 1);
        assertEquals(315 * UnitConversions.PASCALS_PER_KSI, t.strengthAt(0.040 * 0.0254), 1e-3);
    }

    @Test
    @DisplayName("breaking_load_n: strength = load / (π d²/4)")
    void breakingLoadNewtons() throws Exception {
        StrengthTable t = read("diameter_mm,breaking_load_n\n1.0,1800\n1.2,2500\n");
        assertEquals(1800 / (Math.PI * 1e-6 / 4), t.strengthAt(1.0e-3), 1e-3);
        assertEquals(2500 / (Math.PI * 1.44e-6 / 4), t.strengthAt(1.2e-3), 1e-3);
    }

    @Test
    @DisplayName("breaking_load_lbf: load in lbf × 4.448 222 N (NIST SP 811) / area")
    void breakingLoadPoundsForce() throws Exception {
        StrengthTable t = read("diameter_in,breaking_load_lbf\n0.033,280\n0.045,500\n");
        double d = 0.033 * 0.0254;
        assertEquals(280 * 4.4482216152605 / (Math.PI * d * d / 4), t.strengthAt(d), 1e-3);
        // hand-worked: 280 lbf on 0.033 in wire = 280 / (π 0.033²/4) psi = 327.4 ksi
        assertEquals(327.4, t.strengthAt(d) / UnitConversions.PASCALS_PER_KSI, 0.05);
    }

    @Test
    @DisplayName("rows in any order are sorted; header names are case-insensitive")
    void unsortedRows() throws Exception {
        StrengthTable t = read("TENSILE_MPA,Diameter_MM\n2100,1.6\n2400,0.8\n2300,1.0\n");
        assertArrayEquals(new double[] {0.8e-3, 1.0e-3, 1.6e-3}, t.diameters(), 1e-18);
        assertArrayEquals(new double[] {2400e6, 2300e6, 2100e6}, t.strengths(), 1e-3);
        assertEquals("maker.csv", t.name(), "named after the file when it has no comment");
    }

    @Test
    @DisplayName("a maker's table replaces the default in an analysis")
    void usableAsSettings() throws Exception {
        StrengthTable t = read("diameter_mm,tensile_mpa\n0.5,2000\n2.0,2000\n");
        assertEquals(2000e6, BuiltInData.defaultSettings().withStrength(t).strength().strengthAt(1e-3), 1e-3);
    }

    @Test
    void duplicateDiameter() throws IOException {
        only("diameter_mm,tensile_mpa\n1.0,2300\n1.2,2250\n1.00,2310\n", 4, "diameter_mm",
                "diameter 1.0 appears twice (first on line 2)");
    }

    @Test
    void badValues() throws IOException {
        only("diameter_mm,tensile_mpa\n1.0,2300\n1.2,lots\n", 3, "tensile_mpa", "expected a number, was 'lots'");
        only("diameter_mm,tensile_mpa\n1.0,2300\n1.2,2200f\n", 3, "tensile_mpa", "expected a number, was '2200f'");
        only("diameter_mm,tensile_mpa\n1.0,2300\n-1.2,2200\n", 3, "diameter_mm", "must be greater than 0");
        only("diameter_mm,tensile_mpa\n1.0,2300\n1.2,0\n", 3, "tensile_mpa", "must be greater than 0");
        only("diameter_mm,tensile_mpa\n1.0,2300\n1.2,\n", 3, "tensile_mpa", "a value is required");
        only("diameter_mm,tensile_mpa\n1.0,2300\n1.2,2200,x\n", 3, "", "more cells than the header");
    }

    @Test
    void badHeaders() throws IOException {
        only("diameter_mm,tensile_mpa,colour\n1.0,2300,red\n1.2,2200,red\n", 1, "colour", "unknown column");
        only("diameter_mm\n1.0\n1.2\n", 1, "", "no strength column");
        only("tensile_mpa\n2300\n2200\n", 1, "", "no diameter column");
        only("diameter_mm,diameter_in,tensile_mpa\n1,0.04,2300\n", 1, "diameter_in", "more than one diameter column");
        only("diameter_mm,tensile_mpa,tensile_ksi\n1,2300,330\n", 1, "tensile_ksi", "more than one strength column");
        only("# only a comment\n", 0, "", "no header");
        only("", 0, "", "empty");
        only("diameter_mm,tensile_mpa\n1.0,2300\n", 1, "", "at least two rows");
    }

    @Test
    void notText() throws IOException {
        Path f = dir.resolve("bin.csv");
        Files.write(f, new byte[] {1, 2, 0, 4});
        BadInputException e = assertThrows(BadInputException.class, () -> StrengthTableReader.read(f));
        assertTrue(e.getMessage().contains("not a text file"), e.getMessage());
    }
}
