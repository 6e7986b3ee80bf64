package org.scalewright.model;

/**
 * One music-wire size number and its diameter.
 *
 * @param size     size number (e.g. 14.5)
 * @param diameter diameter, m, &gt; 0
 */
public record WireSize(double size, double diameter) {
    public WireSize {
        Checks.positive("wire diameter", diameter, "mm", 1e3);
    }
}
