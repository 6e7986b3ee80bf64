package org.scalewright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;

/** Read → write → read gives an equal scale (DESIGN §4), keeping columns and units. */
class ScaleSheetRoundTripTest {
    private static final String METRIC = """
            # title: Round trip, "metric" grand
            # a4_hz: 442
            key,strings,length_mm,wire,wire_mm,wrap1_mm,wrap2_mm,wrap_metal,pitch_hz,cents,strike_mm,total_mm,winding_mm,section,remark
            -1,1,2010,,1.65,0.7,1.45,copper,,,240,2150,1880,bass,extended key
            1,1,1985.5,,1.6,0.65,1.4,copper,27.3,,235,2120,1850,bass,"measured, flat"
            10,2,1500,,1.3,1.05,,iron,,-2.5,180,1640,1380,bass,"says ""iron"" on the tag"
            20,2,1160,,1.1,0.45,,copper,,,140,1300,1050,"tenor, wound",=SUM(A1:A9)
            30,3,980,17.5,,,,,,,118,1100,,tenor,-see note
            45,3,690,15,,,,,,3,80,800,,treble 1,+1 from old scale
            60,3,330,,0.925,,,,,,40,420,,treble 2,@maker
            88,3,51.5,13,,,,,4186.009,,6.5,120,,treble 2,"#not a comment"
            """;

    private static final String INCH = """
            # title: Round trip upright, inches
            KEY,strings,length_in,wire,wire_in,wrap1_in,wrap2_in,wrap_metal,strike_in,total_in,winding_in,section,remark
            1,1,46.5,,0.059,0.028,0.052,copper,5.5,50,44,bass,
            12,2,38.25,,0.047,0.035,,copper,4.4,42,36,bass,
            24,2,30.125,,0.041,0.016,,iron,3.5,33.5,28,tenor,'=already quoted
            40,3,24.875,16.5,,,,,2.9,28,,tenor,
            88,3,2.0625,,0.031,,,,0.25,5,,treble,
            """;

    @TempDir
    Path dir;

    private static Scale read(String text) throws BadInputException {
        return ScaleSheetReader.standard().read(Path.of("sheet.csv"), text.getBytes(StandardCharsets.UTF_8));
    }

    @ParameterizedTest
    @ValueSource(strings = {"metric", "inch"})
    @DisplayName("read → write → read is equal, and writing again gives the same text")
    void roundTrip(String which) throws Exception {
        Scale first = read(which.equals("metric") ? METRIC : INCH);
        String written = ScaleSheetWriter.toText(first);
        Scale second = read(written);
        assertEquals(first, second, written);
        assertEquals(written, ScaleSheetWriter.toText(second));
    }

    @Test
    @DisplayName("the written metric sheet keeps every column and unit, quotes where needed, neutralises formulas")
    void writtenMetricText() throws Exception {
        Scale s = read(METRIC);
        String text = ScaleSheetWriter.toText(s);
        List<String> lines = text.lines().toList();
        assertEquals("#,\"title: Round trip, \"\"metric\"\" grand\"", lines.get(0), "a comment with a comma is one quoted cell");
        assertEquals("# a4_hz: 442", lines.get(1));
        assertEquals("key,strings,length_mm,wire,wire_mm,wrap1_mm,wrap2_mm,wrap_metal,pitch_hz,cents,strike_mm,"
                + "total_mm,winding_mm,section,remark", lines.get(2));
        assertTrue(text.contains(",\"says \"\"iron\"\" on the tag\""), text);
        assertTrue(text.contains(",\"tenor, wound\",'=SUM(A1:A9)"), text);
        assertTrue(text.contains(",tenor,'-see note"), text);
        assertTrue(text.contains(",treble 1,'+1 from old scale"), text);
        assertTrue(text.contains(",'@maker"), text);
        assertTrue(text.contains(",\"#not a comment\""), text);
        assertTrue(text.contains("30,3,980,17.5,,"), "size kept as a size: " + text);
        // and the reader gives the user's text back without the protective apostrophe
        Scale back = read(text);
        assertEquals("=SUM(A1:A9)", back.note(20).orElseThrow().remark());
        assertEquals("-see note", back.note(30).orElseThrow().remark());
        assertEquals("#not a comment", back.note(88).orElseThrow().remark());
        assertEquals("tenor, wound", back.note(20).orElseThrow().section());
    }

    @Test
    @DisplayName("an inch sheet is written in inches")
    void writtenInchText() throws Exception {
        String text = ScaleSheetWriter.toText(read(INCH));
        assertTrue(text.contains("key,strings,length_in,wire,wire_in,wrap1_in,wrap2_in,wrap_metal,strike_in,total_in,"
                + "winding_in,section,remark"), text);
        assertTrue(text.contains("\n1,1,46.5,,0.059,0.028,0.052,copper,5.5,50,44,bass,\n"), text);
        assertTrue(text.contains("\n88,3,2.0625,,0.031,"), text);
    }

    @Test
    @DisplayName("free comment lines before the header are written back; title and A4 are not repeated among them")
    void commentsKept() throws Exception {
        Scale first = read("# title: Shop grand\n# measured 2026-11-30 by the shop\n#\n# a4_hz: 442\n"
                + "key,strings,length_mm,wire_mm\n1,1,1500,1.5\n");
        assertEquals(List.of("measured 2026-11-30 by the shop", ""), first.layout().comments());
        String text = ScaleSheetWriter.toText(first);
        assertTrue(text.contains("# measured 2026-11-30 by the shop\n"), text);
        assertEquals(1, text.split("title:", -1).length - 1, text);
        assertEquals(first, read(text));
    }

    @Test
    @DisplayName("a sheet giving wound strings without a wrap_metal column round-trips equal")
    void woundWithoutMetalColumn() throws Exception {
        Scale first = read("key,strings,length_mm,wire_mm,wrap1_mm\n1,1,1500,1.5,1.1\n40,3,620,1.0,\n");
        Scale second = read(ScaleSheetWriter.toText(first));
        assertEquals(first, second, ScaleSheetWriter.toText(first));
    }

    @Test
    @DisplayName("a scale made in code (default layout) is written with the columns its notes need and reads back equal")
    void scaleMadeInCode() throws Exception {
        List<Note> notes = new ArrayList<>();
        notes.add(new Note(1, 1, 1.5, CoreWire.ofDiameter(1.5e-3), new Wrap(0.6e-3, 1.3e-3, WrapMetal.IRON),
                OptionalDouble.of(27.4), 0, OptionalDouble.empty(), OptionalDouble.of(1.62), OptionalDouble.of(1.4),
                "bass", "a, b"));
        notes.add(Note.plain(40, 3, 0.62, CoreWire.ofSize(16, 0.037 * 0.0254)));
        notes.add(Note.plain(50, 3, 0.39, CoreWire.ofDiameter(0.975e-3)).withPitch(OptionalDouble.empty(), 4.5));
        Scale s = new Scale("made in code", new PitchStandard(440), notes, null);
        Scale back = read(ScaleSheetWriter.toText(s));
        assertEquals(s.notes(), back.notes());
        assertEquals(s.title(), back.title());
        assertEquals(s.pitch(), back.pitch());
        assertEquals(back, read(ScaleSheetWriter.toText(back)));
    }

    @Test
    @DisplayName("a back length given in code gets its column in the default layout, a scale without one none")
    void backLengthMadeInCode() throws Exception {
        Note wound = new Note(1, 1, 1.5, CoreWire.ofDiameter(1.5e-3), Wrap.single(1.2e-3, WrapMetal.COPPER),
                OptionalDouble.empty(), 0, OptionalDouble.empty(), OptionalDouble.of(1.65), OptionalDouble.empty(),
                "", "", OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.of(0.0925));
        Scale s = new Scale("made in code", new PitchStandard(440), List.of(wound,
                Note.plain(40, 3, 0.62, CoreWire.ofSize(16, 0.037 * 0.0254))), null);
        String text = ScaleSheetWriter.toText(s);
        assertTrue(text.contains("back_mm"), text);
        assertTrue(text.contains(",92.5\n"), text);
        assertEquals(s.notes(), read(text).notes());
        Scale without = new Scale("made in code", new PitchStandard(440), List.of(wound.withBackLength(
                OptionalDouble.empty())), null);
        assertFalse(ScaleSheetWriter.toText(without).contains("back_mm"));
    }

    @Test
    @DisplayName("write() replaces the file atomically and can keep the previous one as .bak")
    void writeToDisk() throws Exception {
        Path f = dir.resolve("out.csv");
        Scale s = read(METRIC);
        ScaleSheetWriter.write(s, f, true);
        assertFalse(Files.exists(dir.resolve("out.csv.bak")), "no backup of a file that did not exist");
        assertEquals(s, ScaleSheetReader.standard().read(f));
        Scale changed = s.withTitle("changed");
        ScaleSheetWriter.write(changed, f, true);
        assertEquals(changed, ScaleSheetReader.standard().read(f));
        assertEquals(s, ScaleSheetReader.standard().read(dir.resolve("out.csv.bak")));
        try (var listing = Files.list(dir)) {
            assertEquals(2, listing.count(), "no temporary files left behind");
        }
    }

    @Test
    @DisplayName("lengths typed with many digits survive the round trip")
    void manyDigits() throws Exception {
        Scale first = read("key,strings,length_mm,wire_in\n1,1,1987.123456789,0.0591\n2,1,1234.5678901234,0.05905\n");
        Scale second = read(ScaleSheetWriter.toText(first));
        assertEquals(first, second, ScaleSheetWriter.toText(first));
        assertTrue(ScaleSheetWriter.toText(first).contains("\n2,1,1234.5678901234,0.05905\n"));
        // computed values (as a design tool makes them) are written to the precision of their quantity, not
        // with every binary digit: lengths to 0.1 mm (0.001 in), diameters to 0.001 mm (0.00001 in); pitch and
        // cents have no catalogue precision and come back exactly; a second write → read changes nothing
        java.util.Random rnd = new java.util.Random(7);
        List<Note> notes = new ArrayList<>();
        for (int k = 1; k <= 88; k++) {
            double d = (0.8 + rnd.nextDouble()) * 1e-3;
            // a row gives pitch_hz or cents, never both (DESIGN §4): even keys a measured pitch, odd keys cents
            double measured = 27.5 * Math.pow(2, (k - 1) / 12.0) * (1 + rnd.nextGaussian() * 1e-3);
            double cents = rnd.nextGaussian() * 3;
            Note n = Note.plain(k, 3, 0.05 + rnd.nextDouble() * 2, CoreWire.ofDiameter(d))
                    .withPitch(k % 2 == 0 ? OptionalDouble.of(measured) : OptionalDouble.empty(), k % 2 == 0 ? 0 : cents);
            notes.add(k < 30 ? n.withWrap(new Wrap(d * rnd.nextDouble(), d * rnd.nextDouble(), WrapMetal.COPPER)) : n);
        }
        Scale computed = new Scale("computed", new PitchStandard(440 + rnd.nextDouble()), notes, null);
        Scale inches = read(INCH).withNotes(notes).withPitch(computed.pitch());
        for (Scale sc : List.of(computed, inches)) {
            Scale back = read(ScaleSheetWriter.toText(sc));
            assertEquals(sc.pitch(), back.pitch());
            for (int i = 0; i < notes.size(); i++) {
                assertClose(sc.notes().get(i), back.notes().get(i));
            }
            assertEquals(back, read(ScaleSheetWriter.toText(back)));
        }
    }

    /** Half of 0.1 mm and of 0.001 mm, m: the most a computed length or diameter moves when written. */
    private static final double LENGTH_PRECISION = 0.05e-3;
    private static final double DIAMETER_PRECISION = 0.0005e-3;

    private static void assertClose(Note a, Note b) {
        String what = a.toString();
        assertEquals(a.speakingLength(), b.speakingLength(), LENGTH_PRECISION, what);
        assertEquals(a.wire().diameter(), b.wire().diameter(), DIAMETER_PRECISION, what);
        assertEquals(a.pitchHz(), b.pitchHz(), what);
        assertEquals(a.cents(), b.cents(), 0, what);
        assertEquals(a.isWound(), b.isWound(), what);
        if (a.isWound()) {
            assertEquals(a.wrap().inner(), b.wrap().inner(), DIAMETER_PRECISION, what);
            assertEquals(a.wrap().outer(), b.wrap().outer(), DIAMETER_PRECISION, what);
        }
    }

    @Test
    @DisplayName("a remark with a line break is written so that the sheet still loads")
    void lineBreakInRemark() throws Exception {
        Scale s = new Scale("", null, List.of(Note.plain(40, 3, 0.62, CoreWire.ofDiameter(1e-3))
                .withRemark("first line\nsecond line").withSection("ten\r\nor")), null);
        Scale back = read(ScaleSheetWriter.toText(s));
        assertEquals(1, back.notes().size());
        assertEquals("first line second line", back.note(40).orElseThrow().remark());
        assertEquals("ten or", back.note(40).orElseThrow().section());
    }

    @Test
    @DisplayName("a column typed with a fixed number of decimals is written back with them")
    void columnDecimalsKept() throws Exception {
        String typed = "key,strings,length_mm,wire_mm,wrap1_mm\n1,1,1480.0,1.60,1.30\n2,1,1465.5,1.55,1.25\n";
        String text = ScaleSheetWriter.toText(read(typed));
        assertTrue(text.endsWith("key,strings,length_mm,wire_mm,wrap1_mm\n1,1,1480.0,1.60,1.30\n2,1,1465.5,1.55,1.25\n"),
                text);
        // a computed value in such a column: its own digits, padded to the column's
        Scale s = read(typed);
        Note planned = s.note(2).orElseThrow().withWrap(new Wrap(104 * 0.01e-3, 0, WrapMetal.COPPER));
        String written = ScaleSheetWriter.toText(s.withNotes(List.of(s.note(1).orElseThrow(), planned)));
        assertTrue(written.contains("\n2,1,1465.5,1.55,1.04\n"), written);
        Note finer = planned.withWrap(new Wrap(43 * 0.025e-3, 0, WrapMetal.COPPER));
        written = ScaleSheetWriter.toText(s.withNotes(List.of(s.note(1).orElseThrow(), finer)));
        assertTrue(written.contains("\n2,1,1465.5,1.55,1.075\n"), written);
    }
}
