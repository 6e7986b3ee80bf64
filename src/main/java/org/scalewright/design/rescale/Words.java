package org.scalewright.design.rescale;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.scalewright.model.CoreWire;
import org.scalewright.model.KeyNames;
import org.scalewright.model.NumberText;

/** Wording shared by the planners' notes and reasons. */
final class Words {
    private Words() {
    }

    /** @return {@code key 68 (E6)} */
    static String key(int key) {
        return "key " + key + " (" + KeyNames.name(key) + ")";
    }

    /** @return {@code size 14.5 (0.864 mm)} or {@code 0.825 mm} */
    static String wire(CoreWire w) {
        String mm = String.format(Locale.ROOT, "%.3f mm", w.diameter() * 1e3);
        return w.musicWireSize().isPresent() ? "size " + trim(w.musicWireSize().getAsDouble()) + " (" + mm + ")" : mm;
    }

    static String pct(double v) {
        return String.format(Locale.ROOT, "%.1f %%", v);
    }

    static String signedPct(double v) {
        return String.format(Locale.ROOT, "%+.1f %%", v);
    }

    static String mm(double metres) {
        return String.format(Locale.ROOT, "%.1f mm", metres * 1e3);
    }

    static String trim(double v) {
        return NumberText.plain(v);
    }

    /** @return where a step check was taken: {@code inside capo, keys 53-88} */
    static String where(StepCheck s) {
        return switch (s.kind()) {
            case INSIDE_SECTION -> "inside " + s.label() + ", keys " + s.firstKey() + "-" + s.lastKey();
            case ACROSS_BOUNDARY -> "across the boundary " + s.label();
            case AT_EDGE -> "at the edge of the planned keys";
        };
    }

    /** @return runs of keys written compactly: {@code keys 21-28, 30} */
    static String keys(List<Integer> keys) {
        List<String> parts = new ArrayList<>();
        int i = 0;
        while (i < keys.size()) {
            int j = i;
            while (j + 1 < keys.size() && keys.get(j + 1) == keys.get(j) + 1) {
                j++;
            }
            parts.add(i == j ? Integer.toString(keys.get(i)) : keys.get(i) + "-" + keys.get(j));
            i = j + 1;
        }
        return (keys.size() == 1 ? "key " : "keys ") + String.join(", ", parts);
    }
}
