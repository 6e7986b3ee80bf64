package org.scalewright.report;

/**
 * The one entry point of the report layer: from the computed content to every file of a
 * report (PDF, charts as PNG and SVG, the report CSVs), in memory until written.
 */
public final class Reports {
    private Reports() {
    }

    /**
     * Draws the charts and assembles every file of the report.
     *
     * @param content the computed report content ({@link ReportContent#compute})
     * @return the files by name; nothing is on disk until {@link ReportFiles#writeTo} is called
     */
    public static ReportFiles make(ReportContent content) {
        return ReportPackage.files(content, ReportCharts.reportCharts(content));
    }
}
