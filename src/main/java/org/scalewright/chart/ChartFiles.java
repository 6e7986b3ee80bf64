package org.scalewright.chart;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Iterator;
import java.util.List;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageOutputStream;
import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.SVGUnits;
import org.jfree.svg.ViewBox;

/**
 * Draws a chart into files: PNG at print resolution and SVG. Charts are laid out at a size
 * in points (1/72 in); the PNG is drawn at {@code dpi} pixels per inch and says so in its
 * header, the SVG keeps the size in points and scales without loss.
 */
public final class ChartFiles {
    /** Print width of a report chart, points (about 17 cm, the text width of an A4 or Letter page). */
    public static final int PRINT_WIDTH = 640;
    /** Print height of a report chart, points. */
    public static final int PRINT_HEIGHT = 380;
    /** Resolution of a print PNG, pixels per inch. */
    public static final int PRINT_DPI = 300;

    private ChartFiles() {
    }

    /**
     * @param chart  the chart
     * @param width  layout width, points, &gt; 0
     * @param height layout height, points, &gt; 0
     * @param dpi    pixels per inch, in [36, 1200]
     * @return the chart drawn into an RGB image of width·dpi/72 × height·dpi/72 pixels
     */
    public static BufferedImage image(JFreeChart chart, int width, int height, int dpi) {
        check(width, height);
        if (dpi < 36 || dpi > 1200) {
            throw new IllegalArgumentException("resolution must be 36 to 1200 dpi, was " + dpi);
        }
        double scale = dpi / 72.0;
        int pw = (int) Math.round(width * scale);
        int ph = (int) Math.round(height * scale);
        BufferedImage img = new BufferedImage(pw, ph, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g.setColor(java.awt.Color.WHITE);
            g.fillRect(0, 0, pw, ph);
            g.scale(scale, scale);
            chart.draw(g, new Rectangle2D.Double(0, 0, width, height));
        } finally {
            g.dispose();
        }
        return img;
    }

    /** @return the chart as PNG bytes at {@code dpi}, the resolution recorded in the file */
    public static byte[] png(JFreeChart chart, int width, int height, int dpi) {
        return png(image(chart, width, height, dpi), dpi);
    }

    /** @return an image as PNG bytes with its resolution ({@code dpi}) recorded in the file */
    public static byte[] png(BufferedImage img, int dpi) {
        Iterator<ImageWriter> writers = ImageIO.getImageWritersByFormatName("png");
        if (!writers.hasNext()) {
            throw new IllegalStateException("this Java runtime has no PNG writer");
        }
        ImageWriter writer = writers.next();
        try (ByteArrayOutputStream bytes = new ByteArrayOutputStream();
             ImageOutputStream out = ImageIO.createImageOutputStream(bytes)) {
            ImageWriteParam param = writer.getDefaultWriteParam();
            IIOMetadata meta = writer.getDefaultImageMetadata(ImageTypeSpecifier.createFromRenderedImage(img), param);
            // the PNG pHYs chunk: pixels per metre (1 in = 0.0254 m)
            String perMetre = Long.toString(Math.round(dpi / 0.0254));
            IIOMetadataNode phys = new IIOMetadataNode("pHYs");
            phys.setAttribute("pixelsPerUnitXAxis", perMetre);
            phys.setAttribute("pixelsPerUnitYAxis", perMetre);
            phys.setAttribute("unitSpecifier", "meter");
            IIOMetadataNode root = new IIOMetadataNode("javax_imageio_png_1.0");
            root.appendChild(phys);
            meta.mergeTree("javax_imageio_png_1.0", root);
            writer.setOutput(out);
            writer.write(null, new IIOImage(img, null, meta), param);
            out.flush();
            return bytes.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("PNG encoding failed", e);
        } finally {
            writer.dispose();
        }
    }

    /**
     * @param chart  the chart
     * @param width  width, points, &gt; 0
     * @param height height, points, &gt; 0
     * @return a standalone SVG document, {@code width}×{@code height} pt
     */
    public static String svg(JFreeChart chart, int width, int height) {
        check(width, height);
        SVGGraphics2D g = new SVGGraphics2D(width, height, SVGUnits.PT);
        g.setDefsKeyPrefix("chart-"); // fixed ids (the default takes the clock): the same chart gives the same file
        chart.draw(g, new Rectangle2D.Double(0, 0, width, height));
        // the view box maps the drawing's units onto the size in points, so it fills the page size
        return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
                + g.getSVGElement(null, true, new ViewBox(0, 0, width, height), null, null) + "\n";
    }

    /** @return {@link #svg} as UTF-8 bytes */
    public static byte[] svgBytes(JFreeChart chart, int width, int height) {
        return svg(chart, width, height).getBytes(StandardCharsets.UTF_8);
    }

    private static void check(int width, int height) {
        if (width <= 0 || height <= 0 || width > 10000 || height > 10000) {
            throw new IllegalArgumentException("chart size must be 1 to 10000 points each way, was "
                    + width + " x " + height);
        }
    }
}
