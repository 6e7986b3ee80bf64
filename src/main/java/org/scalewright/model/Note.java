package org.scalewright.model;

import java.util.OptionalDouble;
import java.util.function.Consumer;

/**
 * One note of a scale as measured or specified: the strings of one key. All lengths in metres.
 *
 * @param key            key number (A0 = 1 … C8 = 88; extended bass 0, −1, …)
 * @param strings        strings per note, 1 to 3
 * @param speakingLength speaking length, m, &gt; 0
 * @param wire           the plain wire, or the core of a wound string
 * @param wrap           the winding of a wound string, or null for plain wire
 * @param pitchHz        explicit working pitch, Hz, &gt; 0 (measured string), or empty for the
 *                       equal-tempered pitch of the key
 * @param cents          offset from the equal-tempered pitch, cents (0 when not given)
 * @param strikePoint    strike point distance from the front termination, m, or empty
 * @param stretchedLength full stretched length hitch pin to tuning pin, m, or empty
 * @param woundLength    wound length of a wound string, m, or empty
 * @param section        free section label ("" when none)
 * @param remark         free text ("" when none)
 */
public record Note(int key, int strings, double speakingLength, CoreWire wire, Wrap wrap,
                   OptionalDouble pitchHz, double cents, OptionalDouble strikePoint,
                   OptionalDouble stretchedLength, OptionalDouble woundLength,
                   String section, String remark) {

    public Note {
        if (strings < 1 || strings > 3) {
            throw new IllegalArgumentException("strings per note must be 1, 2 or 3, was " + strings);
        }
        Checks.positive("speaking length", speakingLength, "mm", 1e3);
        if (wire == null) {
            throw new IllegalArgumentException("wire must be given for key " + key);
        }
        pitchHz = orEmpty(pitchHz);
        strikePoint = orEmpty(strikePoint);
        stretchedLength = orEmpty(stretchedLength);
        woundLength = orEmpty(woundLength);
        pitchHz.ifPresent(f -> Checks.positive("pitch", f, "Hz", 1));
        strikePoint.ifPresent(v -> Checks.positive("strike point", v, "mm", 1e3));
        stretchedLength.ifPresent(v -> Checks.positive("stretched length", v, "mm", 1e3));
        woundLength.ifPresent(v -> Checks.positive("wound length", v, "mm", 1e3));
        Checks.finite("cents", cents);
        section = section == null ? "" : section;
        remark = remark == null ? "" : remark;
    }

    private static OptionalDouble orEmpty(OptionalDouble v) {
        return v == null ? OptionalDouble.empty() : v;
    }

    /** @return a plain-wire note with only the required values */
    public static Note plain(int key, int strings, double speakingLength, CoreWire wire) {
        return new Note(key, strings, speakingLength, wire, null, OptionalDouble.empty(), 0,
                OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty(), "", "");
    }

    /** @return true for a wound (covered) string */
    public boolean isWound() {
        return wrap != null;
    }

    /** @return the length used for elongation: the stretched length where given, else the speaking length, m */
    public double elongationLength() {
        return stretchedLength.orElse(speakingLength);
    }

    public Note withWire(CoreWire newWire) {
        return edited(e -> e.wire = newWire);
    }

    public Note withWrap(Wrap newWrap) {
        return edited(e -> e.wrap = newWrap);
    }

    public Note withSpeakingLength(double newLength) {
        return edited(e -> e.speakingLength = newLength);
    }

    public Note withStrings(int newStrings) {
        return edited(e -> e.strings = newStrings);
    }

    public Note withSection(String newSection) {
        return edited(e -> e.section = newSection);
    }

    public Note withRemark(String newRemark) {
        return edited(e -> e.remark = newRemark);
    }

    public Note withPitch(OptionalDouble newPitchHz, double newCents) {
        return edited(e -> {
            e.pitchHz = newPitchHz;
            e.cents = newCents;
        });
    }

    /** @return a copy of this note with the changes {@code change} makes, checked as a new note */
    private Note edited(Consumer<Edit> change) {
        Edit e = new Edit(this);
        change.accept(e);
        return e.note();
    }

    /** The values of a note while one or two of them change; becomes a new, checked note. */
    private static final class Edit {
        private final int key;
        private int strings;
        private double speakingLength;
        private CoreWire wire;
        private Wrap wrap;
        private OptionalDouble pitchHz;
        private double cents;
        private final OptionalDouble strikePoint;
        private final OptionalDouble stretchedLength;
        private final OptionalDouble woundLength;
        private String section;
        private String remark;

        Edit(Note n) {
            key = n.key;
            strings = n.strings;
            speakingLength = n.speakingLength;
            wire = n.wire;
            wrap = n.wrap;
            pitchHz = n.pitchHz;
            cents = n.cents;
            strikePoint = n.strikePoint;
            stretchedLength = n.stretchedLength;
            woundLength = n.woundLength;
            section = n.section;
            remark = n.remark;
        }

        Note note() {
            return new Note(key, strings, speakingLength, wire, wrap, pitchHz, cents, strikePoint,
                    stretchedLength, woundLength, section, remark);
        }
    }
}
