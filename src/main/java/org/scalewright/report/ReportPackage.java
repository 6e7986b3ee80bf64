package org.scalewright.report;

import org.scalewright.io.CsvSheet;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.scalewright.io.AnalysisCsv;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.CsvDialect;
import org.scalewright.io.XlsxTables;
import org.scalewright.model.NumberText;
import org.scalewright.physics.ScaleAnalysis;

/**
 * Puts a whole report together in memory: the PDF, the charts as PNG and SVG, and the CSV files
 * {@code results.csv}, {@code schedule.csv}, {@code wound-order.csv}, {@code wire-order.csv},
 * {@code stretch.csv}, and the same tables as one workbook, {@value #WORKBOOK}. Nothing is written until {@link ReportFiles#writeTo} is called.
 */
public final class ReportPackage {
    /** File name of the PDF report. */
    public static final String PDF = "report.pdf";
    /** File name of the workbook holding every table of the report, one sheet each, and a sheet of notes. */
    public static final String WORKBOOK = "tables.xlsx";

    private ReportPackage() {
    }

    /**
     * @param content the computed content
     * @param charts  the drawn charts: the curves first, then a chart named {@code stretch}
     * @return every file of the report, by name
     */
    public static ReportFiles files(ReportContent content, List<ReportChart> charts) {
        return files(content, charts, CsvDialect.PLAIN);
    }

    /**
     * As {@link #files(ReportContent, List)}, the CSV files in {@code dialect}.
     */
    public static ReportFiles files(ReportContent content, List<ReportChart> charts, CsvDialect dialect) {
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
        Map<String, CsvSheet> tables = new LinkedHashMap<>();
        tables.put("results", new CsvSheet(resultComments, AnalysisCsv.HEADER, AnalysisCsv.rows(a)));
        tables.put("schedule", ScheduleCsv.sheet(content.schedule(), content.units(), head));
        tables.put("wound-order", WoundOrderCsv.sheet(content.woundOrder(), content.units(), head));
        tables.put("wire-order", WireOrderCsv.sheet(content.wireOrder(), content.units(), head));
        tables.put("stretch", StretchCsv.sheet(content.chosenStretch(), content.stretchInOrder(), head));
        List<XlsxTables.Table> sheets = new ArrayList<>();
        tables.forEach((name, sheet) -> {
            files.add(name + ".csv", sheet.toBytes(dialect));
            sheets.add(new XlsxTables.Table(name, sheet));
        });
        files.add(WORKBOOK, XlsxTables.toBytes(sheets));
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
