package org.scalewright.model;

/**
 * The winding of a wound (covered) string: close-wound round wire.
 *
 * <p>A rebuilder measures a wound string with a micrometer over the winding: its outside diameter
 * (OD) and, on a double-wound string, the diameter over the first layer (OD1). A wrap given that
 * way remembers it ({@link #givenByOd()}), with the diameters as given, so that a written sheet
 * keeps the ODs it was read with; its wrap wires follow from the core: single wound
 * w1 = (OD − d)/2, double wound w1 = (OD1 − d)/2 and w2 = (OD − OD1)/2 ({@link #fromOd}).
 *
 * @param inner diameter of the first (inner) wrap wire, m, &gt; 0
 * @param outer diameter of the second (outer) wrap wire, m; 0 for a single-wound string
 * @param metal the wrap metal (both wraps are of the same metal)
 * @param od    the outside diameter as given, m, or 0 when the wrap was given by its wires
 * @param od1   the diameter over the first layer of a double-wound string as given, m, or 0
 */
public record Wrap(double inner, double outer, WrapMetal metal, double od, double od1) {

    public Wrap {
        Checks.positive("first wrap diameter", inner, "mm", 1e3);
        Checks.nonNegative("second wrap diameter", outer, "mm", 1e3);
        Checks.nonNegative("outside diameter", od, "mm", 1e3);
        Checks.nonNegative("diameter over the first layer", od1, "mm", 1e3);
        if (metal == null) {
            metal = WrapMetal.COPPER;
        }
        if (od1 > 0 && (od == 0 || outer == 0)) {
            throw new IllegalArgumentException("a diameter over the first layer belongs to a double-wound string "
                    + "given by its outside diameter");
        }
        if (od > 0 && outer > 0 && od1 == 0) {
            throw new IllegalArgumentException("a double-wound string given by its outside diameter needs the "
                    + "diameter over the first layer too");
        }
    }

    /** A wrap given by its wire diameters. */
    public Wrap(double inner, double outer, WrapMetal metal) {
        this(inner, outer, metal, 0, 0);
    }

    /** @return a single-wound wrap */
    public static Wrap single(double inner, WrapMetal metal) {
        return new Wrap(inner, 0, metal);
    }

    /**
     * A wrap given by what is measured on the string.
     *
     * @param core the core diameter, m
     * @param od1  the diameter over the first layer, m, for a double-wound string; 0 for single wound
     * @param od   the outside diameter, m
     * @throws IllegalArgumentException when the OD is not larger than the core, or OD1 not between them
     */
    public static Wrap fromOd(double core, double od1, double od, WrapMetal metal) {
        Checks.positive("core diameter", core, "mm", 1e3);
        Checks.positive("outside diameter", od, "mm", 1e3);
        if (!(od > core)) {
            throw new IllegalArgumentException("the outside diameter " + mm(od) + " must be larger than the core "
                    + mm(core));
        }
        if (od1 == 0) {
            return new Wrap((od - core) / 2, 0, metal, od, 0);
        }
        if (!(od1 > core && od1 < od)) {
            throw new IllegalArgumentException("the diameter over the first layer " + mm(od1)
                    + " must lie between the core " + mm(core) + " and the outside diameter " + mm(od));
        }
        return new Wrap((od1 - core) / 2, (od - od1) / 2, metal, od, od1);
    }

    private static String mm(double metres) {
        return NumberText.upTo(metres * 1e3, 3, 4) + " mm";
    }

    /** @return true when a second wrap is present */
    public boolean isDouble() {
        return outer > 0;
    }

    /** @return true when the wrap was given by its outside diameter(s) rather than its wire diameters */
    public boolean givenByOd() {
        return od > 0;
    }

    /** @return the outside diameter over a core of diameter {@code core}, m: as given, else core + 2 w1 + 2 w2 */
    public double outsideDiameter(double core) {
        return givenByOd() ? od : core + 2 * inner + 2 * outer;
    }

    /** @return the diameter over the first layer, m: as given, else core + 2 w1 */
    public double firstLayerDiameter(double core) {
        return od1 > 0 ? od1 : core + 2 * inner;
    }

    /**
     * @return this wrap given in the same form as {@code form}: by OD (its ODs worked out over
     *         {@code core}) when {@code form} was, else by its wires
     */
    public Wrap inFormOf(Wrap form, double core) {
        if (form == null || !form.givenByOd()) {
            return givenByOd() ? new Wrap(inner, outer, metal) : this;
        }
        return byOdOver(core);
    }

    /**
     * @return this wrap as given by OD over {@code core}: OD = core + 2 w1 + 2 w2, OD1 = core + 2 w1,
     *         each without the arithmetic's last-digit noise (to 12 significant digits), and the wraps
     *         worked out from them as a sheet giving those ODs would, so that the note written and
     *         read back is the same note
     */
    public Wrap byOdOver(double core) {
        double newOd = clean(core + 2 * inner + 2 * outer);
        return fromOd(core, isDouble() ? clean(core + 2 * inner) : 0, newOd, metal);
    }

    private static double clean(double v) {
        return new java.math.BigDecimal(v).round(new java.math.MathContext(12)).doubleValue();
    }

    /** @return this wrap in another metal, given in the same form */
    public Wrap withMetal(WrapMetal newMetal) {
        return new Wrap(inner, outer, newMetal, od, od1);
    }
}
