package org.scalewright.report;

import org.scalewright.io.CsvSheet;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import org.scalewright.design.orders.WireAllowances;
import org.scalewright.design.orders.WireOrder;
import org.scalewright.design.orders.WireOrderRow;
import org.scalewright.model.NumberText;

/**
 * The plain-wire order as CSV ({@code wire-order.csv}): one row per wire size and a last row
 * {@code total} whose every figure is the sum of the figures written in the rows above it (the
 * rounded cells are summed, so the sheet adds up in a spreadsheet).
 */
public final class WireOrderCsv {
    /** The text in the size column of the totals row. */
    public static final String TOTAL = "total";

    private WireOrderCsv() {
    }

    /** @return the order as a CSV sheet with a totals row */
    public static CsvSheet sheet(WireOrder order, ReportUnits units, List<String> comments) {
        boolean imp = units == ReportUnits.IMPERIAL;
        List<String> h = new ArrayList<>(List.of("size", "diameter_mm"));
        if (imp) {
            h.add("diameter_in");
        }
        h.addAll(List.of("keys", "notes", "strings", "pieces", "estimated_strings", "length_m"));
        if (imp) {
            h.add("length_ft");
        }
        h.addAll(List.of("mass_per_length_g_m", "mass_g"));
        List<List<String>> rows = new ArrayList<>();
        for (WireOrderRow r : order.rows()) {
            rows.add(row(r, imp));
        }
        rows.add(totals(rows, h));
        List<String> com = new ArrayList<>(comments);
        com.addAll(ruleText(order.allowances()));
        return new CsvSheet(com, h, rows);
    }

    /** @return the rows' cells of one size */
    static List<String> row(WireOrderRow r, boolean imp) {
        List<String> c = new ArrayList<>();
        c.add(Cells.size(r.musicWireSize()));
        c.add(Cells.mm(r.diameter(), 3));
        if (imp) {
            c.add(Cells.in(r.diameter(), 4));
        }
        c.addAll(List.of(r.keys(), Integer.toString(r.notes()), Integer.toString(r.strings()),
                Integer.toString(r.pieces()), Integer.toString(r.estimatedStrings()),
                NumberText.rounded(r.length(), 3)));
        if (imp) {
            c.add(NumberText.rounded(r.length() / ReportUnits.METRES_PER_FOOT, 2));
        }
        c.add(NumberText.rounded(r.massPerLength() * 1e3, 4));
        c.add(NumberText.rounded(r.mass() * 1e3, 1));
        return c;
    }

    /** @return the totals row: the sum of each summable column's written cells */
    static List<String> totals(List<List<String>> rows, List<String> header) {
        List<String> t = new ArrayList<>();
        for (int i = 0; i < header.size(); i++) {
            String name = header.get(i);
            if (i == 0) {
                t.add(TOTAL);
            } else if (List.of("notes", "strings", "pieces", "estimated_strings", "length_m", "length_ft", "mass_g")
                    .contains(name)) {
                BigDecimal sum = BigDecimal.ZERO;
                for (List<String> r : rows) {
                    sum = sum.add(new BigDecimal(r.get(i)));
                }
                t.add(sum.toPlainString());
            } else {
                t.add("");
            }
        }
        return t;
    }

    /** @return the rule the lengths and pieces were counted by, in words, with the allowances */
    public static List<String> ruleText(WireAllowances a) {
        List<String> l = new ArrayList<>();
        l.add("length to buy per string = stretched length (hitch pin to tuning pin) + "
                + NumberText.rounded(a.pinAllowance() * 1e3, 0) + " mm for the tuning-pin coil and hitch;");
        l.add("where the sheet gives only the speaking length: speaking length + "
                + NumberText.rounded(a.lengthAllowance() * 1e3, 0) + " mm front and back length + the same "
                + NumberText.rounded(a.pinAllowance() * 1e3, 0) + " mm (counted in estimated_strings)");
        l.add(a.looped() ? "pieces: two adjacent strings of one note looped round a hitch pin are one piece "
                + "(bichord = 1 piece, trichord = 1 looped + 1 single); common practice, no source"
                : "pieces: every string tied singly, one piece per string");
        l.add("mass = length x mass per length of the wire (steel density of the analysis); totals are sums of the rows");
        return l;
    }
}
