package org.scalewright.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Optional;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.scalewright.chart.CurveFixtures;
import org.scalewright.design.orders.WireAllowances;
import org.scalewright.design.stretch.OctaveType;

/** The charts of a report drawn at print size. */
class ReportChartsTest {
    @Test
    void theReportGetsFourChartsEachWithImagePngAndSvg() throws Exception {
        ReportContent c = ReportContent.compute("small.csv", CurveFixtures.analysis(1.0),
                Optional.of(new ReportContent.Reference("ref.csv", CurveFixtures.analysis(1.05))),
                ReportUnits.IMPERIAL, OctaveType.FOUR_TWO, WireAllowances.DEFAULT);
        List<ReportChart> charts = ReportCharts.reportCharts(c);
        assertEquals(List.of("tension", "break-percent", "inharmonicity", "stretch"),
                charts.stream().map(ReportChart::name).toList());
        for (ReportChart rc : charts) {
            BufferedImage back = ImageIO.read(new ByteArrayInputStream(rc.png()));
            assertEquals(rc.image().getWidth(), back.getWidth());
            assertTrue(new String(rc.svg(), StandardCharsets.UTF_8).contains("<svg"));
        }
        assertTrue(charts.get(0).caption().contains("lbf"));
        assertTrue(charts.get(0).caption().contains("ref.csv"));
        assertTrue(new String(charts.get(0).svg(), StandardCharsets.UTF_8).contains("reference"));
    }
}
