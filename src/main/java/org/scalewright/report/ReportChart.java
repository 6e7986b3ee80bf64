package org.scalewright.report;

import java.awt.image.BufferedImage;

/**
 * One chart of a report, drawn: the image for the PDF and the PNG and SVG files.
 *
 * @param name    file name stem ({@code tension} → {@code tension.png}, {@code tension.svg})
 * @param caption what the chart shows, one or two sentences
 * @param image   the chart drawn at print resolution
 * @param png     the PNG file's bytes
 * @param svg     the SVG file's bytes
 */
public record ReportChart(String name, String caption, BufferedImage image, byte[] png, byte[] svg) {
    public ReportChart {
        if (name == null || !name.matches("[a-z0-9-]+")) {
            throw new IllegalArgumentException("chart file name must be lower-case letters, digits and '-', was '"
                    + name + "'");
        }
        if (image == null || png == null || svg == null) {
            throw new IllegalArgumentException("chart " + name + " needs its image, PNG and SVG");
        }
        caption = caption == null ? "" : caption;
    }
}
