package org.scalewright.design.rescale;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.interpolation.AkimaSplineInterpolator;
import org.apache.commons.math3.analysis.interpolation.SplineInterpolator;
import org.scalewright.design.SmoothTrend;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.NumberText;

/**
 * How to make a target curve over the keys being planned, from the present values at those
 * keys. The ways: a robust smooth trend of the present values ({@link Loess}), a straight or
 * log-linear line between two anchor notes ({@link Line}), a smooth spline through control
 * points ({@link Spline}), or a curve given outright ({@link Given}, e.g. read from a file).
 * A recipe is the user's: what it cannot do (a bandwidth out of range, too few points, points
 * that do not span the planned keys) is refused with {@link InvalidInput}, one message for the
 * command line and the window.
 */
public sealed interface TargetSpec permits TargetSpec.Loess, TargetSpec.Line, TargetSpec.Spline, TargetSpec.Given {

    /**
     * @param keys    the keys being planned, strictly increasing, at least one
     * @param present the present value at each of those keys (N or %), &gt; 0
     * @return a curve covering {@code keys[0]} to the last key
     * @throws InvalidInput when the user's recipe cannot cover those keys (points or anchors outside
     *         them, a curve that runs to zero); the message says what to change
     */
    TargetCurve build(int[] keys, double[] present);

    /** @return a robust smooth trend with the given bandwidth and the default robustness iterations */
    static TargetSpec loess(double bandwidth) {
        return new Loess(bandwidth, SmoothTrend.DEFAULT_ROBUSTNESS_ITERATIONS);
    }

    /**
     * A robust smooth trend of the present values (LOESS with robustness iterations through
     * {@link SmoothTrend}), so that a few bumped notes do not drag the target; each local fit
     * takes at least 7 keys, and a short run of keys may get a wider bandwidth
     * ({@link SmoothTrend}), which the curve's description then says.
     *
     * @param bandwidth  fraction of the planned keys in each local fit, in (0, 1]
     * @param iterations robustness iterations, &ge; 0
     */
    record Loess(double bandwidth, int iterations) implements TargetSpec {
        public Loess {
            if (!(bandwidth > 0 && bandwidth <= 1)) {
                throw new InvalidInput("bandwidth must be more than 0 and at most 1, was " + trim(bandwidth));
            }
            if (iterations < 0) {
                throw new IllegalArgumentException("robustness iterations must be >= 0, was " + iterations);
            }
        }

        @Override
        public TargetCurve build(int[] keys, double[] present) {
            check(keys, present);
            double[] x = new double[keys.length];
            for (int i = 0; i < keys.length; i++) {
                x[i] = keys[i];
            }
            SmoothTrend.Fit fit = SmoothTrend.robustFit(x, present, bandwidth, iterations);
            double[] v = fit.values();
            for (int i = 0; i < v.length; i++) {
                if (!(v[i] > 0)) {
                    // a local fit that runs to zero or below (only on tiny, wild inputs): take the value there
                    v[i] = present[i];
                }
            }
            String used = fit.bandwidth() == bandwidth ? trim(bandwidth)
                    : String.format(Locale.ROOT, "%s, widened to %.2f for %d keys", trim(bandwidth), fit.bandwidth(),
                    keys.length);
            return TargetCurve.throughPoints(keys, v, String.format(Locale.ROOT,
                    "robust smooth trend of the present scale (bandwidth %s%s)", used,
                    fit.iterations() == iterations ? "" : ", " + fit.iterations() + " robustness iterations"));
        }
    }

    /**
     * A line between two anchor notes, straight in value or in log value (a constant percent
     * change per key), extended beyond the anchors to every planned key.
     *
     * @param keyA      first anchor key
     * @param valueA    value at the first anchor, &gt; 0, or NaN to take the present value there
     * @param keyB      second anchor key, different from {@code keyA}
     * @param valueB    value at the second anchor, &gt; 0, or NaN to take the present value there
     * @param logLinear true for a straight line in log value
     */
    record Line(int keyA, double valueA, int keyB, double valueB, boolean logLinear) implements TargetSpec {
        public Line {
            if (keyA == keyB) {
                throw new InvalidInput("a line needs two different anchor keys, both were " + keyA);
            }
            checkAnchor(keyA, valueA);
            checkAnchor(keyB, valueB);
        }

        /** @return a line through the present values at the two anchor keys */
        public static Line throughPresent(int keyA, int keyB, boolean logLinear) {
            return new Line(keyA, Double.NaN, keyB, Double.NaN, logLinear);
        }

        private static void checkAnchor(int key, double v) {
            if (!Double.isNaN(v) && (!(v > 0) || Double.isInfinite(v))) {
                throw new InvalidInput("anchor value at key " + key + " must be > 0, was " + v);
            }
        }

        @Override
        public TargetCurve build(int[] keys, double[] present) {
            check(keys, present);
            double a = Double.isNaN(valueA) ? presentAt(keys, present, keyA) : valueA;
            double b = Double.isNaN(valueB) ? presentAt(keys, present, keyB) : valueB;
            int first = keys[0];
            double[] v = new double[keys[keys.length - 1] - first + 1];
            for (int i = 0; i < v.length; i++) {
                double t = (double) (first + i - keyA) / (keyB - keyA);
                v[i] = logLinear ? Math.exp(Math.log(a) + t * (Math.log(b) - Math.log(a))) : a + t * (b - a);
                if (!(v[i] > 0)) {
                    throw new InvalidInput(String.format(Locale.ROOT, "the line from key %d (%.1f) to key %d "
                            + "(%.1f) runs to zero or below at key %d; choose anchors nearer the planned keys or a "
                            + "log-linear line", keyA, a, keyB, b, first + i));
                }
            }
            return new TargetCurve(first, v, String.format(Locale.ROOT, "%s line from key %d (%.1f) to key %d (%.1f)",
                    logLinear ? "log-linear" : "straight", keyA, a, keyB, b));
        }

        private static double presentAt(int[] keys, double[] present, int key) {
            for (int i = 0; i < keys.length; i++) {
                if (keys[i] == key) {
                    return present[i];
                }
            }
            throw new InvalidInput("anchor key " + key + " is not one of the planned keys ("
                    + keys[0] + "-" + keys[keys.length - 1] + "); give its value or choose a planned key");
        }
    }

    /**
     * A smooth curve through control points: a natural cubic spline, or an Akima spline (less
     * overshoot near sharp changes, needs at least 5 points), both from Commons Math. Two points
     * give a straight line. The points must span every planned key.
     *
     * @param points the control points, keys unique, at least two
     * @param akima  true for an Akima spline
     */
    record Spline(List<ControlPoint> points, boolean akima) implements TargetSpec {
        public Spline {
            List<ControlPoint> sorted = new ArrayList<>(points);
            sorted.sort((p, q) -> Integer.compare(p.key(), q.key()));
            if (sorted.size() < 2) {
                throw new InvalidInput("a spline target needs at least 2 control points, had " + sorted.size());
            }
            for (int i = 1; i < sorted.size(); i++) {
                if (sorted.get(i).key() == sorted.get(i - 1).key()) {
                    throw new InvalidInput("control point key " + sorted.get(i).key() + " is given twice");
                }
            }
            if (akima && sorted.size() < 5) {
                throw new InvalidInput("an Akima spline needs at least 5 control points, had " + sorted.size());
            }
            points = List.copyOf(sorted);
        }

        @Override
        public TargetCurve build(int[] keys, double[] present) {
            check(keys, present);
            int lo = points.get(0).key();
            int hi = points.get(points.size() - 1).key();
            if (keys[0] < lo || keys[keys.length - 1] > hi) {
                throw new InvalidInput("the control points span keys " + lo + "-" + hi
                        + " but the planned keys run " + keys[0] + "-" + keys[keys.length - 1]
                        + "; add points at the ends");
            }
            double[] x = points.stream().mapToDouble(ControlPoint::key).toArray();
            double[] y = points.stream().mapToDouble(ControlPoint::value).toArray();
            UnivariateFunction f;
            if (points.size() == 2) {
                f = k -> y[0] + (k - x[0]) / (x[1] - x[0]) * (y[1] - y[0]);
            } else if (akima) {
                f = new AkimaSplineInterpolator().interpolate(x, y);
            } else {
                f = new SplineInterpolator().interpolate(x, y);
            }
            int first = keys[0];
            double[] v = new double[keys[keys.length - 1] - first + 1];
            for (int i = 0; i < v.length; i++) {
                v[i] = f.value(first + i);
                if (!(v[i] > 0)) {
                    throw new InvalidInput("the spline through the control points runs to zero or below at key "
                            + (first + i) + "; move the points or use an Akima spline");
                }
            }
            return new TargetCurve(first, v, (akima ? "Akima" : "cubic") + " spline through " + points.size()
                    + " control points");
        }
    }

    /**
     * A curve given outright (drawn by the user, or read from a file).
     *
     * @param curve the curve; it must cover every planned key
     */
    record Given(TargetCurve curve) implements TargetSpec {
        public Given {
            if (curve == null) {
                throw new IllegalArgumentException("a given target needs a curve");
            }
        }

        @Override
        public TargetCurve build(int[] keys, double[] present) {
            check(keys, present);
            int first = keys[0];
            int last = keys[keys.length - 1];
            if (!curve.covers(first) || !curve.covers(last)) {
                throw new InvalidInput("the target (" + curve.description() + ") covers keys "
                        + curve.firstKey() + "-" + curve.lastKey() + " but the planned keys run " + first + "-" + last);
            }
            return curve.part(first, last);
        }
    }

    private static void check(int[] keys, double[] present) {
        if (keys.length == 0 || keys.length != present.length) {
            throw new IllegalArgumentException("a target needs at least one planned key and one present value per key, had "
                    + keys.length + " keys and " + present.length + " values");
        }
    }

    private static String trim(double v) {
        return NumberText.plain(v);
    }
}
