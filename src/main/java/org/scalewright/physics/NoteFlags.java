package org.scalewright.physics;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.scalewright.model.Note;

/** The flags of a single note: stress bands, implausible values, strength-table range. */
final class NoteFlags {
    private NoteFlags() {
    }

    static List<Flag> of(Note note, double pct, double tension, StressBand band, AnalysisSettings s) {
        List<Flag> flags = new ArrayList<>(2);
        int key = note.key();
        StressBands bands = s.bands();
        if (pct >= 100) {
            flags.add(new Flag(key, FlagKind.OVER_STRENGTH, String.format(Locale.ROOT,
                    "%.1f %% of breaking strength: the wire would break at this pitch", pct)));
        } else if (band == StressBand.DANGER) {
            flags.add(new Flag(key, FlagKind.DANGER, String.format(Locale.ROOT,
                    "%.1f %% of breaking strength, at or above the danger band (%.0f %%)", pct, bands.danger())));
        } else if (band == StressBand.CAUTION) {
            flags.add(new Flag(key, FlagKind.CAUTION, String.format(Locale.ROOT,
                    "%.1f %% of breaking strength, in the caution band (%.0f %%)", pct, bands.caution())));
        } else if (band == StressBand.LOW) {
            flags.add(new Flag(key, FlagKind.LOW_STRESS, String.format(Locale.ROOT,
                    "%.1f %% of breaking strength, below the low band (%.0f %%)", pct, bands.low())));
        }
        PlausibleRange p = s.plausible();
        double l = note.speakingLength();
        if (l < p.minSpeakingLength() || l > p.maxSpeakingLength()) {
            flags.add(new Flag(key, FlagKind.IMPLAUSIBLE, String.format(Locale.ROOT,
                    "speaking length %.0f mm is outside %.0f–%.0f mm", l * 1e3,
                    p.minSpeakingLength() * 1e3, p.maxSpeakingLength() * 1e3)));
        }
        double d = note.wire().diameter();
        double maxD = note.isWound() ? p.maxCore() : p.maxPlainWire();
        if (d < p.minWire() || d > maxD) {
            flags.add(new Flag(key, FlagKind.IMPLAUSIBLE, String.format(Locale.ROOT,
                    "%s %.3f mm is outside %.2f–%.2f mm", note.isWound() ? "core" : "plain wire", d * 1e3,
                    p.minWire() * 1e3, maxD * 1e3)));
        }
        if (note.isWound()) {
            double w = Math.max(note.wrap().inner(), note.wrap().outer());
            if (w > p.maxWrap()) {
                flags.add(new Flag(key, FlagKind.IMPLAUSIBLE, String.format(Locale.ROOT,
                        "wrap wire %.3f mm is thicker than %.2f mm", w * 1e3, p.maxWrap() * 1e3)));
            }
        }
        if (!(tension > 0)) {
            flags.add(new Flag(key, FlagKind.IMPLAUSIBLE, "the wire is too stiff for this length and pitch "
                    + "(no positive tension)"));
        }
        if (!s.strength().covers(d)) {
            flags.add(new Flag(key, FlagKind.OUTSIDE_STRENGTH_TABLE, String.format(Locale.ROOT,
                    "%.3f mm is outside the strength table (%.3f–%.3f mm); strength extrapolated", d * 1e3,
                    s.strength().minDiameter() * 1e3, s.strength().maxDiameter() * 1e3)));
        }
        return flags;
    }
}
