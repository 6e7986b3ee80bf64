package org.scalewright.physics;

import java.util.ArrayList;
import java.util.List;
import org.scalewright.model.Note;
import org.scalewright.model.NumberText;

/** The flags of a single note: stress bands, implausible values, strength-table range. */
final class NoteFlags {
    private NoteFlags() {
    }

    static List<Flag> of(Note note, double pct, double tension, StressBand band, AnalysisSettings s) {
        List<Flag> flags = new ArrayList<>(0);
        int key = note.key();
        StressBands bands = s.bands();
        if (pct >= 100) {
            flags.add(new Flag(key, FlagKind.OVER_STRENGTH,
                    NumberText.fixed(pct, 1) + " % of breaking strength: the wire would break at this pitch"));
        } else if (band == StressBand.DANGER) {
            flags.add(new Flag(key, FlagKind.DANGER,
                    NumberText.fixed(pct, 1) + " % of breaking strength, at or above the danger band ("
                    + NumberText.fixed(bands.danger(), 0) + " %)"));
        } else if (band == StressBand.CAUTION) {
            flags.add(new Flag(key, FlagKind.CAUTION,
                    NumberText.fixed(pct, 1) + " % of breaking strength, in the caution band ("
                    + NumberText.fixed(bands.caution(), 0) + " %)"));
        } else if (band == StressBand.LOW) {
            flags.add(new Flag(key, FlagKind.LOW_STRESS,
                    NumberText.fixed(pct, 1) + " % of breaking strength, below the low band ("
                    + NumberText.fixed(bands.low(), 0) + " %)"));
        }
        PlausibleRange p = s.plausible();
        double l = note.speakingLength();
        if (l < p.minSpeakingLength() || l > p.maxSpeakingLength()) {
            flags.add(new Flag(key, FlagKind.IMPLAUSIBLE, "speaking length "
                    + NumberText.fixed(l * 1e3, 0) + " mm is outside "
                    + NumberText.fixed(p.minSpeakingLength() * 1e3, 0) + "–" + NumberText.fixed(p.maxSpeakingLength() * 1e3, 0) + " mm"));
        }
        double d = note.wire().diameter();
        double maxD = note.isWound() ? p.maxCore() : p.maxPlainWire();
        if (d < p.minWire() || d > maxD) {
            flags.add(new Flag(key, FlagKind.IMPLAUSIBLE,
                    (note.isWound() ? "core " : "plain wire ") + NumberText.fixed(d * 1e3, 3) + " mm is outside "
                    + NumberText.fixed(p.minWire() * 1e3, 2) + "–" + NumberText.fixed(maxD * 1e3, 2) + " mm"));
        }
        if (note.isWound()) {
            double w = Math.max(note.wrap().inner(), note.wrap().outer());
            if (w > p.maxWrap()) {
                flags.add(new Flag(key, FlagKind.IMPLAUSIBLE,
                        "wrap wire " + NumberText.fixed(w * 1e3, 3) + " mm is thicker than "
                        + NumberText.fixed(p.maxWrap() * 1e3, 2) + " mm"));
            }
        }
        if (!(tension > 0)) {
            flags.add(new Flag(key, FlagKind.IMPLAUSIBLE, "the wire is too stiff for this length and pitch "
                    + "(no positive tension)"));
        }
        if (!s.strength().covers(d)) {
            flags.add(new Flag(key, FlagKind.OUTSIDE_STRENGTH_TABLE,
                    NumberText.fixed(d * 1e3, 3) + " mm is outside the strength table ("
                    + NumberText.fixed(s.strength().minDiameter() * 1e3, 3) + "–"
                    + NumberText.fixed(s.strength().maxDiameter() * 1e3, 3) + " mm); strength extrapolated"));
        }
        return flags.isEmpty() ? List.of() : flags;
    }
}
