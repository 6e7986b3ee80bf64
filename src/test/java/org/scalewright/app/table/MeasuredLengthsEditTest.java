package org.scalewright.app.table;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.io.ScaleSheetWriter;
import org.scalewright.model.DisplayUnits;
import org.scalewright.model.Scale;

/**
 * The note table's columns for the lengths measured on the instrument (stretched, back and wound
 * length, bare core at each end, strike point): shown in the display unit, edited like the others,
 * blank for none, refused where they do not fit the string.
 */
class MeasuredLengthsEditTest {
    @TempDir
    Path dir;
    private TableOnSheet t;

    @BeforeEach
    void open() throws Exception {
        t = new TableOnSheet(dir, """
                key,strings,length_mm,wire_mm,wrap1_mm,total_mm,back_mm,winding_mm,bare_front_mm,bare_back_mm,strike_mm
                10,2,1500,1.3,1.05,1700,120,1420,40,40,180
                20,2,1150,1.1,0.45,,,,,,
                40,3,690,1.05,,800,,,,,
                """);
    }

    @Test
    void theMeasuredLengthsAreShownInTheDisplayUnit() {
        assertEquals("1700.0", t.text(10, NoteColumn.STRETCHED));
        assertEquals("120.0", t.text(10, NoteColumn.BACK));
        assertEquals("1420.0", t.text(10, NoteColumn.WOUND));
        assertEquals("40.0", t.text(10, NoteColumn.BARE_FRONT));
        assertEquals("40.0", t.text(10, NoteColumn.BARE_BACK));
        assertEquals("180.0", t.text(10, NoteColumn.STRIKE));
        assertEquals("", t.text(40, NoteColumn.BACK));
        assertEquals("", t.text(40, NoteColumn.WOUND));
        t.session.unitsProperty().set(DisplayUnits.IMPERIAL);
        assertEquals("4.72", t.text(10, NoteColumn.BACK), "120 mm in inches (1 in = 25.4 mm, NIST SP 811)");
        for (NoteColumn c : new NoteColumn[] {NoteColumn.STRETCHED, NoteColumn.BACK, NoteColumn.WOUND,
                NoteColumn.BARE_FRONT, NoteColumn.BARE_BACK, NoteColumn.STRIKE}) {
            assertTrue(c.editable(), c.name());
        }
    }

    @Test
    void aBackLengthIsEnteredAsOneUndoableEditAndKeptInTheSheet() throws Exception {
        Scale before = t.session.scale();
        assertTrue(t.table.edit(40, NoteColumn.BACK, "75"));
        assertEquals(0.075, t.note(40).backLength().getAsDouble(), 1e-12);
        assertTrue(t.table.edit(40, NoteColumn.BACK, "3 in"), "an entry may name its unit");
        assertEquals(3 * 0.0254, t.note(40).backLength().getAsDouble(), 1e-12);
        t.session.undo();
        t.session.undo();
        assertSame(before, t.session.scale());
        assertTrue(t.table.edit(40, NoteColumn.BACK, "75"));
        Path saved = dir.resolve("saved.csv");
        ScaleSheetWriter.write(t.session.scale(), saved, false);
        assertEquals(t.session.scale().notes(), ScaleSheetReader.standard().read(saved).notes());
        assertTrue(t.table.edit(40, NoteColumn.BACK, ""), "blank: no back length");
        assertEquals(OptionalDouble.empty(), t.note(40).backLength());
    }

    @Test
    void lengthsThatDoNotFitTheStringAreRefusedAndChangeNothing() {
        Scale before = t.session.scale();
        // 120 + 1500 = 1620 mm of a 1610 mm stretched length: nothing left to the tuning pin
        assertFalse(t.table.edit(10, NoteColumn.STRETCHED, "1610"));
        assertTrue(t.session.messageProperty().get().contains("leave nothing of the stretched length"),
                t.session.messageProperty().get());
        // a winding that with the 40 mm bare at the front is longer than the speaking length
        assertFalse(t.table.edit(10, NoteColumn.WOUND, "1470"));
        assertTrue(t.session.messageProperty().get().contains("winding 1470 mm and 40 mm of bare core at the front are "
                + "longer than the speaking length 1500 mm"), t.session.messageProperty().get());
        assertFalse(t.table.edit(40, NoteColumn.BARE_FRONT, "10"));
        assertTrue(t.session.messageProperty().get().contains("belong to a wound string"),
                t.session.messageProperty().get());
        // a length no sheet may hold (over 10 m) would be saved in a sheet that does not open again
        assertFalse(t.table.edit(40, NoteColumn.STRETCHED, "20000"));
        assertTrue(t.session.messageProperty().get().contains("stretched length must be 0.001 to 10000 mm, was 20000"),
                t.session.messageProperty().get());
        assertFalse(t.table.edit(40, NoteColumn.STRIKE, "-3"));
        assertTrue(t.session.messageProperty().get().contains("strike point must be > 0"),
                t.session.messageProperty().get());
        assertSame(before, t.session.scale());
    }

    @Test
    void aPastedWindingAndBareEndsMustMakeTheSpeakingLength() {
        List<NoteColumn> cols = List.of(NoteColumn.WOUND, NoteColumn.BARE_FRONT, NoteColumn.BARE_BACK);
        int row = t.table.indexOf(10);
        assertTrue(t.table.clipboard().paste(row, cols, "1400\t50\t50\n"));
        assertEquals(1.400, t.note(10).woundLength().getAsDouble(), 1e-12);
        assertEquals(0.050, t.note(10).bareBack().getAsDouble(), 1e-12);
        // 1399 + 50 + 50.7 = 1499.7 mm, within 0.5 mm as a sheet may be: the wound length stays as pasted
        assertTrue(t.table.clipboard().paste(row, cols, "1399\t50\t50.7\n"));
        assertEquals(1.399, t.note(10).woundLength().getAsDouble(), 1e-12);
        assertEquals(0.0507, t.note(10).bareBack().getAsDouble(), 1e-12);
        // a whole new winding pasted over the old one: taken as it is, whatever the old bare ends were
        assertTrue(t.table.clipboard().paste(row, cols, "1470\t15\t15\n"));
        assertEquals(1.470, t.note(10).woundLength().getAsDouble(), 1e-12);
        assertEquals(0.015, t.note(10).bareFront().getAsDouble(), 1e-12);
        // the wound length alone: the bare core at the back follows
        assertTrue(t.table.clipboard().paste(t.table.indexOf(10), List.of(NoteColumn.WOUND), "1460\n"));
        assertEquals(0.025, t.note(10).bareBack().getAsDouble(), 1e-12, "1500 − 1460 − 15");
        assertTrue(t.table.clipboard().paste(row, List.of(NoteColumn.WOUND, NoteColumn.BARE_FRONT, NoteColumn.BARE_BACK),
                "1450\t\t20\n"), "a blank front with the wound length and back given");
        assertTrue(t.note(10).bareFront().isEmpty());
        Scale before = t.session.scale();
        // 1400 + 50 + 60 = 1510 mm: as a sheet with these cells is refused, so is the paste
        assertFalse(t.table.clipboard().paste(row, cols, "1400\t50\t60\n"));
        assertSame(before, t.session.scale());
        assertTrue(t.session.messageProperty().get().contains("winding 1400 mm + bare core 50 mm (front) + 60 mm (back) "
                + "= 1510 mm, but the speaking length is 1500 mm"), t.session.messageProperty().get());
    }

    @Test
    void aWindingThatFillsTheRestExactlyIsTakenAndOneThatLeavesNoneIsRefused() {
        // 1500 − 1460 − 40 = 0 mm of winding left by a bare front of 1460 mm
        assertFalse(t.table.edit(10, NoteColumn.BARE_FRONT, "1460"));
        assertTrue(t.session.messageProperty().get().contains("the bare core at the ends, 1500 mm, leaves no winding"),
                t.session.messageProperty().get());
        // 1481 + 19 = 1500 mm: no bare core left at the back, though binary fractions make it -1e-16
        assertTrue(t.table.edit(10, NoteColumn.BARE_FRONT, "19"));
        assertTrue(t.table.edit(10, NoteColumn.WOUND, "1481"));
        assertEquals(0.0, t.note(10).bareBack().getAsDouble(), 0.0);
        assertEquals("", t.session.messageIsProblemProperty().get() ? t.session.messageProperty().get() : "");
    }

    @Test
    void pastingBackWhatTheTableShowsChangesNothingEvenInInches() {
        t.session.unitsProperty().set(DisplayUnits.IMPERIAL);
        List<NoteColumn> cols = List.of(NoteColumn.STRETCHED, NoteColumn.BACK, NoteColumn.WOUND, NoteColumn.BARE_FRONT,
                NoteColumn.BARE_BACK);
        int row = t.table.indexOf(10);
        String shown = t.table.clipboard().copy(List.of(row), cols, false, '.');
        Scale before = t.session.scale();
        assertFalse(t.table.clipboard().paste(row, cols, shown), shown);
        assertSame(before, t.session.scale(), "the rounded inches shown are not written back over the millimetres");
    }

    @Test
    void aPastedRowOfSpeakingStretchedAndBackLengthsIsCheckedAsAWhole() {
        // 1600 stretched with 50 back fits; alone, 1600 would not fit the old back length of 120 with 1500 speaking
        List<NoteColumn> cols = List.of(NoteColumn.STRETCHED, NoteColumn.BACK);
        assertTrue(t.table.clipboard().paste(t.table.indexOf(10), cols, "1600\t50\n"),
                t.session.messageProperty().get());
        assertEquals(1.6, t.note(10).stretchedLength().getAsDouble(), 1e-12);
        assertEquals(0.05, t.note(10).backLength().getAsDouble(), 1e-12);
        assertTrue(t.table.clipboard().paste(t.table.indexOf(10), List.of(NoteColumn.LENGTH, NoteColumn.STRETCHED),
                "1540\t1800\n"), t.session.messageProperty().get());
        assertEquals(1.46, t.note(10).woundLength().getAsDouble(), 1e-12, "the winding moves with the speaking length");
    }

    @Test
    void entriesASheetWouldRefuseAreRefusedHere() {
        // one bare end without the wound length: a sheet with it does not open
        assertFalse(t.table.edit(20, NoteColumn.BARE_FRONT, "10"));
        assertTrue(t.session.messageProperty().get().contains("give both bare ends, or one of them with the wound "
                + "length"), t.session.messageProperty().get());
        assertTrue(t.table.edit(20, NoteColumn.WOUND, "1100"));
        assertTrue(t.table.edit(20, NoteColumn.BARE_FRONT, "10"), "with the wound length it may be");
        // a winding on plain wire
        assertFalse(t.table.edit(40, NoteColumn.WOUND, "600"));
        assertTrue(t.session.messageProperty().get().contains("belong to a wound string"),
                t.session.messageProperty().get());
        // a value too small to be written, told as typed
        t.session.unitsProperty().set(DisplayUnits.IMPERIAL);
        assertFalse(t.table.edit(40, NoteColumn.BACK, "0.00003"));
        assertTrue(t.session.messageProperty().get().endsWith("was 0.00003"), t.session.messageProperty().get());
    }

    @Test
    void aRowCopiedInInchesPastesOntoAnotherKeyThoughEachCellIsRounded() {
        t.session.unitsProperty().set(DisplayUnits.IMPERIAL);
        List<NoteColumn> cols = List.of(NoteColumn.LENGTH, NoteColumn.WOUND, NoteColumn.BARE_FRONT, NoteColumn.BARE_BACK);
        // key 10 agrees within 0.01 mm; shown to 0.01 in, 39.37, 38.01, 0.69 and 0.69, it is 0.508 mm out
        assertTrue(t.table.edit(10, NoteColumn.LENGTH, "39.3749"));
        assertTrue(t.table.clipboard().paste(t.table.indexOf(10), List.of(NoteColumn.WOUND, NoteColumn.BARE_FRONT,
                NoteColumn.BARE_BACK), "38.0051\t0.6851\t0.6851\n"), t.session.messageProperty().get());
        String row = t.table.clipboard().copy(List.of(t.table.indexOf(10)), cols, false, '.');
        assertEquals("39.37\t38.01\t0.69\t0.69\n", row);
        assertTrue(t.table.clipboard().paste(t.table.indexOf(20), cols, row), t.session.messageProperty().get());
        double sum = t.note(20).woundLength().getAsDouble() + t.note(20).bareFront().getAsDouble()
                + t.note(20).bareBack().getAsDouble();
        assertEquals(t.note(20).speakingLength(), sum, 1e-12, "the wound length takes what the rounding left");
        // off by a whole inch is no rounding
        assertFalse(t.table.clipboard().paste(t.table.indexOf(10), List.of(NoteColumn.WOUND, NoteColumn.BARE_FRONT,
                NoteColumn.BARE_BACK), "45\t1\t1\n"));
        assertTrue(t.session.messageProperty().get().contains("winding 45 in + bare core 1 in (front) + 1 in (back) = "
                + "47 in, but the speaking length is 39.37 in (they must agree within 0.02 in)"),
                t.session.messageProperty().get());
    }

    @Test
    void aPastedRowWithANewSpeakingLengthAndANewWindingIsTakenAsAWhole() {
        // 30 + 5 + 5 = 40 mm: the old bare core (80 mm) would leave no winding in 40 mm, but the row replaces it
        List<NoteColumn> cols = List.of(NoteColumn.LENGTH, NoteColumn.WOUND, NoteColumn.BARE_FRONT, NoteColumn.BARE_BACK);
        assertTrue(t.table.clipboard().paste(t.table.indexOf(10), cols, "40\t30\t5\t5\n"),
                t.session.messageProperty().get());
        assertEquals(0.030, t.note(10).woundLength().getAsDouble(), 1e-12);
    }

    @Test
    void aRefusalIsWordedInTheDisplayUnit() {
        t.session.unitsProperty().set(DisplayUnits.IMPERIAL);
        // 58 in of winding and 40 mm (1.57 in) bare at the front are longer than 1500 mm (59.06 in)
        assertFalse(t.table.edit(10, NoteColumn.WOUND, "58"));
        assertTrue(t.session.messageProperty().get().contains("winding 58 in and 1.57 in of bare core at the front are "
                + "longer than the speaking length 59.06 in"), t.session.messageProperty().get());
        assertFalse(t.table.edit(10, NoteColumn.STRETCHED, "63"));
        assertEquals("key 10 (F#1), stretched length: the back length 4.72 in and the speaking length 59.06 in leave "
                + "nothing of the stretched length 63 in for the front length to the tuning pin",
                t.session.messageProperty().get());
    }

    @Test
    void aNewSpeakingLengthMovesTheWindingAndKeepsTheBareEnds() {
        assertTrue(t.table.edit(10, NoteColumn.LENGTH, "1510"));
        assertEquals(1.430, t.note(10).woundLength().getAsDouble(), 1e-12, "1510 − 40 − 40");
        assertEquals(0.040, t.note(10).bareBack().getAsDouble(), 1e-12);
        // a speaking length the bare ends alone fill is refused, and nothing changes
        Scale before = t.session.scale();
        assertFalse(t.table.edit(10, NoteColumn.LENGTH, "80"));
        assertTrue(t.session.messageProperty().get().contains("the bare core at the ends, 80 mm, leaves no winding"),
                t.session.messageProperty().get());
        assertSame(before, t.session.scale());
        assertTrue(t.table.edit(40, NoteColumn.LENGTH, "700"), "plain wire: only the speaking length changes");
    }

    @Test
    void theBareEndsAndTheWindingAreEditedTogetherConsistently() {
        // with all three given, changing one bare end alone would break the sum: the winding follows
        assertTrue(t.table.edit(10, NoteColumn.BARE_FRONT, "30"));
        assertEquals(0.030, t.note(10).bareFront().getAsDouble(), 1e-12);
        assertEquals(1.430, t.note(10).woundLength().getAsDouble(), 1e-12, "1500 − 30 − 40");
        assertTrue(t.table.edit(10, NoteColumn.WOUND, "1400"), "a new winding takes its bare core from the back end");
        assertEquals(0.030, t.note(10).bareFront().getAsDouble(), 1e-12);
        assertEquals(0.070, t.note(10).bareBack().getAsDouble(), 1e-12, "1500 − 1400 − 30");
    }
}
