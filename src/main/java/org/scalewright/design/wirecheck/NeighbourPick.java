package org.scalewright.design.wirecheck;

/**
 * Picks the neighbour of a diameter in a list of offered diameters.
 *
 * @param index      index of the chosen diameter in the list
 * @param exact      true when the diameter is in the list (within {@link #EXACT_TOLERANCE})
 * @param fellBack   true when the list has no neighbour on the asked side and the nearest end
 *                   was taken instead
 */
public record NeighbourPick(int index, boolean exact, boolean fellBack) {
    /** Two diameters closer than 0.1 µm are the same wire, m. */
    public static final double EXACT_TOLERANCE = 1e-7;

    /**
     * @param d        the diameter to convert, m, &gt; 0
     * @param offered  the offered diameters, m, strictly increasing, at least one
     * @param rounding nearest, next larger or next smaller
     * @return the pick; an exact match is kept whatever the rounding
     */
    public static NeighbourPick of(double d, double[] offered, SizeRounding rounding) {
        if (offered.length == 0) {
            throw new IllegalArgumentException("the list of offered diameters is empty");
        }
        if (!(d > 0) || Double.isInfinite(d)) {
            throw new IllegalArgumentException("wire diameter must be > 0 mm, was " + d * 1e3);
        }
        int above = 0;
        while (above < offered.length && offered[above] < d - EXACT_TOLERANCE) {
            above++;
        }
        // offered[above] is the first diameter not below d (or above == length)
        if (above < offered.length && Math.abs(offered[above] - d) <= EXACT_TOLERANCE) {
            return new NeighbourPick(above, true, false);
        }
        int below = above - 1;
        return switch (rounding) {
            case UP -> above < offered.length ? new NeighbourPick(above, false, false)
                    : new NeighbourPick(offered.length - 1, false, true);
            case DOWN -> below >= 0 ? new NeighbourPick(below, false, false) : new NeighbourPick(0, false, true);
            case NEAREST -> {
                if (above >= offered.length) {
                    yield new NeighbourPick(offered.length - 1, false, false);
                }
                if (below < 0) {
                    yield new NeighbourPick(0, false, false);
                }
                // a tie (within 1 nm) goes to the larger diameter
                boolean lower = d - offered[below] < offered[above] - d - 1e-9;
                yield new NeighbourPick(lower ? below : above, false, false);
            }
        };
    }
}
