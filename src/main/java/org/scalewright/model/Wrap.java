package org.scalewright.model;

/**
 * The winding of a wound (covered) string: close-wound round wire.
 *
 * @param inner diameter of the first (inner) wrap wire, m, &gt; 0
 * @param outer diameter of the second (outer) wrap wire, m; 0 for a single-wound string
 * @param metal the wrap metal (both wraps are of the same metal)
 */
public record Wrap(double inner, double outer, WrapMetal metal) {

    public Wrap {
        Checks.positive("first wrap diameter", inner, "mm", 1e3);
        Checks.nonNegative("second wrap diameter", outer, "mm", 1e3);
        if (metal == null) {
            metal = WrapMetal.COPPER;
        }
    }

    /** @return a single-wound wrap */
    public static Wrap single(double inner, WrapMetal metal) {
        return new Wrap(inner, 0, metal);
    }

    /** @return true when a second wrap is present */
    public boolean isDouble() {
        return outer > 0;
    }
}
