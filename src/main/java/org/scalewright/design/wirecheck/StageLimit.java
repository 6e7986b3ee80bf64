package org.scalewright.design.wirecheck;

import java.util.Locale;
import org.scalewright.model.Checks;
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

    private static String trim(double v) {
        return NumberText.plain(v);
    }
}
