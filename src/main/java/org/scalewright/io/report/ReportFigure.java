package org.scalewright.io.report;

import java.awt.image.BufferedImage;

/**
 * A chart drawn into an image for the PDF report.
 *
 * @param caption what the chart shows, one or two sentences
 * @param image   the chart, drawn at print resolution (about 300 pixels per inch at text width)
 */
public record ReportFigure(String caption, BufferedImage image) {
    public ReportFigure {
        if (image == null) {
            throw new IllegalArgumentException("report figure needs an image, was null");
        }
        caption = caption == null ? "" : caption;
    }
}
