package org.scalewright.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import org.scalewright.physics.StressBand;

/** Colours, strokes, shapes and fonts of the curve charts, in one place. */
final class CurveLook {
    static final Color BACKGROUND = new Color(0xFBFAF7);
    static final Color PLOT = Color.WHITE;
    static final Color GRID = new Color(0xE2DED6);
    static final Color MINOR_GRID = new Color(0xF1EEE8);
    static final Color TEXT = new Color(0x2B2B2B);
    static final Color WORKING = new Color(0x1F4E79);
    static final Color REFERENCE = new Color(0xB9B2A4);
    static final Color PROPOSAL = new Color(0x2E8B57);
    static final Color FLAGGED = new Color(0xC8102E);
    static final Color SELECTED = new Color(0xE08A00);
    static final Color SECTION_LINE = new Color(0x6B4E2E);
    static final Color WOUND_LINE = new Color(0x7A5FA0);

    static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 13);
    static final Font AXIS = new Font(Font.SANS_SERIF, Font.PLAIN, 11);
    static final Font TICKS = new Font(Font.SANS_SERIF, Font.PLAIN, 10);
    static final Font MARKER = new Font(Font.SANS_SERIF, Font.PLAIN, 10);

    static final Stroke WORKING_STROKE = new BasicStroke(1.8f);
    /** Wide and pale, under the working curve: a halo where they agree, a second line where they part. */
    static final Stroke REFERENCE_STROKE = new BasicStroke(5f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    static final Stroke PROPOSAL_STROKE = new BasicStroke(1.8f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND,
            1f, new float[] {9f, 3f, 2f, 3f}, 0f);
    static final Stroke BOUNDARY_STROKE = new BasicStroke(1.0f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER,
            1f, new float[] {3f, 3f}, 0f);
    static final Stroke SELECTED_STROKE = new BasicStroke(2.2f);

    static final Shape DOT = new Ellipse2D.Double(-2.5, -2.5, 5, 5);
    static final Shape RING = new Ellipse2D.Double(-7, -7, 14, 14);
    static final Shape FLAG_MARK = triangle(5.5);

    static final Color OVERLAY_LINE = new Color(0x7B3FA0);
    static final Color OVERLAY_DOTTED = new Color(0xA3213C);
    static final Color OVERLAY_MARKS = new Color(0x00695C);
    static final Stroke OVERLAY_LINE_STROKE = new BasicStroke(1.6f);
    static final Stroke OVERLAY_DOTTED_STROKE = new BasicStroke(2.0f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND,
            1f, new float[] {0.5f, 4f}, 0f);
    static final Shape DIAMOND = diamond(8);

    private CurveLook() {
    }

    /** Gives series {@code i} of the overlay renderer the look of {@code look}. */
    static void styleOverlay(org.jfree.chart.renderer.xy.XYLineAndShapeRenderer r, int i,
                             org.scalewright.chart.CurveOverlay.Look look) {
        switch (look) {
            case LINE -> {
                r.setSeriesPaint(i, OVERLAY_LINE);
                r.setSeriesStroke(i, OVERLAY_LINE_STROKE);
                r.setSeriesLinesVisible(i, true);
                r.setSeriesShapesVisible(i, false);
            }
            case DOTTED -> {
                r.setSeriesPaint(i, OVERLAY_DOTTED);
                r.setSeriesStroke(i, OVERLAY_DOTTED_STROKE);
                r.setSeriesLinesVisible(i, true);
                r.setSeriesShapesVisible(i, false);
            }
            case MARKS -> {
                r.setSeriesPaint(i, OVERLAY_MARKS);
                r.setSeriesStroke(i, new BasicStroke(2.4f));
                r.setSeriesLinesVisible(i, false);
                r.setSeriesShapesVisible(i, true);
                r.setSeriesShapesFilled(i, false);
                r.setSeriesShape(i, DIAMOND);
            }
        }
    }

    private static Shape diamond(double r) {
        Path2D.Double p = new Path2D.Double();
        p.moveTo(0, -r);
        p.lineTo(r, 0);
        p.lineTo(0, r);
        p.lineTo(-r, 0);
        p.closePath();
        return p;
    }

    /** @return the translucent fill of a stress band on the percent-of-breaking-strength chart */
    static Color bandFill(StressBand band) {
        return switch (band) {
            case LOW -> new Color(0x5B8DB8);
            case NORMAL -> new Color(0x7FB77E);
            case CAUTION -> new Color(0xE8B130);
            case DANGER -> new Color(0xD9534F);
        };
    }

    private static Shape triangle(double r) {
        Path2D.Double p = new Path2D.Double();
        p.moveTo(0, -r);
        p.lineTo(r, r * 0.8);
        p.lineTo(-r, r * 0.8);
        p.closePath();
        return p;
    }
}
