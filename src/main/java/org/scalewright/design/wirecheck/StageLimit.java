package org.scalewright.design.wirecheck;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.scalewright.model.Checks;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.UnitConversions;
import org.scalewright.model.NumberText;

/**
 * How much the total tension on the plate may change in one pass of a pitch raise before the
 * advice is to raise in stages: a force, or a percent of the present total.
 *
 * @param amount  the limit: N when {@code percent} is false, % of the present total when true; &gt; 0
 * @param percent true when {@code amount} is a percent of the present total tension
 */
public record StageLimit(double amount, boolean percent) {
    /**
     * Default: 5 % of the present total tension per pass (about 10 kN on a grand). A rule of
     * thumb chosen for this program, common practice, no source: a uniform raise of about
     * 40 cents changes the total by roughly that much.
     */
    public static final StageLimit DEFAULT = new StageLimit(5, true);

    public StageLimit {
        Checks.positive("stage limit", amount, percent ? "%" : "kN", percent ? 1 : 1e-3);
    }

    /** A number (decimal point or comma) and its unit: %, kN, N or lbf, spaces allowed. */
    private static final Pattern FORM = Pattern.compile("\\s*([0-9]*[.,]?[0-9]+)\\s*(%|kn|n|lbf)\\s*");

    /**
     * Reads a stage limit as a user writes it, on the command line ({@code --stage-above}) or in
     * the window: a percent of the present total tension ({@code 5%}, {@code 5 %}) or a force
     * ({@code 10kN}, {@code 9000 N}, {@code 2200 lbf}); the number may have a decimal point or a
     * decimal comma ({@code 7,5 kN}).
     *
     * @param text what the user wrote
     * @return the limit, &gt; 0
     * @throws InvalidInput when the text is not such an amount or is not &gt; 0; the message is the
     *                      one both front ends show
     */
    public static StageLimit parse(String text) {
        Matcher m = FORM.matcher(text == null ? "" : text.toLowerCase(Locale.ROOT));
        double v = m.matches() ? Double.parseDouble(m.group(1).replace(',', '.')) : Double.NaN;
        if (!(v > 0)) {
            throw new InvalidInput("stage limit: expected a percent of the present total or a force > 0, such as "
                    + "5%, 10kN or 2200lbf, was '" + (text == null ? "" : text.strip()) + "'");
        }
        return switch (m.group(2)) {
            case "%" -> percentOfTotal(v);
            case "kn" -> kiloNewtons(v);
            case "n" -> kiloNewtons(v / 1e3);
            default -> kiloNewtons(UnitConversions.lbfToNewtons(v) / 1e3);
        };
    }

    /** @param kiloNewtons the limit, kN, &gt; 0 */
    public static StageLimit kiloNewtons(double kiloNewtons) {
        return new StageLimit(kiloNewtons * 1e3, false);
    }

    /** @param pct the limit, % of the present total tension, &gt; 0 */
    public static StageLimit percentOfTotal(double pct) {
        return new StageLimit(pct, true);
    }

    /** @param presentTotal the present total tension, N @return the limit, N */
    public double newtons(double presentTotal) {
        return percent ? Math.abs(presentTotal) * amount / 100.0 : amount;
    }

    /** @return the limit in words, e.g. {@code 5 % of the present total} or {@code 10.0 kN} */
    public String describe() {
        return percent ? String.format(Locale.ROOT, "%s %% of the present total", trim(amount))
                : String.format(Locale.ROOT, "%s kN", trim(amount / 1e3));
    }

    /**
     * @param limitNewtons this limit worked out for the present total, N
     * @return the limit in words with its force where it is a percent:
     *         {@code 5 % of the present total (9.1 kN)}, or {@code 7.5 kN}
     */
    public String describe(double limitNewtons) {
        return percent ? String.format(Locale.ROOT, "%s (%.1f kN)", describe(), limitNewtons / 1e3) : describe();
    }

    private static String trim(double v) {
        return NumberText.plain(v);
    }
}
