package org.scalewright.report;

import org.scalewright.io.CsvSheet;
import java.util.ArrayList;
import java.util.List;
import org.scalewright.design.orders.ScheduleRow;
import org.scalewright.design.orders.StringSchedule;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.NumberText;
import org.scalewright.model.UnitConversions;
import org.scalewright.model.WireNotation;

/**
 * The string schedule as CSV ({@code schedule.csv}): SI columns, and for imperial units the
 * lengths in inches beside the millimetres and the tension in lbf beside the newtons.
 */
public final class ScheduleCsv {
    private ScheduleCsv() {
    }

    /** @return the schedule as a CSV sheet */
    public static CsvSheet sheet(StringSchedule schedule, ReportUnits units, List<String> comments) {
        boolean imp = units == ReportUnits.IMPERIAL;
        List<String> h = new ArrayList<>(List.of("key", "note", "section", "strings", "wound", "wire", "wire_size"));
        h.addAll(Cells.lengthHeader("core", units));
        h.addAll(Cells.lengthHeader("wrap1", units));
        h.addAll(Cells.lengthHeader("wrap2", units));
        h.add("wrap_metal");
        h.addAll(Cells.lengthHeader("speaking_length", units));
        h.addAll(Cells.lengthHeader("stretched_length", units));
        h.addAll(List.of("frequency_hz", "tension_n", "tension_lbf", "break_pct", "flagged"));
        List<List<String>> rows = new ArrayList<>();
        for (ScheduleRow r : schedule.rows()) {
            List<String> c = new ArrayList<>(List.of(Integer.toString(r.key()), r.noteName(), r.section(),
                    Integer.toString(r.strings()), Boolean.toString(r.wound()),
                    WireNotation.of(r.plainSize(), r.coreDiameter(), r.wrap(), LengthUnit.MM), Cells.size(r.plainSize())));
            diameter(c, r.coreDiameter(), imp);
            if (r.wound()) {
                diameter(c, r.wrap().inner(), imp);
                if (r.wrap().isDouble()) {
                    diameter(c, r.wrap().outer(), imp);
                } else {
                    blank(c, imp);
                }
                c.add(r.wrap().metal().sheetName());
            } else {
                blank(c, imp);
                blank(c, imp);
                c.add("");
            }
            length(c, r.speakingLength(), imp);
            if (r.stretchedLength().isPresent()) {
                length(c, r.stretchedLength().getAsDouble(), imp);
            } else {
                blank(c, imp);
            }
            c.addAll(List.of(NumberText.rounded(r.frequency(), 4), NumberText.rounded(r.tension(), 1),
                    NumberText.rounded(UnitConversions.newtonsToLbf(r.tension()), 1), NumberText.rounded(r.breakPct(), 2),
                    Boolean.toString(r.flagged())));
            rows.add(c);
        }
        List<String> com = new ArrayList<>(comments);
        com.add("string schedule: " + schedule.rows().size() + " keys, " + schedule.totalStrings() + " strings");
        com.add(WireNotation.LEGEND);
        return new CsvSheet(com, h, rows);
    }

    static void diameter(List<String> c, double metres, boolean imperial) {
        if (imperial) {
            c.add(Cells.in(metres, 4));
        }
        c.add(Cells.mm(metres, 3));
    }

    static void length(List<String> c, double metres, boolean imperial) {
        if (imperial) {
            c.add(Cells.in(metres, 2));
        }
        c.add(Cells.mm(metres, 1));
    }

    static void blank(List<String> c, boolean imperial) {
        if (imperial) {
            c.add("");
        }
        c.add("");
    }
}
