package org.scalewright.report;

import org.scalewright.io.CsvSheet;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.scalewright.design.orders.WoundOrder;
import org.scalewright.design.orders.WoundOrderRow;

/**
 * The wound-string order as CSV ({@code wound-order.csv}): a row per string design with its
 * keys, notes and the count to make; diameters to 0.001 mm and lengths to 0.1 mm (the precision
 * the order is grouped by), in the report's units with millimetres beside.
 */
public final class WoundOrderCsv {
    private WoundOrderCsv() {
    }

    /** @return the order as a CSV sheet */
    public static CsvSheet sheet(WoundOrder order, ReportUnits units, List<String> comments) {
        boolean imp = units == ReportUnits.IMPERIAL;
        List<String> h = new ArrayList<>(List.of("keys", "notes", "count"));
        h.addAll(Cells.lengthHeader("core", units));
        h.add("core_size");
        h.addAll(Cells.lengthHeader("wrap1", units));
        h.addAll(Cells.lengthHeader("wrap2", units));
        h.addAll(List.of("wrap_metal", "winding"));
        h.addAll(Cells.lengthHeader("od", units));
        h.addAll(Cells.lengthHeader("speaking_length", units));
        h.addAll(Cells.lengthHeader("wound_length", units));
        h.addAll(Cells.lengthHeader("bare_front", units));
        h.addAll(Cells.lengthHeader("bare_back", units));
        h.add("bare_ends");
        h.addAll(Cells.lengthHeader("winding_start_from_hitch", units));
        h.addAll(Cells.lengthHeader("stretched_length", units));
        List<List<String>> rows = new ArrayList<>();
        for (WoundOrderRow r : order.rows()) {
            List<String> c = new ArrayList<>(List.of(join(r.keys().stream().map(String::valueOf).toList()),
                    join(r.noteNames()), Integer.toString(r.count())));
            ScheduleCsv.diameter(c, r.coreDiameter(), imp);
            c.add(Cells.size(r.coreSize()));
            ScheduleCsv.diameter(c, r.wrapInner(), imp);
            if (r.doubleWound()) {
                ScheduleCsv.diameter(c, r.wrapOuter(), imp);
            } else {
                ScheduleCsv.blank(c, imp);
            }
            c.add(r.metal().sheetName());
            c.add(r.doubleWound() ? "double" : "single");
            ScheduleCsv.diameter(c, r.outsideDiameter(), imp);
            ScheduleCsv.length(c, r.speakingLength(), imp);
            ScheduleCsv.length(c, r.woundLength(), imp);
            ScheduleCsv.length(c, r.bareFront(), imp);
            ScheduleCsv.length(c, r.bareBack(), imp);
            c.add(r.bareEnds().word());
            optional(c, r.windingStart(), imp);
            optional(c, r.stretchedLength(), imp);
            rows.add(c);
        }
        List<String> com = new ArrayList<>(comments);
        com.add("wound strings to make: " + order.totalStrings() + " on " + order.notes() + " notes in "
                + order.rows().size() + " designs (identical strings grouped; count = strings of the notes)");
        com.addAll(notes(imp));
        return new CsvSheet(com, h, rows);
    }

    /** @return the notes that go with the order's table, in the CSV and under the PDF table */
    static List<String> notes(boolean imperial) {
        return List.of(
                "diameters to 0.001 mm, lengths to 0.1 mm" + (imperial ? " (inches beside, to 0.0001 and 0.01 in)" : "")
                        + "; od = core + 2 x wrap1 + 2 x wrap2 unless the sheet gave the OD",
                "the hitch loop is at the back end (hitch pin); the tuning pin is at the front end",
                "bare_front / bare_back: bare core inside the speaking length at the front (tuning-pin side) and the "
                        + "back (bridge side) end; 'split equally' where only the wound length was given, the bare "
                        + "core split equally between the two ends; 'none given': the winding fills the speaking length",
                "winding_start_from_hitch = back length + bare_back; the back length is taken as half of stretched "
                        + "less speaking length (the sheet does not divide them): check on the instrument; blank "
                        + "where the stretched length is not given",
                "stretched length = hitch pin to tuning pin");
    }

    private static String join(List<String> items) {
        return String.join(" ", items);
    }

    private static void optional(List<String> c, OptionalDouble v, boolean imp) {
        if (v.isPresent()) {
            ScheduleCsv.length(c, v.getAsDouble(), imp);
        } else {
            ScheduleCsv.blank(c, imp);
        }
    }
}
