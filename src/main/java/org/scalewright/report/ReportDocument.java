package org.scalewright.report;

import java.util.List;
import java.util.Optional;

/**
 * Everything the PDF report of one instrument shows, computed before anything is written.
 *
 * @param content      the tables and analysis
 * @param curves       the three curves (tension, percent of breaking strength, inharmonicity)
 * @param stretchChart the stretch curve, or null for none
 * @param cautions     the safety cautions, one paragraph each
 * @param sources      where the figures and defaults come from, one line each
 */
public record ReportDocument(ReportContent content, List<ReportChart> curves, ReportChart stretchChart,
                             List<String> cautions, List<String> sources) {

    public ReportDocument {
        if (content == null) {
            throw new IllegalArgumentException("report needs its content, was null");
        }
        curves = List.copyOf(curves);
        cautions = List.copyOf(cautions);
        sources = List.copyOf(sources);
    }

    String title() {
        return content.title();
    }

    org.scalewright.physics.ScaleAnalysis analysis() {
        return content.analysis();
    }

    ReportUnits units() {
        return content.units();
    }

    ReportPaper paper() {
        return content.paper();
    }

    String sheetName() {
        return content.sheetName();
    }

    Optional<ReportContent.Reference> reference() {
        return content.reference();
    }

    org.scalewright.design.orders.StringSchedule schedule() {
        return content.schedule();
    }

    org.scalewright.design.orders.WoundOrder woundOrder() {
        return content.woundOrder();
    }

    org.scalewright.design.orders.WireOrder wireOrder() {
        return content.wireOrder();
    }

    List<org.scalewright.design.stretch.StretchCurve> stretch() {
        return content.stretch();
    }
}
