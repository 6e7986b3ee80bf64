package org.scalewright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.model.Note;
import org.scalewright.model.Scale;
import org.scalewright.model.Wrap;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalyzer;
import org.scalewright.physics.StringPhysics;

/**
 * A wound string entered as measured (DESIGN §3, §4): by outside diameter ({@code od}, {@code od1})
 * instead of its wrap wires, and with its bare core at each end ({@code bare_front}, {@code bare_back}).
 */
class MeasuredWindingSheetTest {
    @TempDir
    Path dir;

    private Path file(String name, String text) throws IOException {
        return Files.writeString(dir.resolve(name), text, StandardCharsets.UTF_8);
    }

    private Scale read(String text) throws Exception {
        return ScaleSheetReader.standard().read(file("sheet.csv", text));
    }

    /** Asserts that the sheet is refused with a problem on this line and column whose message holds the fragment. */
    private void refused(String text, int line, String column, String fragment) throws IOException {
        Path f = file("bad.csv", text);
        BadInputException e = assertThrows(BadInputException.class, () -> ScaleSheetReader.standard().read(f));
        boolean found = e.problems().stream().anyMatch(p -> p.line() == line && p.column().equals(column)
                && p.message().contains(fragment)
                && p.toString().startsWith("bad.csv, line " + line + ", column " + column + ": "));
        assertTrue(found, e.problems().toString());
    }

    private static NoteResult only(Scale s) {
        return ScaleAnalyzer.analyze(s, BuiltInData.defaultSettings()).notes().get(0);
    }

    @Test
    @DisplayName("a single-wound wrap follows from core and OD, a double-wound one from core, OD1 and OD")
    void wrapsFollowFromTheOutsideDiameters() throws Exception {
        Scale s = read("""
                key,strings,length_mm,wire,wire_mm,od_mm,od1_mm,wrap_metal
                1,1,1950,,1.6,5.9,3.0,copper
                20,2,1150,,1.1,2.3,,iron
                """);
        Wrap dbl = s.notes().get(0).wrap();
        assertTrue(dbl.givenByOd());
        assertEquals(0.7e-3, dbl.inner(), 1e-12);
        assertEquals(1.45e-3, dbl.outer(), 1e-12);
        Wrap single = s.notes().get(1).wrap();
        assertEquals(0.6e-3, single.inner(), 1e-12);
        assertEquals(0, single.outer());
        assertEquals(2.3e-3, s.notes().get(1).outsideDiameter(), 1e-15);
    }

    @Test
    @DisplayName("a one-note sheet given by OD analyses to the same tension as the string given by its wrap (single)")
    void singleWoundByOdAndByWrapAgree() throws Exception {
        NoteResult byWrap = only(read("key,strings,length_mm,wire_mm,wrap1_mm\n20,2,1150,1.55,0.975\n"));
        NoteResult byOd = only(read("key,strings,length_mm,wire_mm,od_mm\n20,2,1150,1.55,3.5\n"));
        assertEquals(byWrap.tension(), byOd.tension(), 1e-4 * byWrap.tension());
        assertTrue(byWrap.tension() > 500, "a wound string at pitch: " + byWrap.tension());
    }

    @Test
    @DisplayName("a one-note sheet given by OD1 and OD analyses to the same tension as the string given by its wraps (double)")
    void doubleWoundByOdAndByWrapAgree() throws Exception {
        NoteResult byWrap = only(read("key,strings,length_mm,wire_mm,wrap1_mm,wrap2_mm\n1,1,1950,1.6,0.7,1.45\n"));
        NoteResult byOd = only(read("key,strings,length_mm,wire_mm,od1_mm,od_mm\n1,1,1950,1.6,3.0,5.9\n"));
        assertEquals(byWrap.tension(), byOd.tension(), 1e-4 * byWrap.tension());
        // the outer layer counts: a string given by the same OD but single wound is another string
        NoteResult single = only(read("key,strings,length_mm,wire_mm,od_mm\n1,1,1950,1.6,5.9\n"));
        assertTrue(Math.abs(single.tension() / byOd.tension() - 1) > 0.01);
    }

    @Test
    @DisplayName("an inch sheet given by OD gives the same wraps as its metric twin")
    void inchOd() throws Exception {
        Note in = read("key,strings,length_in,wire_in,od_in,od1_in\n1,1,76.0,0.063,0.2323,0.1181\n").notes().get(0);
        assertEquals((0.1181 - 0.063) / 2 * 0.0254, in.wrap().inner(), 1e-12);
        assertEquals((0.2323 - 0.1181) / 2 * 0.0254, in.wrap().outer(), 1e-12);
    }

    @Test
    @DisplayName("wraps and an OD on one row are refused at the OD's cell")
    void wrapsAndOdTogether() throws IOException {
        refused("key,strings,length_mm,wire_mm,wrap1_mm,od_mm\n1,1,1950,1.6,0.9,3.4\n", 2, "od_mm", "not both");
        refused("key,strings,length_mm,wire_mm,wrap1_mm,wrap2_mm,od_mm,od1_mm\n1,1,1950,1.6,0.7,,,3.4\n", 2,
                "od1_mm", "not both");
    }

    @Test
    @DisplayName("an OD without a core is refused at the OD's cell")
    void odWithoutCore() throws IOException {
        refused("key,strings,length_mm,wire,wire_mm,od_mm\n1,1,1950,,,3.4\n", 2, "od_mm", "needs the core");
    }

    @Test
    @DisplayName("an OD not larger than the core is refused at the OD's cell, in the sheet's unit")
    void odNotLargerThanCore() throws IOException {
        refused("key,strings,length_mm,wire_mm,od_mm\n1,1,1950,1.6,1.6\n", 2, "od_mm",
                "the outside diameter 1.6 mm must be larger than the core, 1.600 mm");
        refused("key,strings,length_in,wire,od_in\n1,1,76,17,0.03\n", 2, "od_in", "must be larger than the core, 0.0390 in");
    }

    @Test
    @DisplayName("OD1 without an OD, in a row or in the header, is refused with its line and column")
    void od1WithoutOd() throws IOException {
        refused("key,strings,length_mm,wire_mm,od_mm,od1_mm\n1,1,1950,1.6,2.0,\n1,1,1950,1.6,,3.0\n".replaceFirst(
                "\n1,1,1950,1.6,2.0,\n", "\n2,1,1950,1.6,2.0,\n"), 3, "od1_mm", "needs the outside diameter");
        refused("key,strings,length_mm,wire_mm,od1_mm\n1,1,1950,1.6,3.0\n", 1, "od1_mm", "needs an outside-diameter column");
    }

    @Test
    @DisplayName("OD1 not between core and OD is refused at its cell")
    void od1NotBetween() throws IOException {
        refused("key,strings,length_mm,wire_mm,od1_mm,od_mm\n1,1,1950,1.6,6.0,5.9\n", 2, "od1_mm", "must lie between");
        refused("key,strings,length_mm,wire_mm,od1_mm,od_mm\n1,1,1950,1.6,1.5,5.9\n", 2, "od1_mm", "must lie between");
    }

    @Test
    @DisplayName("bare ends given exactly are what the tension uses; a winding alone splits the bare core equally")
    void bareEndsInTheTension() throws Exception {
        String head = "key,strings,length_mm,wire_mm,wrap1_mm,winding_mm,bare_front_mm,bare_back_mm\n";
        Note exact = read(head + "10,2,1500,1.3,1.05,,30,50\n").notes().get(0);
        NoteResult r = only(read(head + "10,2,1500,1.3,1.05,,30,50\n"));
        var m = BuiltInData.materials();
        double muW = StringPhysics.massPerLength(1.3e-3, exact.wrap(), m);
        double muCore = StringPhysics.plainMassPerLength(1.3e-3, m.steelDensity());
        assertEquals(StringPhysics.effectiveMassPerLength(muW, muCore, 1.5, 0.030, 0.050), r.massPerLength(), 1e-15);
        NoteResult split = only(read(head + "10,2,1500,1.3,1.05,1420,,\n"));
        NoteResult given = only(read(head + "10,2,1500,1.3,1.05,,40,40\n"));
        assertEquals(given.tension(), split.tension(), 1e-12 * given.tension());
        NoteResult oneEnd = only(read(head + "10,2,1500,1.3,1.05,1420,80,\n"));
        NoteResult bothGiven = only(read(head + "10,2,1500,1.3,1.05,1420,80,0\n"));
        assertEquals(bothGiven.tension(), oneEnd.tension(), 1e-12 * oneEnd.tension());
        // near an end the bare core's weight in the fundamental grows as the cube of its length:
        // 80 mm at one end lowers the tension more than 40 + 40
        assertTrue(oneEnd.tension() < split.tension());
    }

    @Test
    @DisplayName("bare ends and a winding that disagree by more than 0.5 mm are refused at the winding's cell")
    void bareEndsAndWindingDisagree() throws Exception {
        String head = "key,strings,length_mm,wire_mm,wrap1_mm,winding_mm,bare_front_mm,bare_back_mm\n";
        read(head + "10,2,1500,1.3,1.05,1420.4,40,40\n");
        refused(head + "10,2,1500,1.3,1.05,1420.6,40,40\n", 2, "winding_mm", "must add up to the speaking length");
        refused(head + "10,2,1500,1.3,1.05,1480,40,\n", 2, "winding_mm", "longer than the speaking length");
    }

    @Test
    @DisplayName("bare ends on plain wire, alone without a winding, or longer than the string are refused at their cell")
    void otherBareEndProblems() throws IOException {
        String head = "key,strings,length_mm,wire_mm,wrap1_mm,winding_mm,bare_front_mm,bare_back_mm\n";
        refused(head + "40,3,700,1.0,,,10,10\n", 2, "bare_front_mm", "belongs to a wound string");
        refused(head + "10,2,1500,1.3,1.05,,,40\n", 2, "bare_back_mm", "or one of them with the wound length");
        refused(head + "10,2,1500,1.3,1.05,,900,700\n", 2, "bare_front_mm", "longer than the speaking length");
        refused(head + "10,2,1500,1.3,1.05,,-1,700\n", 2, "bare_front_mm", "must be 0 or more");
    }

    @Test
    @DisplayName("a back length is read, kept through a write in its own unit, and refused where it leaves no front length")
    void backLength() throws Exception {
        String text = "key,strings,length_in,wire,wrap1_in,total_in,back_in\n1,1,76,17,0.04,84,3.5\n40,3,27.5,15,,31,\n";
        Scale s = read(text);
        assertEquals(3.5 * 0.0254, s.notes().get(0).backLength().getAsDouble(), 1e-12);
        assertTrue(s.notes().get(1).backLength().isEmpty());
        String written = ScaleSheetWriter.toText(s);
        assertEquals(cells(text), cells(written), written);
        assertEquals(s.notes(), ScaleSheetReader.standard().read(file("again.csv", written)).notes());
        // a sheet without the column is written without it
        assertFalse(ScaleSheetWriter.toText(read("key,strings,length_mm,wire\n40,3,700,15\n")).contains("back"));
        String head = "key,strings,length_mm,wire_mm,wrap1_mm,total_mm,back_mm\n";
        read(head + "10,2,1500,1.3,1.05,1700,199.9\n");
        refused(head + "10,2,1500,1.3,1.05,1700,200\n", 2, "back_mm",
                "the back length 200 mm and the speaking length 1500 mm leave nothing of the stretched length 1700 mm");
        refused(head + "10,2,1500,1.3,1.05,1700,0\n", 2, "back_mm", "must be greater than 0");
        refused(head + "10,2,1500,1.3,1.05,1700,-5\n", 2, "back_mm", "must be greater than 0");
    }

    private static final String MIXED = """
            # title: measured bass
            # a4_hz: 440
            key,strings,length_mm,wire_mm,wrap1_mm,wrap2_mm,od_mm,od1_mm,wrap_metal,winding_mm,bare_front_mm,bare_back_mm
            1,1,1950,1.6,,,5.90,3.00,copper,1880,30,40
            5,1,1800,1.55,0.65,1.3,,,copper,1760,,
            12,2,1500,1.3,,,3.35,,iron,,12.5,20
            20,2,1150,1.1,0.45,,,,copper,,,
            40,3,690,1.05,,,,,,,,
            """;

    @Test
    @DisplayName("read, write, read: a note given by OD is written back by its ODs, with the digits it was typed with")
    void roundTripKeepsTheOds() throws Exception {
        Scale first = read(MIXED);
        String written = ScaleSheetWriter.toText(first);
        assertEquals(cells(MIXED), cells(written), written);
        Scale again = ScaleSheetReader.standard().read(file("again.csv", written));
        assertEquals(first.notes(), again.notes());
        assertEquals(written, ScaleSheetWriter.toText(again));
    }

    @Test
    @DisplayName("a sheet given only by OD is written with od columns and no wrap columns")
    void odOnlySheet() throws Exception {
        String text = "key,strings,length_in,wire,od_in,od1_in\n1,1,76,17,0.2323,0.1181\n12,2,60,16,0.1205,\n";
        String written = ScaleSheetWriter.toText(read(text));
        assertFalse(written.contains("wrap1"), written);
        assertEquals(cells(text), cells(written), written);
    }

    /** @return the header and data cells of a sheet, comment lines left out */
    private static List<List<String>> cells(String sheet) {
        List<List<String>> out = new ArrayList<>();
        for (String line : sheet.split("\n")) {
            if (!line.isBlank() && !line.startsWith("#")) {
                out.add(List.of(line.split(",", -1)));
            }
        }
        return out;
    }
}
