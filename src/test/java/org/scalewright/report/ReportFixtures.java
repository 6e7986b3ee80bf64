package org.scalewright.report;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import com.opencsv.CSVReader;
import org.scalewright.design.orders.TestScales;
import org.scalewright.design.orders.WireAllowances;
import org.scalewright.design.stretch.OctaveType;
import org.scalewright.io.BuiltInData;
import org.scalewright.model.Scale;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

/** Report content of the generated test scale, and CSV reading for the checks. */
final class ReportFixtures {
    private ReportFixtures() {
    }

    static ScaleAnalysis analysis(Scale s) {
        return ScaleAnalyzer.analyze(s, BuiltInData.defaultSettings());
    }

    static ReportContent content(Scale s, ReportUnits units) {
        return ReportContent.compute("test.csv", analysis(s), Optional.empty(), units, OctaveType.TWO_ONE,
                WireAllowances.DEFAULT);
    }

    static ReportContent content(ReportUnits units) {
        return content(TestScales.generated(), units);
    }

    /** @return a plain image standing in for a chart (the PDF only embeds it) */
    static ReportChart chart(String name) {
        BufferedImage img = new BufferedImage(640, 380, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, 640, 380);
        g.setColor(Color.BLUE);
        g.drawLine(10, 370, 630, 10);
        g.dispose();
        return new ReportChart(name, "caption of " + name, img, new byte[] {1}, new byte[] {2});
    }

    static List<ReportChart> charts() {
        return List.of(chart("tension"), chart("break-percent"), chart("inharmonicity"), chart("stretch"));
    }

    /** @return the data rows of a CSV text (comments dropped), header first */
    static List<String[]> rows(String csv) throws Exception {
        StringBuilder data = new StringBuilder();
        for (String line : csv.lines().toList()) {
            if (!line.startsWith("#")) {
                data.append(line).append('\n');
            }
        }
        try (CSVReader r = new CSVReader(new StringReader(data.toString()))) {
            return new ArrayList<>(r.readAll());
        }
    }
}
