package org.scalewright.design.rescale;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.NumberText;

/** The wrap wire diameters available to the wound-string designer, thinnest first. Immutable. */
public final class WrapWires {
    /** Default step of the available wrap wire: 0.05 mm (common practice, no source). */
    public static final double DEFAULT_STEP = 0.05e-3;
    /** Thickest wrap wire offered in steps: 3 mm (the plausible limit of the analysis). */
    public static final double MAX_STEPPED = 3.0e-3;

    private final double[] diameters;
    private final String description;

    private WrapWires(double[] diameters, String description) {
        this.diameters = diameters;
        this.description = description;
    }

    /**
     * @param step the step, m, in (0, 1 mm]; wires at every multiple of it up to 3 mm
     * @return wrap wire in equal steps
     */
    public static WrapWires steps(double step) {
        PlanChecks.wrapStep(step);
        int n = (int) Math.floor(MAX_STEPPED / step + 1e-9);
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            // round to 0.1 µm so that e.g. 7 × 0.05 mm is written as 0.35 mm
            d[i] = Math.round((i + 1) * step * 1e7) / 1e7;
        }
        return new WrapWires(d, String.format(Locale.ROOT, "wrap wire in %s mm steps", trim(step * 1e3)));
    }

    /** @param metres the diameters offered, m, each &gt; 0, at least one @return that list */
    public static WrapWires of(List<Double> metres) {
        if (metres.isEmpty()) {
            throw new InvalidInput(WireLists.WRAPS + " is empty: give diameters in mm (0.2, 0.25), separated by commas");
        }
        WireLists.distinct(WireLists.WRAPS, metres);
        double[] d = metres.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        for (int i = 0; i < d.length; i++) {
            if (!(d[i] > 0) || Double.isInfinite(d[i])) {
                throw new InvalidInput(WireLists.WRAPS + ": a diameter must be more than 0, was "
                        + trim(d[i] * 1e3) + " mm");
            }
        }
        return new WrapWires(d, "wrap wire " + Arrays.stream(d).mapToObj(v -> trim(v * 1e3))
                .reduce((a, b) -> a + ", " + b).orElse("") + " mm");
    }

    /** @return the thinnest wire, m */
    public double thinnest() {
        return diameters[0];
    }

    /** @return the thickest wire, m */
    public double thickest() {
        return diameters[diameters.length - 1];
    }

    /**
     * @param w a wanted diameter, m
     * @return the listed wires nearest below and above {@code w} (one when {@code w} is listed or
     *         outside the list), thinnest first
     */
    public double[] around(double w) {
        int pos = Arrays.binarySearch(diameters, w);
        if (pos >= 0) {
            return new double[] {diameters[pos]};
        }
        int ins = -pos - 1;
        if (ins > 0 && w - diameters[ins - 1] < 1e-10) {
            return new double[] {diameters[ins - 1]};
        }
        if (ins < diameters.length && diameters[ins] - w < 1e-10) {
            return new double[] {diameters[ins]};
        }
        if (ins == 0) {
            return new double[] {diameters[0]};
        }
        if (ins == diameters.length) {
            return new double[] {diameters[diameters.length - 1]};
        }
        return new double[] {diameters[ins - 1], diameters[ins]};
    }

    /** @return what wire is available, in words */
    public String description() {
        return description;
    }

    private static String trim(double v) {
        return NumberText.plain(v);
    }

    @Override
    public String toString() {
        return description;
    }
}
