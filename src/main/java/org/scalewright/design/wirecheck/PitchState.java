package org.scalewright.design.wirecheck;

import java.util.Collections;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;
import org.scalewright.model.Checks;
import org.scalewright.model.InvalidInput;

/**
 * How far flat of its target pitch each note of a piano stands now, in cents (positive = flat,
 * negative = sharp): one figure for every note, or figures measured per key. Between measured
 * keys the figure is interpolated linearly over key number; beyond the first and last measured
 * key the end figure is held.
 *
 * @param uniformCents the figure for every note when {@code measured} is empty, cents
 * @param measured     measured figures by key number, cents (empty for one uniform figure)
 */
public record PitchState(double uniformCents, SortedMap<Integer, Double> measured) {

    /** Where a note's figure came from. */
    public enum Source {
        /** the one figure given for every note */
        UNIFORM,
        /** measured on this key */
        MEASURED,
        /** interpolated between measured keys, or held from the nearest measured end */
        INTERPOLATED
    }

    public PitchState {
        Checks.finite("cents flat", uniformCents);
        TreeMap<Integer, Double> copy = new TreeMap<>();
        if (measured != null) {
            for (Map.Entry<Integer, Double> e : measured.entrySet()) {
                copy.put(e.getKey(), Checks.finite("cents flat of key " + e.getKey(), e.getValue()));
            }
        }
        measured = Collections.unmodifiableSortedMap(copy);
    }

    /** @return every note at its target pitch (no pitch raise) */
    public static PitchState atPitch() {
        return new PitchState(0, null);
    }

    /** How far flat (positive) or sharp (negative) a user may say a note stands, cents. */
    public static final double MAX_CENTS = 1200;

    /**
     * Every note the same number of cents flat, as a user gave it.
     *
     * @param cents cents flat of the target (negative: sharp), -{@value #MAX_CENTS} to {@value #MAX_CENTS}
     * @return the pitch state
     * @throws InvalidInput outside that range; the message both front ends show
     */
    public static PitchState flatBy(double cents) {
        if (!(Math.abs(cents) <= MAX_CENTS)) {
            throw new InvalidInput("cents flat must be " + Checks.format(-MAX_CENTS) + " to " + Checks.format(MAX_CENTS)
                    + ", was " + Checks.format(cents));
        }
        return uniform(cents);
    }

    /** @param cents how far flat every note stands, cents (negative: sharp) */
    public static PitchState uniform(double cents) {
        return new PitchState(cents, null);
    }

    /** @param byKey measured cents flat by key number, at least one key */
    public static PitchState measured(Map<Integer, Double> byKey) {
        if (byKey.isEmpty()) {
            throw new IllegalArgumentException("a measured pitch state needs at least one key");
        }
        return new PitchState(0, new TreeMap<>(byKey));
    }

    /** @return true when the figures were measured per key */
    public boolean isPerNote() {
        return !measured.isEmpty();
    }

    /** @return true when no note needs raising (every figure is 0 or sharp) */
    public boolean noRaise() {
        return measured.isEmpty() ? uniformCents <= 0 : measured.values().stream().allMatch(c -> c <= 0);
    }

    /** @return where the figure of {@code key} comes from */
    public Source source(int key) {
        if (measured.isEmpty()) {
            return Source.UNIFORM;
        }
        return measured.containsKey(key) ? Source.MEASURED : Source.INTERPOLATED;
    }

    /** @return how far flat {@code key} stands now, cents (negative: sharp) */
    public double centsFlat(int key) {
        if (measured.isEmpty()) {
            return uniformCents;
        }
        Double here = measured.get(key);
        if (here != null) {
            return here;
        }
        SortedMap<Integer, Double> head = measured.headMap(key);
        SortedMap<Integer, Double> tail = measured.tailMap(key);
        if (head.isEmpty()) {
            return tail.get(tail.firstKey());
        }
        if (tail.isEmpty()) {
            return head.get(head.lastKey());
        }
        int k0 = head.lastKey();
        int k1 = tail.firstKey();
        double t = (key - k0) / (double) (k1 - k0);
        return head.get(k0) + t * (tail.get(k1) - head.get(k0));
    }

    /**
     * @return the state in words: {@code 30 cents flat on every note}, or the measured keys and
     *         their range
     */
    public String describe() {
        if (!isPerNote()) {
            return Checks.format(uniformCents) + " cents flat on every note";
        }
        double lo = measured.values().stream().mapToDouble(Double::doubleValue).min().orElse(0);
        double hi = measured.values().stream().mapToDouble(Double::doubleValue).max().orElse(0);
        return String.format(java.util.Locale.ROOT, "cents flat measured on %d keys (%.1f to %.1f), interpolated "
                + "between them", measured.size(), lo, hi);
    }
}
