package org.scalewright.chart;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import javax.imageio.ImageIO;
import org.jfree.chart.JFreeChart;

/** Draws a chart into an image, for tests and report files; no window needed. */
public final class ChartImages {
    private ChartImages() {
    }

    /**
     * @param chart  the chart
     * @param width  image width, pixels, &gt; 0
     * @param height image height, pixels, &gt; 0
     * @return the chart drawn into an RGB image
     */
    public static BufferedImage draw(JFreeChart chart, int width, int height) {
        if (width <= 0 || height <= 0) {
            throw new IllegalArgumentException("image size must be > 0 pixels, was " + width + " x " + height);
        }
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            chart.draw(g, new java.awt.geom.Rectangle2D.Double(0, 0, width, height));
        } finally {
            g.dispose();
        }
        return image;
    }

    /** @return the chart drawn as PNG bytes */
    public static byte[] png(JFreeChart chart, int width, int height) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            ImageIO.write(draw(chart, width, height), "png", out);
        } catch (IOException e) {
            throw new UncheckedIOException("encoding a chart as PNG failed", e);
        }
        return out.toByteArray();
    }
}
