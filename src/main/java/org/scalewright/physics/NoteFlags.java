package org.scalewright.physics;

import java.util.ArrayList;
import java.util.List;
import org.scalewright.model.KeyNames;
import org.scalewright.model.Note;
import org.scalewright.model.NumberText;
import org.scalewright.model.WireNotation;

/**
 * The flags of a single note (stress bands, implausible values, strength-table range) and the
 * flags on the order of plain-wire sizes along the sheet.
 */
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
        if (note.isWound()) {
            winding(note).ifPresent(f -> flags.add(f));
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

    /**
     * An implausible winding: longer than the speaking length by more than
     * {@link Note#WINDING_TOLERANCE} (the winding stops short of the bridge pin and the front
     * termination, leaving bare core over both), or shorter than half of it. The wound length is
     * the sheet's {@code winding}, else what both bare ends given leave of the speaking length.
     */
    private static java.util.Optional<Flag> winding(Note note) {
        double l = note.speakingLength();
        double wound;
        String what;
        if (note.woundLength().isPresent()) {
            wound = note.woundLength().getAsDouble();
            what = "winding " + NumberText.fixed(wound * 1e3, 0) + " mm";
        } else if (note.bareFront().isPresent() && note.bareBack().isPresent()) {
            wound = l - note.bareFront().getAsDouble() - note.bareBack().getAsDouble();
            what = "winding " + NumberText.fixed(wound * 1e3, 0) + " mm (what the bare ends leave)";
        } else {
            return java.util.Optional.empty();
        }
        if (wound > l + Note.WINDING_TOLERANCE) {
            return java.util.Optional.of(new Flag(note.key(), FlagKind.IMPLAUSIBLE, what + " is longer than the "
                    + "speaking length " + NumberText.fixed(l * 1e3, 0) + " mm: a winding stops short of the "
                    + "bridge pin and the front termination; measure the wound part between them"));
        }
        if (wound < l / 2) {
            return java.util.Optional.of(new Flag(note.key(), FlagKind.IMPLAUSIBLE, what + " is shorter than half "
                    + "the speaking length " + NumberText.fixed(l * 1e3, 0) + " mm: more than half the string "
                    + "would be bare core"));
        }
        return java.util.Optional.empty();
    }

    /**
     * Diameters closer than this are one size: a size given by number and the same wire given in
     * millimetres differ by rounding only (half a music-wire size is 0.0127 mm, a metric step 0.025 mm).
     */
    static final double SAME_DIAMETER = 1e-6;

    /**
     * The flags on the order of plain-wire sizes, notes in sheet order: a plain wire thicker than
     * its bass-side plain neighbour in the same section ({@link FlagKind#SIZE_GROWS}), and a plain
     * wire of another diameter than both neighbours, which agree with each other, all three plain
     * and in one section ({@link FlagKind#ODD_SIZE}). A single odd string is flagged once: it does
     * not also count as a growth, and the note after it is compared with the note before it.
     *
     * @return for each note, by index, its flags of these two kinds (mostly empty)
     */
    static List<List<Flag>> wireOrder(List<Note> notes) {
        int n = notes.size();
        boolean[] odd = new boolean[n];
        List<List<Flag>> out = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            out.add(new ArrayList<>(0));
        }
        for (int i = 1; i + 1 < n; i++) {
            Note below = notes.get(i - 1);
            Note here = notes.get(i);
            Note above = notes.get(i + 1);
            if (plainInSection(below, here) && plainInSection(here, above) && same(below, above) && !same(below, here)) {
                odd[i] = true;
                out.get(i).add(new Flag(here.key(), FlagKind.ODD_SIZE, "plain wire " + WireNotation.of(here)
                        + " between " + WireNotation.of(below) + " on both sides (keys " + below.key() + " "
                        + KeyNames.name(below.key()) + " and " + above.key() + " " + KeyNames.name(above.key())
                        + "): a single odd string, perhaps a replacement of another size"));
            }
        }
        for (int i = 1; i < n; i++) {
            int j = odd[i - 1] && i >= 2 ? i - 2 : i - 1;
            Note below = notes.get(j);
            Note here = notes.get(i);
            if (odd[i] || !plainInSection(below, here)
                    || here.wire().diameter() <= below.wire().diameter() + SAME_DIAMETER) {
                continue;
            }
            out.get(i).add(new Flag(here.key(), FlagKind.SIZE_GROWS, "plain wire " + WireNotation.of(here)
                    + " is thicker than " + WireNotation.of(below) + " on key " + below.key() + " ("
                    + KeyNames.name(below.key()) + "), its bass-side neighbour in section '" + here.section()
                    + "': plain sizes normally stay or step down toward the treble"));
        }
        return out;
    }

    /** @return true when both notes are plain wire in the same section */
    private static boolean plainInSection(Note a, Note b) {
        return !a.isWound() && !b.isWound() && a.section().equals(b.section());
    }

    private static boolean same(Note a, Note b) {
        return Math.abs(a.wire().diameter() - b.wire().diameter()) <= SAME_DIAMETER;
    }
}
