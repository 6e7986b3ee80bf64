package org.scalewright.design.diagnosis;

import java.util.List;
import java.util.Locale;
import org.scalewright.model.CoreWire;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.WireNotation;

/**
 * Restring the plain notes that run high with a thinner size, whose breaking strength is higher.
 * For plain wire the stress hardly changes with diameter (only the small stiffness term does),
 * so the gain is only the strength difference; the tension per string falls with the area.
 *
 * @param options     per plain note that runs high: the thinner size tried and its effect
 * @param woundKeys   notes that run high but are wound (a thinner core raises their stress; not tried)
 * @param maxPctAfter the highest percent of breaking strength in the range with every option applied, %
 * @param fixes       true when that is under the caution band
 */
public record ThinnerWire(List<SizeOption> options, List<Integer> woundKeys, double maxPctAfter, boolean fixes)
        implements Remedy {

    /**
     * One note on a thinner size.
     *
     * @param key              key number
     * @param present          its present wire
     * @param thinner          the thinner size: the largest that brings it under the caution band,
     *                         else the next thinner one
     * @param pctBefore        percent of breaking strength now, %
     * @param pctAfter         percent of breaking strength on the thinner size, %
     * @param tensionChangePct change of tension per string, %
     * @param enough           true when {@code pctAfter} is under the caution band
     */
    public record SizeOption(int key, CoreWire present, CoreWire thinner, double pctBefore, double pctAfter,
                             double tensionChangePct, boolean enough) {
    }

    public ThinnerWire {
        options = List.copyOf(options);
        woundKeys = List.copyOf(woundKeys);
    }

    @Override
    public String describe() {
        StringBuilder b = new StringBuilder("A thinner size (higher breaking strength):");
        if (options.isEmpty()) {
            b.append(" no thinner size is offered for these notes.");
        }
        String sep = " ";
        for (SizeOption o : options) {
            b.append(String.format(Locale.ROOT, "%skey %d %s instead of %s: %.1f %% instead of %.1f %%, tension %+.0f %%%s",
                    sep, o.key(), wire(o.thinner()), wire(o.present()), o.pctAfter(), o.pctBefore(),
                    o.tensionChangePct(), o.enough() ? "" : " (not enough)"));
            sep = "; ";
        }
        if (!woundKeys.isEmpty()) {
            b.append(sep.equals(" ") ? " " : "; ").append("wound keys ").append(woundKeys)
                    .append(" not tried (a thinner core raises their stress)");
        }
        b.append(String.format(Locale.ROOT, ". Highest note of the range then %.1f %%.", maxPctAfter));
        return b.toString();
    }

    static String wire(CoreWire w) {
        return WireNotation.of(w, LengthUnit.MM);
    }
}
