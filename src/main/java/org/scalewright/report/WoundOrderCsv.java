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
        h.addAll(Cells.lengthHeaders(units, "wrap1", "wrap2"));
        h.addAll(List.of("wrap_metal", "winding"));
        h.addAll(Cells.lengthHeaders(units, "od", "speaking_length", "wound_length", "bare_front", "bare_back"));
        h.add("bare_ends");
        h.addAll(Cells.lengthHeader("winding_start_from_hitch", units));
        h.add("winding_start_by");
        h.addAll(Cells.lengthHeader("stretched_length", units));
        List<List<String>> rows = new ArrayList<>();
        for (WoundOrderRow r : order.rows()) {
            List<String> c = new ArrayList<>(List.of(join(r.keys().stream().map(String::valueOf).toList()),
                    join(r.noteNames()), Integer.toString(r.count())));
            Cells.diameter(c, OptionalDouble.of(r.coreDiameter()), imp);
            c.add(Cells.size(r.coreSize()));
            Cells.diameter(c, OptionalDouble.of(r.wrapInner()), imp);
            Cells.diameter(c, r.doubleWound() ? OptionalDouble.of(r.wrapOuter()) : OptionalDouble.empty(), imp);
            c.add(r.metal().sheetName());
            c.add(r.doubleWound() ? "double" : "single");
            Cells.diameter(c, OptionalDouble.of(r.outsideDiameter()), imp);
            for (double length : new double[] {r.speakingLength(), r.woundLength(), r.bareFront(), r.bareBack()}) {
                Cells.length(c, OptionalDouble.of(length), imp);
            }
            c.add(r.bareEnds().word());
            Cells.length(c, r.windingStart(), imp);
            c.add(r.windingStartFrom().word());
            Cells.length(c, r.stretchedLength(), imp);
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
                "winding start from the hitch = back length (bridge pin to hitch pin) + bare core at the back; from "
                        + "the sheet's back length ('back length') or an estimate ('estimate', ≈ on the PDF page) where "
                        + "the sheet gives only the stretched length (the back length then taken as half of stretched "
                        + "less speaking length) or only the wound length (the bare core split equally): check an "
                        + "estimate on the instrument; blank where neither back nor stretched length is given",
                "stretched length = hitch pin to tuning pin");
    }

    private static String join(List<String> items) {
        return String.join(" ", items);
    }
}
