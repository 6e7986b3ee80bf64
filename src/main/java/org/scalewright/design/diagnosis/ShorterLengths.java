package org.scalewright.design.diagnosis;

import java.util.Collections;
import java.util.Locale;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * Shorten the speaking length of the notes that run high (a change of bridge or termination:
 * a rescaling job).
 *
 * @param presentLengths the present speaking length of each note changed, m, by key
 * @param newLengths     the speaking length needed, m, by key
 * @param maxPctAfter    the highest percent of breaking strength in the range with them, %
 * @param fixes          true when that is under the caution band
 */
public record ShorterLengths(SortedMap<Integer, Double> presentLengths, SortedMap<Integer, Double> newLengths,
                             double maxPctAfter, boolean fixes) implements Remedy {

    public ShorterLengths {
        presentLengths = Collections.unmodifiableSortedMap(new TreeMap<>(presentLengths));
        newLengths = Collections.unmodifiableSortedMap(new TreeMap<>(newLengths));
    }

    @Override
    public String describe() {
        StringBuilder b = new StringBuilder("Shorter speaking lengths:");
        String sep = " ";
        for (Map.Entry<Integer, Double> e : newLengths.entrySet()) {
            double was = presentLengths.get(e.getKey());
            b.append(String.format(Locale.ROOT, "%skey %d %.1f mm (now %.1f, %.1f mm shorter)", sep, e.getKey(),
                    e.getValue() * 1e3, was * 1e3, (was - e.getValue()) * 1e3));
            sep = "; ";
        }
        b.append(String.format(Locale.ROOT, ". With them the highest note of the range is at %.1f %%.", maxPctAfter));
        return b.toString();
    }
}
