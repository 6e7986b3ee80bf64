package org.scalewright.chart;

import org.jfree.chart.axis.NumberAxis;
import org.jfree.data.Range;

/**
 * The percent-of-breaking-strength axis: its automatic range always runs from 0 to at least
 * a given least upper bound, so that the danger band is in view even when every string is
 * well below it.
 */
final class PercentAxis extends NumberAxis {
    private static final long serialVersionUID = 1L;
    private double leastUpperBound = 80;

    PercentAxis(String label) {
        super(label);
        setAutoRangeIncludesZero(true);
    }

    /** @param upper the automatic range reaches at least this percent */
    void setLeastUpperBound(double upper) {
        this.leastUpperBound = upper;
        if (isAutoRange()) {
            autoAdjustRange();
        }
    }

    @Override
    protected void autoAdjustRange() {
        super.autoAdjustRange();
        if (isAutoRange()) {
            Range r = getRange();
            if (r.getUpperBound() < leastUpperBound || r.getLowerBound() > 0) {
                setRange(new Range(Math.min(0, r.getLowerBound()), Math.max(leastUpperBound, r.getUpperBound())),
                        false, false);
            }
        }
    }
}
