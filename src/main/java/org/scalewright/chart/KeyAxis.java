package org.scalewright.chart;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.axis.AxisState;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTick;
import org.jfree.chart.axis.TickType;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.TextAnchor;
import org.scalewright.model.KeyNames;

/** The key-number axis: a tick at every C (key 4, 16, … 88), labelled with key number and note name. */
final class KeyAxis extends NumberAxis {
    private static final long serialVersionUID = 1L;

    KeyAxis() {
        super("key number");
        setAutoRangeIncludesZero(false);
        setLowerMargin(0.01);
        setUpperMargin(0.01);
    }

    @Override
    @SuppressWarnings({"rawtypes", "unchecked"})
    public List refreshTicks(Graphics2D g2, AxisState state, Rectangle2D dataArea, RectangleEdge edge) {
        if (!RectangleEdge.isTopOrBottom(edge)) {
            return super.refreshTicks(g2, state, dataArea, edge);
        }
        double lo = getRange().getLowerBound();
        double hi = getRange().getUpperBound();
        int step = (hi - lo) > 40 ? 12 : (hi - lo) > 15 ? 6 : 1;
        List ticks = new ArrayList<>();
        int first = (int) Math.ceil(lo);
        for (int k = first; k <= hi; k++) {
            if (Math.floorMod(k - 4, step) == 0) {
                String label = k + " " + KeyNames.name(k);
                ticks.add(new NumberTick(TickType.MAJOR, k, label, TextAnchor.TOP_CENTER, TextAnchor.CENTER, 0));
            }
        }
        return ticks;
    }
}
