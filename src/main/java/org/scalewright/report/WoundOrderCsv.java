package org.scalewright.report;

import java.util.ArrayList;
import java.util.List;
import org.scalewright.design.orders.WoundOrder;
import org.scalewright.design.orders.WoundOrderRow;
import org.scalewright.model.NumberText;
import org.scalewright.model.UnitConversions;

/**
 * The wound-string order as CSV ({@code wound-order.csv}): a row per string design with the
 * count to make; lengths in the report's units with millimetres beside.
 */
public final class WoundOrderCsv {
    private WoundOrderCsv() {
    }

    /** @return the order as a CSV sheet */
    public static CsvSheet sheet(WoundOrder order, ReportUnits units, List<String> comments) {
        boolean imp = units == ReportUnits.IMPERIAL;
        List<String> h = new ArrayList<>(List.of("key", "note", "pitch_hz", "count"));
        h.addAll(Cells.lengthHeader("core", units));
        h.add("core_size");
        h.addAll(Cells.lengthHeader("wrap1", units));
        h.addAll(Cells.lengthHeader("wrap2", units));
        h.addAll(List.of("wrap_metal", "winding"));
        h.addAll(Cells.lengthHeader("stretched_length", units));
        h.addAll(Cells.lengthHeader("wound_length", units));
        h.addAll(Cells.lengthHeader("speaking_length", units));
        h.addAll(imp ? List.of("tension_lbf", "tension_n") : List.of("tension_n"));
        h.add("section");
        List<List<String>> rows = new ArrayList<>();
        for (WoundOrderRow r : order.rows()) {
            List<String> c = new ArrayList<>(List.of(Integer.toString(r.key()), r.noteName(),
                    NumberText.rounded(r.frequency(), 3), Integer.toString(r.count())));
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
            optional(c, r.stretchedLength(), imp);
            optional(c, r.woundLength(), imp);
            ScheduleCsv.length(c, r.speakingLength(), imp);
            if (imp) {
                c.add(NumberText.rounded(UnitConversions.newtonsToLbf(r.tension()), 1));
            }
            c.add(NumberText.rounded(r.tension(), 1));
            c.add(r.section());
            rows.add(c);
        }
        List<String> com = new ArrayList<>(comments);
        com.add("wound strings to make: " + order.totalStrings() + " (count = strings per note) on "
                + order.rows().size() + " notes");
        com.add("lengths in " + (imp ? "inches with mm beside" : "mm") + "; stretched length = hitch pin to tuning pin");
        return new CsvSheet(com, h, rows);
    }

    private static void optional(List<String> c, java.util.OptionalDouble v, boolean imp) {
        if (v.isPresent()) {
            ScheduleCsv.length(c, v.getAsDouble(), imp);
        } else {
            ScheduleCsv.blank(c, imp);
        }
    }
}
