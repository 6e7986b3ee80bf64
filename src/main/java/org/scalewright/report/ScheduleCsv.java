package org.scalewright.report;

import org.scalewright.io.CsvSheet;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
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
        h.addAll(Cells.lengthHeaders(units, "core", "wrap1", "wrap2"));
        h.add("wrap_metal");
        h.addAll(Cells.lengthHeaders(units, "speaking_length", "stretched_length"));
        h.addAll(List.of("frequency_hz", "tension_n", "tension_lbf", "break_pct", "flagged"));
        List<List<String>> rows = new ArrayList<>();
        for (ScheduleRow r : schedule.rows()) {
            List<String> c = new ArrayList<>(List.of(Integer.toString(r.key()), r.noteName(), r.section(),
                    Integer.toString(r.strings()), Boolean.toString(r.wound()),
                    WireNotation.of(r.plainSize(), r.coreDiameter(), r.wrap(), LengthUnit.MM), Cells.size(r.plainSize())));
            boolean wound = r.wound();
            Cells.diameter(c, OptionalDouble.of(r.coreDiameter()), imp);
            Cells.diameter(c, wound ? OptionalDouble.of(r.wrap().inner()) : OptionalDouble.empty(), imp);
            Cells.diameter(c, wound && r.wrap().isDouble() ? OptionalDouble.of(r.wrap().outer()) : OptionalDouble.empty(),
                    imp);
            c.add(wound ? r.wrap().metal().sheetName() : "");
            Cells.length(c, OptionalDouble.of(r.speakingLength()), imp);
            Cells.length(c, r.stretchedLength(), imp);
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
}
