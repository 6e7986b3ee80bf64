package org.scalewright.report;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.scalewright.chart.ChartFiles;
import org.scalewright.chart.CurveData;
import org.scalewright.chart.ScaleCurves;
import org.scalewright.chart.StretchChart;
import org.scalewright.model.DisplayUnits;

/** The charts of a report, drawn at print size with their captions. */
public final class ReportCharts {
    private ReportCharts() {
    }

    /**
     * Draws the four charts of a report at print size: {@code tension}, {@code break-percent},
     * {@code inharmonicity} (the working scale beside the reference, if any) and {@code stretch}
     * (every octave type).
     *
     * @param content the report's content
     * @return the charts, the three curves first, then the stretch curve
     */
    public static List<ReportChart> reportCharts(ReportContent content) {
        DisplayUnits units = content.units() == ReportUnits.IMPERIAL ? DisplayUnits.IMPERIAL : DisplayUnits.METRIC;
        CurveData data = CurveData.of(content.analysis(), units)
                .withReference(content.reference().map(ReportContent.Reference::analysis).orElse(null));
        String beside = content.reference().isPresent()
                ? " Working scale in blue, the reference (" + content.reference().get().sheetName()
                        + ") grey dashed." : "";
        String marks = " Dashed vertical lines mark section boundaries and wound/plain changes; red triangles "
                + "mark flagged notes.";
        List<ReportChart> out = new ArrayList<>();
        out.add(reportChart("tension", "Tension per string at the working pitch, " + units.force().symbol() + "."
                + beside + marks, ScaleCurves.tension(data)));
        out.add(reportChart("break-percent", "Stress as percent of the wire's breaking strength ("
                + content.analysis().settings().strength().name() + "), stress bands shaded." + beside + marks,
                ScaleCurves.breakPercent(data)));
        out.add(reportChart("inharmonicity", "Inharmonicity coefficient B at the working pitch, logarithmic scale."
                + beside + marks, ScaleCurves.inharmonicity(data)));
        out.add(reportChart("stretch", "Tuning stretch the scale's inharmonicity asks for, cents from equal "
                + "temperament, for 2:1, 4:2 and 6:3 octaves; A3-A4 held at equal temperament.",
                StretchChart.build("", content.stretchInOrder())));
        return out;
    }

    /** @return one chart drawn at print size: the image at {@link ChartFiles#PRINT_DPI}, its PNG and its SVG */
    public static ReportChart reportChart(String name, String caption, JFreeChart chart) {
        BufferedImage img = ChartFiles.image(chart, ChartFiles.PRINT_WIDTH, ChartFiles.PRINT_HEIGHT, ChartFiles.PRINT_DPI);
        return new ReportChart(name, caption, img, ChartFiles.png(img, ChartFiles.PRINT_DPI),
                ChartFiles.svgBytes(chart, ChartFiles.PRINT_WIDTH, ChartFiles.PRINT_HEIGHT));
    }

}
