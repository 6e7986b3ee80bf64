package org.scalewright.report;

import java.util.List;
import org.scalewright.io.CsvDialect;

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
     * @throws ChartsNotDrawn when the machine cannot draw the charts (no fonts)
     */
    public static ReportFiles make(ReportContent content) {
        return make(content, ReportCharts::reportCharts);
    }

    /**
     * Draws the charts with {@code charts} and assembles every file of the report.
     *
     * @param content the computed report content
     * @param charts  draws the charts
     * @return the files by name
     * @throws ChartsNotDrawn when the machine cannot draw them (no fonts), naming the cause and
     *                        what to install
     */
    public static ReportFiles make(ReportContent content, ChartDrawer charts) {
        return make(content, charts, CsvDialect.PLAIN);
    }

    /** As {@link #make(ReportContent, ChartDrawer)}, the CSV files in {@code dialect}. */
    public static ReportFiles make(ReportContent content, ChartDrawer charts, CsvDialect dialect) {
        List<ReportChart> drawn = ChartsNotDrawn.guard(() -> charts.draw(content));
        return ReportPackage.files(content, drawn, dialect);
    }

    /** Draws the charts of a report ({@link ReportCharts#reportCharts} in the program). */
    @FunctionalInterface
    public interface ChartDrawer {
        /** @return the charts: the curves first, then one named {@code stretch} */
        List<ReportChart> draw(ReportContent content);
    }
}
