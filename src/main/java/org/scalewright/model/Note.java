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
 * @param bareFront      bare core at the front end inside the speaking length, m, or empty
 * @param bareBack       bare core at the back end inside the speaking length, m, or empty
 * @param backLength     back length, from the back termination of the speaking length (bridge pin)
 *                       to the hitch pin, m, &gt; 0, or empty; with the stretched length, shorter
 *                       than stretched less speaking length
 */
public record Note(int key, int strings, double speakingLength, CoreWire wire, Wrap wrap,
                   OptionalDouble pitchHz, double cents, OptionalDouble strikePoint,
                   OptionalDouble stretchedLength, OptionalDouble woundLength,
                   String section, String remark, OptionalDouble bareFront, OptionalDouble bareBack,
                   OptionalDouble backLength) {

    /**
     * How far the wound length and the two bare ends may fall from the speaking length, m
     * (0.5 mm: a tape measure's reading of three lengths; common practice, no source).
     */
    public static final double WINDING_TOLERANCE = 0.5e-3;

    /** The bare core at each end of a wound string inside its speaking length, m. */
    public record BareEnds(double front, double back) {
        public static final BareEnds NONE = new BareEnds(0, 0);

        /** @return true when there is bare core at either end */
        public boolean any() {
            return front > 0 || back > 0;
        }
    }

    /** A note without a back length given. */
    public Note(int key, int strings, double speakingLength, CoreWire wire, Wrap wrap,
                OptionalDouble pitchHz, double cents, OptionalDouble strikePoint,
                OptionalDouble stretchedLength, OptionalDouble woundLength, String section, String remark,
                OptionalDouble bareFront, OptionalDouble bareBack) {
        this(key, strings, speakingLength, wire, wrap, pitchHz, cents, strikePoint, stretchedLength, woundLength,
                section, remark, bareFront, bareBack, OptionalDouble.empty());
    }

    /** A note without bare ends or back length given. */
    public Note(int key, int strings, double speakingLength, CoreWire wire, Wrap wrap,
                OptionalDouble pitchHz, double cents, OptionalDouble strikePoint,
                OptionalDouble stretchedLength, OptionalDouble woundLength, String section, String remark) {
        this(key, strings, speakingLength, wire, wrap, pitchHz, cents, strikePoint, stretchedLength, woundLength,
                section, remark, OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty());
    }

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
        bareFront = orEmpty(bareFront);
        bareBack = orEmpty(bareBack);
        bareFront.ifPresent(v -> Checks.nonNegative("bare core at the front", v, "mm", 1e3));
        bareBack.ifPresent(v -> Checks.nonNegative("bare core at the back", v, "mm", 1e3));
        backLength = orEmpty(backLength);
        backLength.ifPresent(v -> Checks.positive("back length", v, "mm", 1e3));
        if (!backLengthFits(backLength, speakingLength, stretchedLength)) {
            throw new IllegalArgumentException("key " + key + ": back length " + Checks.format(backLength.getAsDouble()
                    * 1e3) + " mm + speaking length " + Checks.format(speakingLength * 1e3) + " mm leave nothing of "
                    + "the stretched length " + Checks.format(stretchedLength.getAsDouble() * 1e3) + " mm (hitch pin "
                    + "to tuning pin) for the front length to the tuning pin");
        }
        WindingFit fit = WindingFit.of(wrap != null, speakingLength, woundLength, bareFront, bareBack);
        if (fit != WindingFit.FITS) {
            throw new IllegalArgumentException("key " + key + ": " + fit.words(speakingLength, woundLength, bareFront,
                    bareBack, v -> Checks.format(v * 1e3) + " mm"));
        }
        if (wrap != null && wrap.givenByOd()) {
            double d = wire.diameter();
            if (Math.abs(d + 2 * wrap.inner() + 2 * wrap.outer() - wrap.od()) > 1e-9
                    || (wrap.isDouble() && Math.abs(d + 2 * wrap.inner() - wrap.od1()) > 1e-9)) {
                throw new IllegalArgumentException("key " + key + ": the outside diameter does not match core and wraps");
            }
        }
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

    /**
     * The back length and the speaking length must leave a front length to the tuning pin within
     * the stretched length (hitch pin to tuning pin): one rule for the reader, the model and the window.
     *
     * @return true when they do, or when the back or the stretched length is not given
     */
    public static boolean backLengthFits(OptionalDouble back, double speaking, OptionalDouble stretched) {
        return back.isEmpty() || stretched.isEmpty() || back.getAsDouble() + speaking < stretched.getAsDouble();
    }

    /**
     * The bare core at each end inside the speaking length (DESIGN §3): as given by the sheet's
     * bare ends; one bare end given with the wound length, the other is what is left of the
     * speaking length; only the wound length given, the bare core is split equally between the
     * ends; a wound length as long as the speaking length or longer leaves none. Plain wire: none.
     */
    public BareEnds bareEnds() {
        if (!isWound()) {
            return BareEnds.NONE;
        }
        double l = speakingLength;
        if (bareFront.isPresent() && bareBack.isPresent()) {
            return new BareEnds(bareFront.getAsDouble(), bareBack.getAsDouble());
        }
        if (woundLength.isEmpty()) {
            return new BareEnds(bareFront.orElse(0), bareBack.orElse(0));
        }
        double bare = Math.max(0, l - woundLength.getAsDouble());
        if (bareFront.isPresent()) {
            return new BareEnds(bareFront.getAsDouble(), Math.max(0, bare - bareFront.getAsDouble()));
        }
        if (bareBack.isPresent()) {
            return new BareEnds(Math.max(0, bare - bareBack.getAsDouble()), bareBack.getAsDouble());
        }
        return new BareEnds(bare / 2, bare / 2);
    }

    /** @return the outside diameter of a wound string (as given, else core + 2 w1 + 2 w2), m; NaN for plain wire */
    public double outsideDiameter() {
        return isWound() ? wrap.outsideDiameter(wire.diameter()) : Double.NaN;
    }

    /** @return true for a wound (covered) string */
    public boolean isWound() {
        return wrap != null;
    }

    /** @return the length used for elongation: the stretched length where given, else the speaking length, m */
    public double elongationLength() {
        return stretchedLength.orElse(speakingLength);
    }

    /**
     * @return this note with another plain wire or core; a wrap given by OD keeps its wraps
     *         and its OD follows the new core
     */
    public Note withWire(CoreWire newWire) {
        return edited(e -> {
            e.wire = newWire;
            if (e.wrap != null && e.wrap.givenByOd()) {
                e.wrap = e.wrap.byOdOver(newWire.diameter());
            }
        });
    }

    /** @return this note with another wrap; without a wrap (plain wire) it has no winding or bare ends either */
    public Note withWrap(Wrap newWrap) {
        return edited(e -> {
            e.wrap = newWrap;
            if (newWrap == null) {
                e.woundLength = OptionalDouble.empty();
                e.bareFront = OptionalDouble.empty();
                e.bareBack = OptionalDouble.empty();
            }
        });
    }

    /**
     * @param newLength the new speaking length, m, &gt; 0
     * @return this note with another speaking length; a wound length given moves by the same
     *         amount, so the bare core at the ends (given, or what the winding leaves) stays as it
     *         was, as on a string made again for the new length
     * @throws IllegalArgumentException when the bare core at the ends would leave no winding
     */
    public Note withSpeakingLength(double newLength) {
        return edited(e -> {
            if (e.woundLength.isPresent()) {
                double wound = e.woundLength.getAsDouble() + newLength - e.speakingLength;
                if (!(wound > WINDING_TOLERANCE)) {
                    throw new IllegalArgumentException("key " + key + ": the bare core at the ends, "
                            + Checks.format((e.speakingLength - e.woundLength.getAsDouble()) * 1e3) + " mm, leaves no "
                            + "winding in a speaking length of " + Checks.format(newLength * 1e3) + " mm");
                }
                e.woundLength = OptionalDouble.of(wound);
            }
            e.speakingLength = newLength;
        });
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

    /** @param newStrikePoint strike point from the front termination, m, or empty */
    public Note withStrikePoint(OptionalDouble newStrikePoint) {
        return edited(e -> e.strikePoint = newStrikePoint);
    }

    /** @param newStretchedLength stretched length hitch pin to tuning pin, m, or empty */
    public Note withStretchedLength(OptionalDouble newStretchedLength) {
        return edited(e -> e.stretchedLength = newStretchedLength);
    }

    /** @param newBackLength back length bridge pin to hitch pin, m, or empty */
    public Note withBackLength(OptionalDouble newBackLength) {
        return edited(e -> e.backLength = newBackLength);
    }

    /**
     * @param newWoundLength wound length inside the speaking length, m, or empty
     * @param newBareFront   bare core at the front end, m, or empty
     * @param newBareBack    bare core at the back end, m, or empty
     * @return this note with another winding; checked together, as the three must agree
     */
    public Note withWinding(OptionalDouble newWoundLength, OptionalDouble newBareFront, OptionalDouble newBareBack) {
        return edited(e -> {
            e.woundLength = newWoundLength;
            e.bareFront = newBareFront;
            e.bareBack = newBareBack;
        });
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
        private OptionalDouble strikePoint;
        private OptionalDouble stretchedLength;
        private OptionalDouble woundLength;
        private String section;
        private String remark;
        private OptionalDouble bareFront;
        private OptionalDouble bareBack;
        private OptionalDouble backLength;

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
            bareFront = n.bareFront;
            bareBack = n.bareBack;
            backLength = n.backLength;
        }

        Note note() {
            return new Note(key, strings, speakingLength, wire, wrap, pitchHz, cents, strikePoint,
                    stretchedLength, woundLength, section, remark, bareFront, bareBack, backLength);
        }
    }
}
