package org.scalewright.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.scalewright.design.SmoothTrend;
import org.scalewright.design.rescale.ControlPoint;
import org.scalewright.design.rescale.TargetQuantity;
import org.scalewright.design.rescale.TargetSpec;
import org.scalewright.io.BadInputException;
import org.scalewright.io.TargetCurveReader;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.KeyNames;
import picocli.CommandLine.Option;

/** The target options shared by {@code plan-plain} and {@code plan-wound} (a picocli mixin). */
public final class PlanTargetOptions {
    @Option(names = "--target", paramLabel = "loess|line|logline|spline|akima|FILE.csv", defaultValue = "loess",
            description = {"what the planned strings aim at (default: ${DEFAULT-VALUE}):",
                    "loess = robust smooth trend of the present scale;",
                    "line / logline = straight / log-linear line between two anchor notes",
                    "(the first and last planned keys, or the two --points);",
                    "spline / akima = smooth curve through the --points;",
                    "FILE.csv = columns key,tension_n (straight between the keys given)"})
    String target;

    @Option(names = "--bandwidth", paramLabel = "F", defaultValue = "0.5",
            description = "loess: fraction of the planned keys in each local fit, 0 < F <= 1 (default: ${DEFAULT-VALUE})")
    double bandwidth;

    @Option(names = "--points", paramLabel = "KEY=VALUE", split = ",",
            description = "control points for line, logline, spline, akima: key number or note name = target value "
                    + "(N; %% for --target-of break-pct), e.g. 29=700,52=750,88=600; for a line, KEY alone "
                    + "takes the present value there")
    List<String> points;

    @Option(names = "--per-section",
            description = "loess: one trend per section, each joined continuously to the next")
    boolean perSection;

    /**
     * @param firstPlanned the lowest planned key (a line's default first anchor)
     * @param lastPlanned  the highest planned key (a line's default second anchor)
     * @return the target recipe; a file target is read here
     */
    TargetSpec spec(TargetQuantity quantity, int firstPlanned, int lastPlanned) throws BadInputException {
        String t = target.trim();
        switch (t.toLowerCase(Locale.ROOT)) {
            case "loess" -> {
                if (points != null) {
                    throw new UserError("--points is for --target line, logline, spline or akima, not loess");
                }
                return new TargetSpec.Loess(bandwidth, SmoothTrend.DEFAULT_ROBUSTNESS_ITERATIONS);
            }
            case "line", "logline" -> {
                boolean log = t.equalsIgnoreCase("logline");
                if (points == null) {
                    if (firstPlanned == lastPlanned) {
                        throw new UserError("--target " + t + " needs at least two planned keys");
                    }
                    return TargetSpec.Line.throughPresent(firstPlanned, lastPlanned, log);
                }
                if (points.size() != 2) {
                    throw new UserError("--target " + t + " needs exactly two --points (the anchor notes), had "
                            + points.size());
                }
                double[] a = anchor(points.get(0));
                double[] b = anchor(points.get(1));
                return new TargetSpec.Line((int) a[0], a[1], (int) b[0], b[1], log);
            }
            case "spline", "akima" -> {
                if (points == null || points.size() < 2) {
                    throw new UserError("--target " + t
                            + " needs --points KEY=VALUE,KEY=VALUE,… spanning the planned keys");
                }
                List<ControlPoint> cps = new ArrayList<>();
                for (String p : points) {
                    double[] kv = anchor(p);
                    if (Double.isNaN(kv[1])) {
                        throw new UserError("--points: '" + p + "' needs a value: KEY=VALUE");
                    }
                    cps.add(new ControlPoint((int) kv[0], kv[1]));
                }
                return new TargetSpec.Spline(cps, t.equalsIgnoreCase("akima"));
            }
            default -> {
                if (quantity != TargetQuantity.TENSION) {
                    throw new UserError("a target file gives tension (key,tension_n); it cannot be used with "
                            + "--target-of " + "break-pct");
                }
                if (points != null) {
                    throw new UserError("--points is for --target line, logline, spline or akima, not a file");
                }
                return new TargetSpec.Given(TargetCurveReader.read(Path.of(t)));
            }
        }
    }

    boolean perSection() {
        if (perSection && !target.trim().equalsIgnoreCase("loess")) {
            throw new UserError("--per-section works with --target loess only");
        }
        return perSection;
    }

    void check() {
        if (!(bandwidth > 0 && bandwidth <= 1)) {
            throw new UserError("--bandwidth must be > 0 and <= 1, was " + Formats.trim(bandwidth));
        }
    }

    private static double[] anchor(String text) {
        String[] kv = text.split("=", -1);
        if (kv.length > 2 || kv[0].isBlank()) {
            throw new UserError("--points: expected KEY=VALUE, was '" + text + "'");
        }
        int key;
        try {
            key = KeyNames.parse(kv[0]);
        } catch (InvalidInput e) {
            throw new UserError("--points: " + e.getMessage());
        }
        if (kv.length == 1 || kv[1].isBlank()) {
            return new double[] {key, Double.NaN};
        }
        try {
            double v = Double.parseDouble(kv[1].trim());
            if (!(v > 0) || Double.isInfinite(v)) {
                throw new UserError("--points: the value at key " + key + " must be > 0, was " + kv[1].trim());
            }
            return new double[] {key, v};
        } catch (NumberFormatException e) {
            throw new UserError("--points: '" + kv[1].trim() + "' is not a number");
        }
    }
}
