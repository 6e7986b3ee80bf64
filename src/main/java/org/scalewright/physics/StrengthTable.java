package org.scalewright.physics;

import java.util.Arrays;
import java.util.List;
import org.scalewright.model.Checks;

/**
 * Breaking (tensile) strength of music wire by diameter, interpolated log-log between the
 * table's diameters and extrapolated from the end segment outside them.
 */
public final class StrengthTable {
    private final String name;
    private final List<String> sourceNotes;
    private final double[] diameters;
    private final double[] strengths;
    private final double[] logD;
    private final double[] logS;

    /**
     * @param name        a short name for the table (shown to the user)
     * @param sourceNotes where the data came from, one line each
     * @param diameters   wire diameters, m, positive, strictly increasing, at least two
     * @param strengths   tensile strengths at those diameters, Pa, positive
     */
    public StrengthTable(String name, List<String> sourceNotes, double[] diameters, double[] strengths) {
        if (diameters.length != strengths.length) {
            throw new IllegalArgumentException("strength table needs one strength per diameter, had "
                    + diameters.length + " diameters and " + strengths.length + " strengths");
        }
        if (diameters.length < 2) {
            throw new IllegalArgumentException("strength table needs at least two rows, had " + diameters.length);
        }
        for (int i = 0; i < diameters.length; i++) {
            Checks.positive("diameter", diameters[i], "mm", 1e3);
            Checks.positive("tensile strength", strengths[i], "MPa", 1e-6);
            if (i > 0 && diameters[i] <= diameters[i - 1]) {
                throw new IllegalArgumentException("strength table diameters must be unique and increasing, "
                        + diameters[i] * 1e3 + " mm follows " + diameters[i - 1] * 1e3 + " mm");
            }
        }
        this.name = name;
        this.sourceNotes = List.copyOf(sourceNotes);
        this.diameters = diameters.clone();
        this.strengths = strengths.clone();
        this.logD = Arrays.stream(diameters).map(Math::log).toArray();
        this.logS = Arrays.stream(strengths).map(Math::log).toArray();
    }

    /** @return the table's name */
    public String name() {
        return name;
    }

    /** @return where the data came from */
    public List<String> sourceNotes() {
        return sourceNotes;
    }

    /** @return a copy of the diameters, m */
    public double[] diameters() {
        return diameters.clone();
    }

    /** @return a copy of the strengths, Pa */
    public double[] strengths() {
        return strengths.clone();
    }

    /** @return smallest diameter in the table, m */
    public double minDiameter() {
        return diameters[0];
    }

    /** @return largest diameter in the table, m */
    public double maxDiameter() {
        return diameters[diameters.length - 1];
    }

    /** @return true when d lies within the table's diameters (no extrapolation) */
    public boolean covers(double d) {
        return d >= diameters[0] * (1 - 1e-12) && d <= maxDiameter() * (1 + 1e-12);
    }

    /**
     * @param d wire diameter, m, &gt; 0
     * @return breaking strength, Pa: log-log interpolated, or extrapolated from the end segment
     */
    public double strengthAt(double d) {
        Checks.positive("wire diameter", d, "mm", 1e3);
        double x = Math.log(d);
        int n = diameters.length;
        int i;
        if (x <= logD[0]) {
            i = 0;
        } else if (x >= logD[n - 1]) {
            i = n - 2;
        } else {
            int pos = Arrays.binarySearch(logD, x);
            if (pos >= 0) {
                return strengths[pos];
            }
            i = -pos - 2;
        }
        double t = (x - logD[i]) / (logD[i + 1] - logD[i]);
        return Math.exp(logS[i] + t * (logS[i + 1] - logS[i]));
    }

    /** @return a copy with every strength multiplied by {@code factor} (&gt; 0) */
    public StrengthTable scaled(double factor, String newName) {
        Checks.positive("strength factor", factor, "", 1);
        return new StrengthTable(newName, sourceNotes, diameters,
                Arrays.stream(strengths).map(s -> s * factor).toArray());
    }

    @Override
    public String toString() {
        return name;
    }
}
