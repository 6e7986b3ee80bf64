package org.scalewright.report;

import org.scalewright.io.CsvSheet;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.scalewright.design.orders.TestScales;
import org.scalewright.model.Scale;

class ReportCsvTest {

    @ParameterizedTest
    @EnumSource(ReportUnits.class)
    void theWireOrderTotalsRowIsTheSumOfTheRowsAsWritten(ReportUnits units) throws Exception {
        ReportContent c = ReportFixtures.content(units);
        List<String[]> rows = ReportFixtures.rows(WireOrderCsv.sheet(c.wireOrder(), units, List.of()).toText());
        List<String> header = Arrays.asList(rows.get(0));
        String[] total = rows.get(rows.size() - 1);
        assertEquals("total", total[0]);
        List<String> summed = units == ReportUnits.IMPERIAL
                ? List.of("notes", "strings", "pieces", "estimated_strings", "length_m", "length_ft", "mass_g")
                : List.of("notes", "strings", "pieces", "estimated_strings", "length_m", "mass_g");
        for (String col : summed) {
            int i = header.indexOf(col);
            assertTrue(i >= 0, col + " missing from " + header);
            BigDecimal sum = BigDecimal.ZERO;
            for (String[] r : rows.subList(1, rows.size() - 1)) {
                sum = sum.add(new BigDecimal(r[i]));
            }
            assertEquals(0, sum.compareTo(new BigDecimal(total[i])), col + ": rows add to " + sum + ", total " + total[i]);
        }
        assertEquals(c.wireOrder().rows().size() + 2, rows.size());
        // the written total length agrees with the order's own total to the written precision
        assertEquals(c.wireOrder().totalLength(), Double.parseDouble(total[header.indexOf("length_m")]), 0.001 * rows.size());
    }

    @Test
    void imperialTablesGiveInchesWithMillimetresBeside() throws Exception {
        ReportContent c = ReportFixtures.content(ReportUnits.IMPERIAL);
        List<String[]> wound = ReportFixtures.rows(WoundOrderCsv.sheet(c.woundOrder(), ReportUnits.IMPERIAL, List.of())
                .toText());
        List<String> h = Arrays.asList(wound.get(0));
        for (String q : List.of("core", "wrap1", "wrap2", "stretched_length", "wound_length", "speaking_length",
                "od", "bare_front", "bare_back", "winding_start_from_hitch")) {
            assertEquals(h.indexOf(q + "_in") + 1, h.indexOf(q + "_mm"), q + " in " + h);
        }
        String[] first = wound.get(1);
        double in = Double.parseDouble(first[h.indexOf("speaking_length_in")]);
        double mm = Double.parseDouble(first[h.indexOf("speaking_length_mm")]);
        assertEquals(mm, in * 25.4, 0.005 * 25.4); // 1 in = 25.4 mm exactly (NIST SP 811, B.8)
        List<String[]> metric = ReportFixtures.rows(WoundOrderCsv.sheet(c.woundOrder(), ReportUnits.METRIC, List.of())
                .toText());
        assertFalse(Arrays.asList(metric.get(0)).contains("core_in"));
        assertEquals(c.woundOrder().rows().size() + 1, metric.size());
    }

    @Test
    void textCellsThatLookLikeFormulasAreWrittenAsText() throws Exception {
        Scale s = TestScales.generated();
        s = s.withNote(s.note(30).orElseThrow().withSection("=HYPERLINK(\"x\")"))
                .withTitle("+cmd|' /C calc'!A0");
        ReportContent c = ReportFixtures.content(s, ReportUnits.METRIC);
        for (CsvSheet sheet : List.of(ScheduleCsv.sheet(c.schedule(), c.units(), ReportPackage.comments(c)),
                WoundOrderCsv.sheet(c.woundOrder(), c.units(), List.of()),
                WireOrderCsv.sheet(c.wireOrder(), c.units(), List.of()),
                StretchCsv.sheet(c.chosenStretch(), c.stretchInOrder(), List.of()))) {
            for (String[] row : ReportFixtures.rows(sheet.toText())) {
                for (String cell : row) {
                    if (!cell.isEmpty() && "=+-@".indexOf(cell.charAt(0)) >= 0) {
                        assertTrue(isNumber(cell), "formula-like cell '" + cell + "'");
                    }
                }
            }
        }
        String schedule = ScheduleCsv.sheet(c.schedule(), c.units(), List.of()).toText();
        assertTrue(schedule.contains("'=HYPERLINK"), "the section is kept, as text");
    }

    private static boolean isNumber(String s) {
        try {
            Double.parseDouble(s);
            return true;
        } catch (NumberFormatException e) {
            return false;
        }
    }

    @Test
    void theStretchSheetStartsWithKeyNoteAndStretchCents() throws Exception {
        ReportContent c = ReportFixtures.content(ReportUnits.METRIC);
        List<String[]> rows = ReportFixtures.rows(StretchCsv.sheet(c.chosenStretch(), c.stretchInOrder(), List.of())
                .toText());
        List<String> h = Arrays.asList(rows.get(0));
        assertEquals(List.of("key", "note", "stretch_cents"), h.subList(0, 3));
        assertTrue(h.containsAll(List.of("stretch_2_1_cents", "stretch_4_2_cents", "stretch_6_3_cents")));
        assertEquals(89, rows.size());
        String[] a4 = rows.get(49);
        assertEquals("49", a4[0]);
        assertEquals("A4", a4[1]);
        assertEquals("0", a4[2]);
        assertEquals("2:1 (m=1)", a4[h.indexOf("octave_type")]);
        assertEquals(a4[2], a4[h.indexOf("stretch_2_1_cents")]);
    }

    @Test
    void theScheduleHasARowPerKeyAndTheWireAsTheRebuilderWritesIt() throws Exception {
        ReportContent c = ReportFixtures.content(ReportUnits.METRIC);
        List<String[]> rows = ReportFixtures.rows(ScheduleCsv.sheet(c.schedule(), c.units(), List.of()).toText());
        List<String> h = Arrays.asList(rows.get(0));
        assertEquals(89, rows.size());
        // the one wire notation (model.WireNotation): 1.50 + 2 · 1.20 + 2 · 1.00 = 5.90 mm outside (hand-worked)
        assertEquals("1.500 / 1.200 + 1.000 mm Cu (OD 5.900)", rows.get(1)[h.indexOf("wire")]);
        assertEquals("1.2", rows.get(1)[h.indexOf("wrap1_mm")]);
        assertEquals("", rows.get(88)[h.indexOf("stretched_length_mm")]);
        assertEquals("", rows.get(88)[h.indexOf("wrap1_mm")]);
    }
}
