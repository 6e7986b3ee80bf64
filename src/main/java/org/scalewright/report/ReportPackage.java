package org.scalewright.report;

import java.util.ArrayList;
import java.util.List;
import org.scalewright.io.AnalysisCsv;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.NumberText;
import org.scalewright.physics.ScaleAnalysis;

/**
 * Puts a whole report together in memory: the PDF, the charts as PNG and SVG, and the CSV files
 * {@code results.csv}, {@code schedule.csv}, {@code wound-order.csv}, {@code wire-order.csv},
 * {@code stretch.csv}. Nothing is written until {@link ReportFiles#writeTo} is called.
 */
public final class ReportPackage {
    /** File name of the PDF report. */
    public static final String PDF = "report.pdf";

    private ReportPackage() {
    }

    /**
     * @param content the computed content
     * @param charts  the drawn charts: the curves first, then a chart named {@code stretch}
     * @return every file of the report, by name
     */
    public static ReportFiles files(ReportContent content, List<ReportChart> charts) {
        ScaleAnalysis a = content.analysis();
        List<ReportChart> curves = new ArrayList<>();
        ReportChart stretch = null;
        for (ReportChart c : charts) {
            if (c.name().equals("stretch")) {
                stretch = c;
            } else {
                curves.add(c);
            }
        }
        ReportDocument doc = new ReportDocument(content, curves, stretch, BuiltInData.cautions(),
                DefaultSources.lines(a.settings(), content.allowances()));
        ReportFiles files = new ReportFiles();
        files.add(PDF, PdfReportWriter.toBytes(doc));
        for (ReportChart c : charts) {
            files.add(c.name() + ".png", c.png());
            files.add(c.name() + ".svg", c.svg());
        }
        List<String> head = comments(content);
        List<String> resultComments = new ArrayList<>(AnalysisCsv.comments(a));
        files.add("results.csv", new CsvSheet(resultComments, AnalysisCsv.HEADER, AnalysisCsv.rows(a)));
        files.add("schedule.csv", ScheduleCsv.sheet(content.schedule(), content.units(), head));
        files.add("wound-order.csv", WoundOrderCsv.sheet(content.woundOrder(), content.units(), head));
        files.add("wire-order.csv", WireOrderCsv.sheet(content.wireOrder(), content.units(), head));
        files.add("stretch.csv", StretchCsv.sheet(content.chosenStretch(),
                content.stretchInOrder(), head));
        return files;
    }

    /** @return the header comments every CSV of a report starts with */
    static List<String> comments(ReportContent c) {
        List<String> l = new ArrayList<>();
        l.add("scale: " + c.title());
        l.add("sheet: " + c.sheetName());
        l.add("a4_hz: " + NumberText.number(c.analysis().scale().pitch().a4()));
        l.add("strength table: " + c.analysis().settings().strength().name());
        return l;
    }
}
