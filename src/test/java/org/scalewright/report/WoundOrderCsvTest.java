package org.scalewright.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.OptionalDouble;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;

/** The wound-string order a string maker winds from: its columns, figures, grouping and PDF page. */
class WoundOrderCsvTest {

    private static final OptionalDouble NONE = OptionalDouble.empty();

    private static OptionalDouble mm(double v) {
        return OptionalDouble.of(v * 1e-3);
    }

    /** Key 1: double wound, given by OD, only the winding length given, stretched length known. */
    private static Note doubleByOd() {
        Wrap w = Wrap.fromOd(1.5e-3, 3.9e-3, 5.9e-3, WrapMetal.COPPER);
        return new Note(1, 1, 1.4, CoreWire.ofDiameter(1.5e-3), w, NONE, 0, NONE, mm(1600), mm(1340), "", "",
                NONE, NONE);
    }

    /** A single-wound bichord with both bare ends given and no stretched length. */
    private static Note singleBare(int key, double wrapMm) {
        return new Note(key, 2, 1.3, CoreWire.ofSize(15, 1.3e-3), Wrap.single(wrapMm * 1e-3, WrapMetal.COPPER), NONE,
                0, NONE, NONE, NONE, "", "", mm(20), mm(35));
    }

    private static Scale scale(List<Note> notes) {
        return new Scale("wound order test", PitchStandard.ISO_16, notes, null);
    }

    private static List<String[]> csv(Scale s) throws Exception {
        ReportContent c = ReportFixtures.content(s, ReportUnits.METRIC);
        return ReportFixtures.rows(WoundOrderCsv.sheet(c.woundOrder(), ReportUnits.METRIC, List.of()).toText());
    }

    private static String cell(List<String[]> rows, int row, String column) {
        List<String> h = Arrays.asList(rows.get(0));
        assertTrue(h.contains(column), column + " missing from " + h);
        return rows.get(row)[h.indexOf(column)];
    }

    @Test
    void aTwoNoteOrderHasTheHandWorkedFigures() throws Exception {
        List<String[]> rows = csv(scale(List.of(doubleByOd(), singleBare(2, 0.9))));
        assertEquals(List.of("keys", "notes", "count", "core_mm", "core_size", "wrap1_mm", "wrap2_mm", "wrap_metal",
                "winding", "od_mm", "speaking_length_mm", "wound_length_mm", "bare_front_mm", "bare_back_mm",
                "bare_ends", "winding_start_from_hitch_mm", "winding_start_by", "stretched_length_mm"),
                Arrays.asList(rows.get(0)));
        assertEquals(3, rows.size());
        // hand-worked, key 1 (A0): core 1.5, OD1 3.9, OD 5.9 → wrap1 (3.9 − 1.5)/2 = 1.2, wrap2 (5.9 − 3.9)/2 = 1.0;
        // OD as given 5.9; winding 1340 of 1400 → 60 mm bare, split equally 30 + 30;
        // back length (1600 − 1400)/2 = 100, winding starts 100 + 30 = 130 mm from the hitch pin
        assertEquals("1", cell(rows, 1, "keys"));
        assertEquals("A0", cell(rows, 1, "notes"));
        assertEquals("1", cell(rows, 1, "count"));
        assertEquals("1.5", cell(rows, 1, "core_mm"));
        assertEquals("", cell(rows, 1, "core_size"));
        assertEquals("1.2", cell(rows, 1, "wrap1_mm"));
        assertEquals("1", cell(rows, 1, "wrap2_mm"));
        assertEquals("double", cell(rows, 1, "winding"));
        assertEquals("5.9", cell(rows, 1, "od_mm"));
        assertEquals("1400", cell(rows, 1, "speaking_length_mm"));
        assertEquals("1340", cell(rows, 1, "wound_length_mm"));
        assertEquals("30", cell(rows, 1, "bare_front_mm"));
        assertEquals("30", cell(rows, 1, "bare_back_mm"));
        assertEquals("split equally", cell(rows, 1, "bare_ends"));
        assertEquals("130", cell(rows, 1, "winding_start_from_hitch_mm"));
        assertEquals("estimate", cell(rows, 1, "winding_start_by"));
        assertEquals("1600", cell(rows, 1, "stretched_length_mm"));
        // hand-worked, key 2 (A#0): core #15 1.3, wrap 0.9 → OD 1.3 + 2 × 0.9 = 3.1; bare 20 + 35 given,
        // wound 1300 − 20 − 35 = 1245; no stretched length → no winding start; two strings → count 2
        assertEquals("2", cell(rows, 2, "keys"));
        assertEquals("A#0", cell(rows, 2, "notes"));
        assertEquals("2", cell(rows, 2, "count"));
        assertEquals("1.3", cell(rows, 2, "core_mm"));
        assertEquals("15", cell(rows, 2, "core_size"));
        assertEquals("0.9", cell(rows, 2, "wrap1_mm"));
        assertEquals("", cell(rows, 2, "wrap2_mm"));
        assertEquals("single", cell(rows, 2, "winding"));
        assertEquals("3.1", cell(rows, 2, "od_mm"));
        assertEquals("1245", cell(rows, 2, "wound_length_mm"));
        assertEquals("20", cell(rows, 2, "bare_front_mm"));
        assertEquals("35", cell(rows, 2, "bare_back_mm"));
        assertEquals("given", cell(rows, 2, "bare_ends"));
        assertEquals("", cell(rows, 2, "winding_start_from_hitch_mm"));
        assertEquals("", cell(rows, 2, "winding_start_by"));
        assertEquals("", cell(rows, 2, "stretched_length_mm"));
    }

    @Test
    void aBackLengthOnTheSheetGivesTheWindingStartExactly() throws Exception {
        // key 3: speaking 1300, stretched 1500, back length 120 given, bare core 20 front and 35 back;
        // hand-worked: the winding starts 120 + 35 = 155 mm from the hitch pin (the estimate would
        // have taken the back length as (1500 − 1300)/2 = 100, so 135)
        Note withBack = new Note(3, 2, 1.3, CoreWire.ofSize(15, 1.3e-3), Wrap.single(0.9e-3, WrapMetal.COPPER), NONE,
                0, NONE, mm(1500), NONE, "", "", mm(20), mm(35), mm(120));
        List<String[]> rows = csv(scale(List.of(doubleByOd(), withBack)));
        assertEquals("155", cell(rows, 2, "winding_start_from_hitch_mm"));
        assertEquals("back length", cell(rows, 2, "winding_start_by"));
        // the back length given but only the wound length (1240 of 1300): the bare core at the back is
        // taken as half of the 60 mm left, so the start, 120 + 30 = 150 mm, is an estimate
        Note splitEnds = new Note(3, 2, 1.3, CoreWire.ofSize(15, 1.3e-3), Wrap.single(0.9e-3, WrapMetal.COPPER), NONE,
                0, NONE, mm(1500), mm(1240), "", "", NONE, NONE, mm(120));
        List<String[]> split = csv(scale(List.of(splitEnds)));
        assertEquals("150", cell(split, 1, "winding_start_from_hitch_mm"));
        assertEquals("estimate", cell(split, 1, "winding_start_by"));
        assertEquals("130", cell(rows, 1, "winding_start_from_hitch_mm"));
        assertEquals("estimate", cell(rows, 1, "winding_start_by"));
        ReportContent c = ReportFixtures.content(scale(List.of(withBack)), ReportUnits.METRIC);
        byte[] bytes = ReportPackage.files(c, ReportFixtures.charts()).content(ReportPackage.PDF);
        try (PDDocument doc = Loader.loadPDF(bytes)) {
            String all = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertTrue(all.contains("20.0 35.0 155.0 1500.0 given"), all);
        }
    }

    @Test
    void identicalStringsToThePrintedPrecisionShareARowWithTheirCount() throws Exception {
        // keys 2, 3 and 5 differ only below the 0.001 mm printed (0.9 and 0.9002 mm wraps, OD 3.1 and 3.1004 mm); key 4's 0.901 mm wrap shows
        List<String[]> rows = csv(scale(List.of(singleBare(2, 0.9), singleBare(3, 0.9), singleBare(4, 0.901),
                singleBare(5, 0.9002))));
        assertEquals(3, rows.size());
        assertEquals("2 3 5", cell(rows, 1, "keys"));
        assertEquals("A#0 B0 C#1", cell(rows, 1, "notes"));
        assertEquals("6", cell(rows, 1, "count"));
        assertEquals("0.9", cell(rows, 1, "wrap1_mm"));
        assertEquals("4", cell(rows, 2, "keys"));
        assertEquals("2", cell(rows, 2, "count"));
        assertEquals("0.901", cell(rows, 2, "wrap1_mm"));
        // a length that differs by 0.1 mm is another string
        Note longer = singleBare(3, 0.9).withSpeakingLength(1.3001);
        List<String[]> split = csv(scale(List.of(singleBare(2, 0.9), longer)));
        assertEquals(3, split.size());
        assertEquals("1300.1", cell(split, 2, "speaking_length_mm"));
    }

    @Test
    void theOrderPageOfThePdfListsTheOutsideDiameterAndTheBareLengths() throws Exception {
        ReportContent c = ReportFixtures.content(scale(List.of(doubleByOd(), singleBare(2, 0.9))), ReportUnits.METRIC);
        byte[] bytes = ReportPackage.files(c, ReportFixtures.charts()).content(ReportPackage.PDF);
        try (PDDocument doc = Loader.loadPDF(bytes)) {
            String all = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            int from = all.indexOf("Wound-string order One row");
            int to = all.indexOf("Plain-wire order", from);
            assertTrue(from >= 0 && to > from, "the order page");
            String page = all.substring(from, to);
            for (String s : List.of("OD", "bare front", "bare back", "winding starts from hitch", "hitch loop",
                    "split equally")) {
                assertTrue(page.contains(s), "'" + s + "' missing: " + page);
            }
            // key 1: OD 5.9, 1400 speaking, 1340 wound, 30 and 30 bare, start 130, 1600 stretched (hand-worked above)
            // the start of key 1 is estimated from its stretched length, and marked so
            assertTrue(page.contains("1 A0 1 1.500 1.200 1.000 copper 5.900 1400.0 1340.0 30.0 30.0 ≈130.0 1600.0 split equally"), page);
            assertTrue(page.contains("≈ marks an estimated winding start"), page);
            // key 2: #15 core, OD 3.1, wound 1245, bare 20 and 35, no start or stretched length
            assertTrue(page.contains("2 A#0 2 1.300 #15 0.900 copper 3.100 1300.0 1245.0 20.0 35.0 given"), page);
        }
    }
}
