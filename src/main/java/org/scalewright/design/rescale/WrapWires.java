package org.scalewright.design.rescale;

import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.NumberText;
import org.scalewright.model.WrapMetal;

/**
 * The wrap wire diameters available to the wound-string designer, thinnest first: one list for
 * every metal (a step or a list given), or one list per metal (a catalogue, see
 * {@link #catalogue}). Immutable.
 */
public final class WrapWires {
    /** Default step of the available wrap wire: 0.05 mm (common practice, no source). */
    public static final double DEFAULT_STEP = 0.05e-3;
    /** Thickest wrap wire offered in steps: 3 mm (the plausible limit of the analysis). */
    public static final double MAX_STEPPED = 3.0e-3;

    private final double[] diameters;
    private final String description;
    /** per metal, when the wire differs by metal; empty: {@link #diameters} for every metal */
    private final Map<WrapMetal, double[]> byMetal;

    private WrapWires(double[] diameters, String description) {
        this(diameters, description, Map.of());
    }

    private WrapWires(double[] diameters, String description, Map<WrapMetal, double[]> byMetal) {
        this.diameters = diameters;
        this.description = description;
        this.byMetal = byMetal;
    }

    /**
     * @param wires the diameters offered per metal, m, each &gt; 0; at least one metal with at least one wire
     * @param name  what the catalogue is, in words (its first header line)
     * @return a catalogue: wrap wire by metal
     */
    public static WrapWires catalogue(Map<WrapMetal, List<Double>> wires, String name) {
        Map<WrapMetal, double[]> m = new EnumMap<>(WrapMetal.class);
        for (Map.Entry<WrapMetal, List<Double>> e : wires.entrySet()) {
            if (!e.getValue().isEmpty()) {
                m.put(e.getKey(), of(e.getValue()).diameters);
            }
        }
        if (m.isEmpty()) {
            throw new InvalidInput("the wrap wire catalogue lists no wire");
        }
        double[] all = m.values().stream().flatMapToDouble(Arrays::stream).sorted().distinct().toArray();
        return new WrapWires(all, name, Map.copyOf(m));
    }

    /** @return true when wrap wire of that metal is offered */
    public boolean offers(WrapMetal metal) {
        return byMetal.isEmpty() || byMetal.containsKey(metal);
    }

    /** @return the wire of that metal, m, thinnest first (empty when none is offered) */
    private double[] of(WrapMetal metal) {
        if (byMetal.isEmpty()) {
            return diameters;
        }
        return byMetal.getOrDefault(metal, new double[0]);
    }

    /** @return the thinnest wire of that metal, m (NaN when none is offered) */
    public double thinnest(WrapMetal metal) {
        double[] d = of(metal);
        return d.length == 0 ? Double.NaN : d[0];
    }

    /** @return the thickest wire of that metal, m (NaN when none is offered) */
    public double thickest(WrapMetal metal) {
        double[] d = of(metal);
        return d.length == 0 ? Double.NaN : d[d.length - 1];
    }

    /**
     * @return the listed wires of that metal nearest below and above {@code w}, as {@link #around(double)}
     *         (none when the metal is not offered)
     */
    public double[] around(double w, WrapMetal metal) {
        double[] d = of(metal);
        return d.length == 0 ? new double[0] : around(d, w);
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
        return around(diameters, w);
    }

    private static double[] around(double[] diameters, double w) {
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
