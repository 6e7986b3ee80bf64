package org.scalewright.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Optional;
import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.stream.ImageInputStream;
import org.jfree.chart.JFreeChart;
import org.junit.jupiter.api.Test;
import org.scalewright.design.orders.WireAllowances;
import org.scalewright.design.stretch.OctaveType;
import org.scalewright.report.ReportChart;
import org.scalewright.report.ReportContent;
import org.scalewright.report.ReportUnits;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.scalewright.model.DisplayUnits;

class ChartFilesTest {
    private final JFreeChart chart = ScaleCurves.tension(CurveData.of(CurveFixtures.analysis(1.0),
            DisplayUnits.METRIC));

    @Test
    void aPrintPngHasThePixelsAndTheResolutionItClaims() throws Exception {
        byte[] png = ChartFiles.png(chart, 640, 380, 300);
        BufferedImage img = ImageIO.read(new ByteArrayInputStream(png));
        assertEquals(2667, img.getWidth()); // 640 pt at 300 dpi
        assertEquals(1583, img.getHeight());
        try (ImageInputStream in = ImageIO.createImageInputStream(new ByteArrayInputStream(png))) {
            ImageReader r = ImageIO.getImageReadersByFormatName("png").next();
            r.setInput(in);
            IIOMetadata meta = r.getImageMetadata(0);
            Element root = (Element) meta.getAsTree("javax_imageio_png_1.0");
            NodeList phys = root.getElementsByTagName("pHYs");
            assertEquals(1, phys.getLength());
            Element p = (Element) phys.item(0);
            // 300 pixels per inch = 300 / 0.0254 = 11811 pixels per metre
            assertEquals(11811, Integer.parseInt(p.getAttribute("pixelsPerUnitXAxis")), 1);
            assertEquals("meter", p.getAttribute("unitSpecifier"));
        }
    }

    @Test
    void anSvgIsAStandaloneDocumentSizedInPoints() {
        String svg = ChartFiles.svg(chart, 640, 380);
        assertTrue(svg.contains("<svg"), svg.substring(0, 100));
        String head = svg.substring(0, svg.indexOf('>', svg.indexOf("<svg")));
        assertTrue(head.contains("width='640.0pt'") && head.contains("height='380.0pt'"), head);
        assertTrue(head.contains("viewBox='0.0 0.0 640.0 380.0'"), head);
        assertTrue(svg.contains("Tension per string"));
        assertTrue(svg.trim().endsWith("</svg>"));
        assertEquals(svg, new String(ChartFiles.svgBytes(chart, 640, 380), StandardCharsets.UTF_8));
    }


    @Test
    void badSizesAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ChartFiles.svg(chart, 0, 5));
        assertTrue(e.getMessage().contains("0 x 5"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> ChartFiles.image(chart, 10, 10, 5000));
    }
}
