package org.scalewright.app.export;

import java.util.List;

/**
 * What the window can export on its own: a table, a chart or the PDF report, with the
 * formats it comes in (a table as CSV, a chart as PNG or SVG).
 */
enum ExportContent {
    SCHEDULE("String schedule", "schedule", false),
    WOUND_ORDER("Wound-string order", "wound-order", false),
    WIRE_ORDER("Wire order", "wire-order", false),
    STRETCH_TABLE("Tuning stretch", "stretch", false),
    RESULTS("Results per note", "results", false),
    TENSION_CURVE("Tension curve", "tension", true),
    BREAK_PERCENT_CURVE("Percent of breaking strength curve", "break-percent", true),
    INHARMONICITY_CURVE("Inharmonicity curve", "inharmonicity", true),
    STRETCH_CURVE("Tuning stretch curve", "stretch", true),
    REPORT("PDF report", "report", false);

    private final String title;
    private final String fileStem;
    private final boolean chart;

    ExportContent(String title, String fileStem, boolean chart) {
        this.title = title;
        this.fileStem = fileStem;
        this.chart = chart;
    }

    /** @return what it is, in words */
    String title() {
        return title;
    }

    /** @return the stem of the file name offered for it, without extension */
    String fileStem() {
        return fileStem;
    }

    /** @return true for the charts */
    boolean isChart() {
        return chart;
    }

    /** @return the formats it is exported in: a chart as PNG and SVG, the report as PDF, a table as CSV */
    List<ExportFormat> formats() {
        if (chart) {
            return List.of(ExportFormat.PNG, ExportFormat.SVG);
        }
        return List.of(this == REPORT ? ExportFormat.PDF : ExportFormat.CSV);
    }
}
