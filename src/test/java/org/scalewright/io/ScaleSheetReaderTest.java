package org.scalewright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.Note;
import org.scalewright.model.Scale;
import org.scalewright.model.SheetColumn;
import org.scalewright.model.UnitConversions;
import org.scalewright.model.WrapMetal;
import org.scalewright.physics.FlagKind;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

/** Reading scale sheets (DESIGN §4): what loads, and a message with file, line and column for every bad input. */
class ScaleSheetReaderTest {
    private static final String HEADER = "key,strings,length_mm,wire_mm\n";

    @TempDir
    Path dir;

    private Path file(String name, String text) throws IOException {
        return Files.writeString(dir.resolve(name), text, StandardCharsets.UTF_8);
    }

    private Scale read(String text) throws Exception {
        return ScaleSheetReader.standard().read(file("sheet.csv", text));
    }

    private List<SheetProblem> problems(String text) throws IOException {
        Path f = file("bad.csv", text);
        BadInputException e = assertThrows(BadInputException.class, () -> ScaleSheetReader.standard().read(f));
        assertFalse(e.problems().isEmpty());
        for (SheetProblem p : e.problems()) {
            assertEquals(f, p.file());
            assertTrue(p.toString().startsWith("bad.csv"), p.toString());
        }
        return e.problems();
    }

    /** Asserts the one problem of a sheet: its line, column and a piece of its message. */
    private SheetProblem only(String text, int line, String column, String fragment) throws IOException {
        List<SheetProblem> ps = problems(text);
        assertEquals(1, ps.size(), ps.toString());
        SheetProblem p = ps.get(0);
        assertEquals(line, p.line(), p.toString());
        assertEquals(column, p.column(), p.toString());
        assertTrue(p.message().contains(fragment), p.toString());
        String where = "bad.csv" + (line > 0 ? ", line " + line : "") + (column.isEmpty() ? "" : ", column " + column);
        assertTrue(p.toString().startsWith(where + ": "), p.toString());
        return p;
    }

    @Test
    @DisplayName("a metric sheet loads: comments, title, A4, units converted to metres, sizes to diameters")
    void readsAMetricSheet() throws Exception {
        Scale s = read("""
                # title: Test grand, rescaled
                # a4_hz: 442
                # any other comment
                key,strings,length_mm,wire,wire_mm,wrap1_mm,wrap2_mm,wrap_metal,section,remark
                1,1,1510.5,,1.55,0.6,1.35,copper,bass,
                2,1,1490,,1.5,0.5,,iron,bass,"single, iron"
                40,3,622,14.5,,,,,tenor,
                """);
        assertEquals("Test grand, rescaled", s.title());
        assertEquals(442, s.pitch().a4());
        assertEquals(3, s.notes().size());
        Note n1 = s.note(1).orElseThrow();
        assertEquals(1.5105, n1.speakingLength(), 1e-12);
        assertEquals(1.55e-3, n1.wire().diameter(), 1e-15);
        assertTrue(n1.wire().musicWireSize().isEmpty());
        assertEquals(0.6e-3, n1.wrap().inner(), 1e-15);
        assertEquals(1.35e-3, n1.wrap().outer(), 1e-15);
        assertEquals(WrapMetal.COPPER, n1.wrap().metal());
        Note n2 = s.note(2).orElseThrow();
        assertFalse(n2.wrap().isDouble());
        assertEquals(WrapMetal.IRON, n2.wrap().metal());
        assertEquals("single, iron", n2.remark());
        Note n40 = s.note(40).orElseThrow();
        assertFalse(n40.isWound());
        assertEquals(14.5, n40.wire().musicWireSize().getAsDouble());
        // size 14.5 = 0.034 in (music-wire size table; half sizes common practice, no source)
        assertEquals(0.034 * UnitConversions.METRES_PER_INCH, n40.wire().diameter(), 1e-15);
        assertEquals("tenor", n40.section());
        assertEquals(List.of(SheetColumn.KEY, SheetColumn.STRINGS, SheetColumn.SPEAKING_LENGTH, SheetColumn.WIRE_SIZE,
                SheetColumn.WIRE_DIAMETER, SheetColumn.WRAP1, SheetColumn.WRAP2, SheetColumn.WRAP_METAL,
                SheetColumn.SECTION, SheetColumn.REMARK), s.layout().columns());
    }

    @Test
    @DisplayName("an inch sheet with free column order, upper-case headers, blanks, pitch and optional lengths")
    void readsAnInchSheet() throws Exception {
        Scale s = read("""
                WIRE_IN, Key ,LENGTH_IN,strings,pitch_hz,cents,strike_in,total_in,winding_in,wrap1_in
                0.034,49, 25.5 ,3,,-3.5,2.25,40,,
                0.045,10,50,1,54.9,,,,44,0.04
                """);
        assertEquals("", s.title());
        assertEquals(440, s.pitch().a4());
        Note a4 = s.note(49).orElseThrow();
        assertEquals(0.6477, a4.speakingLength(), 1e-12); // 25.5 in = 647.7 mm
        assertEquals(-3.5, a4.cents());
        assertTrue(a4.pitchHz().isEmpty());
        assertEquals(OptionalDouble.of(2.25 * 0.0254), a4.strikePoint());
        assertEquals(OptionalDouble.of(40 * 0.0254), a4.stretchedLength());
        Note n10 = s.note(10).orElseThrow();
        assertEquals(OptionalDouble.of(54.9), n10.pitchHz());
        assertEquals(44 * 0.0254, n10.woundLength().getAsDouble(), 1e-15);
        assertEquals(WrapMetal.COPPER, n10.wrap().metal(), "copper when no metal is given");
        assertEquals(LengthUnit.IN, s.layout().unitOf(SheetColumn.SPEAKING_LENGTH));
        assertEquals(List.of(10, 49), s.notes().stream().map(Note::key).toList(), "kept sorted by key");
    }

    @Test
    @DisplayName("extended bass keys and a byte-order mark are accepted")
    void extendedKeysAndBom() throws Exception {
        Scale s = read("\uFEFF" + HEADER + "-1,1,2000,1.6\n0,1,1980,1.6\n1,1,1960,1.6\n");
        assertEquals(List.of(-1, 0, 1), s.notes().stream().map(Note::key).toList());
    }

    @Test
    @DisplayName("implausible but legal values load (5 mm wire, 4 m length, over 100 % of strength) and are flagged")
    void implausibleValuesLoad() throws Exception {
        Scale s = read(HEADER + "40,3,600,5\n30,1,4000,1.2\n60,3,300,0.9\n");
        Scale hot = read("key,strings,length_mm,wire_mm,pitch_hz\n60,3,300,0.9,2000\n");
        assertEquals(3, s.notes().size());
        ScaleAnalysis a = ScaleAnalyzer.analyze(s, BuiltInData.defaultSettings());
        assertTrue(a.flags().stream().anyMatch(f -> f.key() == 40 && f.kind() == FlagKind.IMPLAUSIBLE));
        assertTrue(a.flags().stream().anyMatch(f -> f.key() == 30 && f.kind() == FlagKind.IMPLAUSIBLE));
        ScaleAnalysis h = ScaleAnalyzer.analyze(hot, BuiltInData.defaultSettings());
        assertTrue(h.notes().get(0).breakPct() > 100);
        assertTrue(h.flags().stream().anyMatch(f -> f.kind() == FlagKind.OVER_STRENGTH));
    }

    // ---- every bad-input case of DESIGN §4 ----

    @Test
    void unknownColumn() throws IOException {
        only("# note\nkey,strings,length_mm,wire_mm,colour\n1,1,1500,1.5,red\n", 2, "colour", "unknown column");
    }

    @Test
    void missingRequiredColumn() throws IOException {
        only("key,strings,wire_mm\n1,1,1.5\n", 1, "", "required column length_mm or length_in is missing");
        only("key,length_mm,wire_mm\n1,1500,1.5\n", 1, "", "required column strings is missing");
        only("key,strings,length_mm\n1,1,1500\n", 1, "", "no wire column");
    }

    @Test
    void missingRequiredValue() throws IOException {
        only(HEADER + "1,,1500,1.5\n", 2, "strings", "a value is required");
        only(HEADER + ",1,1500,1.5\n", 2, "key", "a value is required");
        only(HEADER + "1,1,,1.5\n", 2, "length_mm", "a value is required");
        only(HEADER + "1,1,1500\n", 2, "wire", "the wire is missing");
    }

    @Test
    void notANumber() throws IOException {
        only(HEADER + "1,1,15OO,1.5\n", 2, "length_mm", "expected a number, was '15OO'");
        only(HEADER + "1.5,1,1500,1.5\n", 2, "key", "expected a whole number, was '1.5'");
        only(HEADER + "1,one,1500,1.5\n", 2, "strings", "expected a whole number, was 'one'");
        only("key,strings,length_mm,wire_mm,cents\n1,1,1500,1.5,NaN\n", 2, "cents", "expected a number, was 'NaN'");
        only("key,strings,length_mm,wire_mm,cents\n1,1,1500,1.5,1e999\n", 2, "cents", "finite");
        // what Java alone would take for a number, a user would not write
        only(HEADER + "1,1,1500d,1.5\n", 2, "length_mm", "expected a number, was '1500d'");
        only(HEADER + "1,1,0x1p10,1.5\n", 2, "length_mm", "expected a number, was '0x1p10'");
        only(HEADER + "1,1,Infinity,1.5\n", 2, "length_mm", "expected a number, was 'Infinity'");
        only("key,strings,length_mm,wire_mm,pitch_hz\n1,1,1500,1.5,27,5\n", 2, "", "cells");
    }

    @Test
    void nonPositiveLength() throws IOException {
        only(HEADER + "1,1,-51,1.5\n", 2, "length_mm", "must be greater than 0, was -51");
        only(HEADER + "1,1,0,1.5\n", 2, "length_mm", "must be greater than 0, was 0");
        only(HEADER + "1,1,1500,-1.5\n", 2, "wire_mm", "must be greater than 0");
        only("key,strings,length_mm,wire_mm,wrap1_mm\n1,1,1500,1.5,0\n", 2, "wrap1_mm", "greater than 0");
        only("key,strings,length_mm,wire_mm,pitch_hz\n1,1,1500,1.5,-27.5\n", 2, "pitch_hz",
                "must be 1 to 20000 Hz, was -27.5");
    }

    @Test
    void sizeOutsideTheTable() throws IOException {
        only("key,strings,length_mm,wire\n1,1,1500,30\n", 2, "wire", "wire size 30 is not in the music-wire size table");
        only("key,strings,length_mm,wire\n1,1,1500,14.25\n", 2, "wire", "not in the music-wire size table (12 to 23");
        only("key,strings,length_mm,wire\n1,1,1500,11.5\n", 2, "wire", "not in the music-wire size table");
    }

    @Test
    void duplicateKey() throws IOException {
        only(HEADER + "5,3,600,1.0\n6,3,590,1.0\n5,3,580,1.0\n", 4, "key", "key 5 appears twice (first on line 2)");
    }

    @ParameterizedTest
    @CsvSource({"0", "4", "-1"})
    void stringsOtherThanOneToThree(String strings) throws IOException {
        only(HEADER + "5," + strings + ",600,1.0\n", 2, "strings", "strings per note must be 1, 2 or 3, was " + strings);
    }

    @Test
    void secondWrapWithoutFirst() throws IOException {
        only("key,strings,length_mm,wire_mm,wrap2_mm\n1,1,1500,1.5,1.2\n", 1, "wrap2_mm",
                "a second wrap column needs a first wrap column");
        only("key,strings,length_mm,wire_mm,wrap1_mm,wrap2_mm\n1,1,1500,1.5,,1.2\n", 2, "wrap2_mm",
                "a second wrap needs a first wrap");
    }

    @Test
    void moreThanOneUnitForAQuantity() throws IOException {
        only("key,strings,length_mm,length_in,wire_mm\n1,1,1500,59,1.5\n", 1, "length_in", "more than one unit for length");
        only("key,strings,length_mm,wire_mm,wire_in\n1,1,1500,1.5,0.06\n", 1, "wire_in", "more than one unit for wire");
        only("key,strings,length_mm,wire,wire_mm\n1,1,1500,14,0.84\n", 2, "wire_mm", "either as a size number");
        only("key,strings,key,length_mm,wire_mm\n1,1,1,1500,1.5\n", 1, "key", "more than once");
    }

    @Test
    void moreCellsThanTheHeader() throws IOException {
        only(HEADER + "1,1,1500,1.5\n2,1,1490,1.5,extra\n", 3, "", "the row has 5 cells but the header has 4 columns");
    }

    @Test
    @DisplayName("a trailing comma on every line (a common spreadsheet export) is no column; a blank-named column with values is")
    void trailingBlankColumns() throws Exception {
        Scale s = read("key,strings,length_mm,wire_mm,,\n1,1,1500,1.5,,\n2,1,1490,1.5\n");
        assertEquals(2, s.notes().size());
        only("key,strings,length_mm,wire_mm,\n1,1,1500,1.5,7\n", 1, "(blank)", "a column has no name");
    }

    @Test
    void emptyFile() throws IOException {
        only("", 0, "", "the file is empty");
    }

    @Test
    void onlyComments() throws IOException {
        only("# title: nothing here\n# a4_hz: 440\n\n", 0, "", "has no header line");
    }

    @Test
    void headerButNoNotes() throws IOException {
        only("# a comment\n" + HEADER, 2, "", "a header but no notes");
    }

    @Test
    void notText() throws IOException {
        Path f = dir.resolve("bad.csv");
        Files.write(f, new byte[] {(byte) 0x89, 'P', 'N', 'G', 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d, 'I', 'H', 'D', 'R'});
        BadInputException e = assertThrows(BadInputException.class, () -> ScaleSheetReader.standard().read(f));
        assertEquals(1, e.problems().size());
        assertTrue(e.getMessage().startsWith("bad.csv: is not a text file"), e.getMessage());
        // not UTF-8: read as Windows-1252, and said so (DESIGN §4)
        Files.write(f, new byte[] {'k', 'e', 'y', (byte) 0xC3, 0x28, '\n'});
        List<String> notes = new java.util.ArrayList<>();
        e = assertThrows(BadInputException.class, () -> ReadNotes.toldTo(notes::add,
                () -> ScaleSheetReader.standard().read(f)));
        assertTrue(e.getMessage().contains("column keyã(: unknown column"), e.getMessage());
        assertEquals(1, notes.size());
        assertTrue(notes.get(0).startsWith("bad.csv: read as Windows-1252 text (the file is not UTF-8)"), notes.get(0));
    }

    @Test
    void missingFile() {
        Path f = dir.resolve("nowhere.csv");
        BadInputException e = assertThrows(BadInputException.class, () -> ScaleSheetReader.standard().read(f));
        assertEquals("nowhere.csv: no such file", e.getMessage());
    }

    @Test
    void otherBadCells() throws IOException {
        only("key,strings,length_mm,wire_mm,wrap1_mm,wrap_metal\n1,1,1500,1.5,1.0,brass\n", 2, "wrap_metal",
                "wrap metal must be copper, iron or steel, was 'brass'");
        only(HEADER + "1,1,\"1500,1.5\n", 2, "", "a quoted cell that begins on this line is not closed");
        only("# title: x\n# a4_hz: high\n" + HEADER + "1,1,1500,1.5\n", 2, "", "a4_hz");
        only("# title: x\n# a4_hz: 1200\n" + HEADER + "1,1,1500,1.5\n", 2, "",
                "the '# a4_hz:' comment: pitch standard A4 must be 300 to 600 Hz, was 1200");
        only(",key,strings,length_mm,wire_mm\n,1,1,1500,1.5\n", 1, "(blank)", "no name");
    }

    @Test
    @DisplayName("line numbers count comments and blank lines; every bad row is reported, nothing is half-loaded")
    void everyProblemWithItsLine() throws IOException {
        List<SheetProblem> ps = problems("""
                # title: two bad rows

                key,strings,length_mm,wire_mm
                1,1,1500,1.5

                2,5,1490,1.5
                3,1,x,1.5
                4,1,1470,1.5
                """);
        assertEquals(2, ps.size(), ps.toString());
        assertEquals(6, ps.get(0).line());
        assertEquals("strings", ps.get(0).column());
        assertEquals(7, ps.get(1).line());
        assertEquals("length_mm", ps.get(1).column());
        assertEquals("bad.csv, line 7, column length_mm: expected a number, was 'x'", ps.get(1).toString());
    }

    @Test
    @DisplayName("a sheet with very many bad rows tells 50 problems, then how many more there were")
    void manyProblems() throws IOException {
        StringBuilder b = new StringBuilder(HEADER);
        for (int k = 1; k <= 88; k++) {
            b.append(k).append(",9,1000,1.0\n");
        }
        List<SheetProblem> ps = problems(b.toString());
        assertEquals(51, ps.size());
        assertEquals(51, ps.get(49).line(), "the 50th problem is told with its place");
        assertEquals("bad.csv: 38 more problems not shown (the first 50 are above)", ps.get(50).toString());
    }

    // ---- bounds: every value refused at its cell (issue 14, part 4) ----

    @ParameterizedTest
    @DisplayName("a diameter or length that rounds to nothing is refused at its cell, also in inches")
    @CsvSource(delimiter = '|', value = {
        "key,strings,length_mm,wire_mm|40,3,600,4.9e-324|wire_mm|4.9e-324 mm",
        "key,strings,length_mm,wire_mm|40,3,600,0.0009|wire_mm|0.0009 mm",
        "key,strings,length_mm,wire_mm|40,3,1e-300,1.0|length_mm|1e-300 mm",
        "key,strings,length_mm,wire_mm|40,3,20000,1.0|length_mm|20000 mm",
        "key,strings,length_mm,wire_mm,wrap1_mm|40,3,600,1.0,1e-30|wrap1_mm|1e-30 mm",
        "key,strings,length_in,wire_in|40,3,24,1e-308|wire_in|1e-308 in"})
    void lengthThatRoundsToNothing(String header, String row, String column, String given) throws IOException {
        SheetProblem p = only(header + "\n" + row + "\n", 2, column, "was " + given);
        assertTrue(p.message().startsWith("must be 0.001 mm to 10000 mm") || p.message().startsWith("must be 0.0000394 in to 394 in"),
                p.toString());
    }

    @ParameterizedTest
    @DisplayName("keys outside -20 … 108 are refused at their cell, a key near 2^31 too, without overflow")
    @CsvSource({"200", "109", "-21", "2147483647", "2147483648", "99999999999999999999999"})
    void keyOutsideTheAcceptedRange(String key) throws IOException {
        SheetProblem p = only(HEADER + "40,3,600,1.0\n" + key + ",1,50,0.8\n", 3, "key",
                "key must be -20 to 108 (A0 is 1, C8 is 88), was " + key);
        assertEquals("bad.csv, line 3, column key: key must be -20 to 108 (A0 is 1, C8 is 88), was " + key,
                p.toString());
    }

    @Test
    @DisplayName("the ends of the accepted keys load")
    void acceptedKeyEnds() throws Exception {
        Scale s = read(HEADER + "-20,1,2000,1.6\n108,3,40,0.8\n");
        assertEquals(List.of(-20, 108), s.notes().stream().map(Note::key).toList());
    }

    @Test
    @DisplayName("a row with both pitch_hz and cents is refused at the cents cell (not both applied)")
    void pitchAndCentsOnOneRow() throws IOException {
        only("key,strings,length_mm,wire_mm,pitch_hz,cents\n40,3,600,1.0,,5\n41,3,590,1.0,262,5\n", 3, "cents",
                "give either pitch_hz (the pitch as measured) or cents (an offset from the equal-tempered pitch) "
                        + "on a row, not both");
    }

    @ParameterizedTest
    @DisplayName("pitch_hz outside 1 … 20000 Hz and cents outside ±1200 are refused at their cell")
    @CsvSource({"pitch_hz,0.5,must be 1 to 20000 Hz, was 0.5", "pitch_hz,1e300,must be 1 to 20000 Hz, was 1e300",
        "cents,1201,must be -1200 to 1200 cents, was 1201", "cents,-5000,must be -1200 to 1200 cents, was -5000"})
    void pitchAndCentsBounded(String column, String value, String message) throws IOException {
        only("key,strings,length_mm,wire_mm," + column + "\n40,3,600,1.0," + value + "\n", 2, column, message);
    }

    @Test
    @DisplayName("a sheet of more than 400 rows is refused at the 401st, without reading on")
    void tooManyRows() throws IOException {
        StringBuilder b = new StringBuilder(HEADER);
        for (int i = 0; i < 100_000; i++) {
            b.append("40,3,600,1.0\n");
        }
        only(b.toString(), 402, "", "more than 400 rows; at most 400 are read (one row per key)");
    }

    @Test
    @DisplayName("a file over 2 MiB is refused before it is read, and a line of very many cells too")
    void tooLarge() throws IOException {
        String big = HEADER + "# " + "x".repeat(3 * 1024 * 1024) + "\n40,3,600,1.0\n";
        only(big, 0, "", "is too large to be a piano's data");
        only(HEADER + "40,3,600,1.0" + ",".repeat(5000) + "\n", 2, "", "the line has 5004 cells; at most 100 are read");
    }

    @Test
    @DisplayName("reading from bytes names the file given; a failed read changes nothing on disk")
    void readFromBytesAndNothingChanged() throws Exception {
        Path f = file("x.csv", HEADER + "1,1,-3,1.5\n");
        byte[] before = Files.readAllBytes(f);
        assertThrows(BadInputException.class, () -> ScaleSheetReader.standard().read(f));
        assertEquals(List.of("x.csv"), List.of(dir.toFile().list()));
        assertEquals(new String(before, StandardCharsets.UTF_8), Files.readString(f));
        Scale s = ScaleSheetReader.standard().read(Path.of("memory.csv"), (HEADER + "1,1,1500,1.5\n")
                .getBytes(StandardCharsets.UTF_8));
        assertEquals(1, s.notes().size());
        BadInputException e = assertThrows(BadInputException.class, () -> ScaleSheetReader.standard()
                .read(Path.of("memory.csv"), (HEADER + "1,1,0,1.5\n").getBytes(StandardCharsets.UTF_8)));
        assertTrue(e.getMessage().startsWith("memory.csv, line 2, column length_mm"), e.getMessage());
    }
}
