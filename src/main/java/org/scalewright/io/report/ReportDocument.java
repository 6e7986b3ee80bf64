package org.scalewright.io.report;

import java.util.List;
import java.util.Optional;
import org.scalewright.design.orders.StringSchedule;
import org.scalewright.design.orders.WireOrder;
import org.scalewright.design.orders.WoundOrder;
import org.scalewright.design.stretch.StretchCurve;
import org.scalewright.physics.ScaleAnalysis;

/**
 * Everything a PDF report of one instrument shows, computed before anything is written.
 *
 * @param sheetName     the scale sheet's file name (shown on the title page)
 * @param analysis      the analysis of the working scale
 * @param reference     the analysis of a reference scale drawn beside it, with its sheet name, if any
 * @param units         units of the tables
 * @param schedule      the string schedule
 * @param woundOrder    the wound-string order
 * @param wireOrder     the plain-wire order
 * @param stretch       the tuning stretch for each octave type, the chosen one first
 * @param curves        the three curves (tension, percent of breaking strength, inharmonicity)
 * @param stretchFigure the stretch curve
 * @param cautions      the safety cautions, one paragraph each
 * @param sources       where the defaults come from, one line each
 * @param program       the program's name and version, for the footer
 */
public record ReportDocument(String sheetName, ScaleAnalysis analysis, Optional<Reference> reference,
                             ReportUnits units, StringSchedule schedule, WoundOrder woundOrder, WireOrder wireOrder,
                             List<StretchCurve> stretch, List<ReportFigure> curves, ReportFigure stretchFigure,
                             List<String> cautions, List<String> sources, String program) {

    /**
     * @param sheetName the reference sheet's file name
     * @param analysis  its analysis
     */
    public record Reference(String sheetName, ScaleAnalysis analysis) {
    }

    public ReportDocument {
        if (analysis == null || schedule == null || woundOrder == null || wireOrder == null) {
            throw new IllegalArgumentException("report needs the analysis, schedule and orders");
        }
        if (stretch == null || stretch.isEmpty()) {
            throw new IllegalArgumentException("report needs at least one stretch curve");
        }
        reference = reference == null ? Optional.empty() : reference;
        units = units == null ? ReportUnits.METRIC : units;
        stretch = List.copyOf(stretch);
        curves = List.copyOf(curves);
        cautions = List.copyOf(cautions);
        sources = List.copyOf(sources);
        sheetName = sheetName == null ? "" : sheetName;
        program = program == null ? "" : program;
    }

    /** @return the scale's title, or the sheet name when it has none */
    public String title() {
        String t = analysis.scale().title();
        return t.isEmpty() ? sheetName : t;
    }
}
