package org.scalewright.app.table;

import java.util.Locale;
import java.util.stream.Collectors;
import org.scalewright.app.session.DisplayFormat;
import org.scalewright.model.DisplayUnits;
import org.scalewright.model.Note;
import org.scalewright.physics.Flag;
import org.scalewright.physics.NoteResult;

/**
 * The columns of the note table: what each shows in the display units and whether it can be
 * edited. Entries are parsed by {@link NoteEdits}.
 */
public enum NoteColumn {
    KEY("key", Group.IDENTITY),
    NOTE("note", Group.IDENTITY),
    SECTION("section", Group.SPEC),
    STRINGS("strings", Group.SPEC),
    LENGTH("length", Group.SPEC),
    WIRE("wire", Group.SPEC),
    WRAP1("wrap 1", Group.SPEC),
    WRAP2("wrap 2", Group.SPEC),
    OD("OD", Group.SPEC),
    OD1("OD1", Group.SPEC),
    METAL("wrap metal", Group.SPEC),
    STRETCHED("stretched", Group.SPEC),
    BACK("back", Group.SPEC),
    WOUND("wound", Group.SPEC),
    BARE_FRONT("bare front", Group.SPEC),
    BARE_BACK("bare back", Group.SPEC),
    STRIKE("strike", Group.SPEC),
    PITCH("pitch", Group.COMPUTED),
    TENSION("T/string", Group.COMPUTED),
    NOTE_TENSION("T/note", Group.COMPUTED),
    STRESS("stress", Group.COMPUTED),
    BREAK_PCT("% break", Group.COMPUTED),
    INHARMONICITY("B", Group.COMPUTED),
    HEADROOM("headroom", Group.COMPUTED),
    FLAGS("flags", Group.COMPUTED),
    DIFF_TENSION("ΔT/string", Group.DIFFERENCE),
    DIFF_BREAK("Δ % break", Group.DIFFERENCE),
    DIFF_B("ΔB %", Group.DIFFERENCE),
    REMARK("remark", Group.SPEC);

    /**
     * Which part of the table a column belongs to: what names the note (read only), its string
     * specification (edited), what the engine computes, and the differences to the reference.
     */
    enum Group { IDENTITY, SPEC, COMPUTED, DIFFERENCE }

    private final String name;
    private final Group group;

    NoteColumn(String name, Group group) {
        this.name = name;
        this.group = group;
    }

    /** @return the column's name in plain words, without unit ({@code speaking length}, {@code wire}) */
    String word() {
        return switch (this) {
            case LENGTH -> "speaking length";
            case OD -> "outside diameter";
            case OD1 -> "diameter over the first layer";
            case STRETCHED -> "stretched length";
            case BACK -> "back length";
            case WOUND -> "wound length";
            case BARE_FRONT -> "bare core at the front";
            case BARE_BACK -> "bare core at the back";
            case STRIKE -> "strike point";
            default -> name;
        };
    }

    /**
     * @return true for the columns hidden until chosen in the table's column menu (the remark and
     *         the lengths measured for the string maker); the choice is remembered between starts
     */
    public boolean shownWhenChosen() {
        return switch (this) {
            case REMARK, STRETCHED, BACK, WOUND, BARE_FRONT, BARE_BACK, STRIKE -> true;
            default -> false;
        };
    }

    /** @return the column's name in the settings: {@code bare-front} */
    public String settingName() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /** @return true for the string specification, which the user edits */
    boolean editable() {
        return group == Group.SPEC;
    }

    /** @return true for a column whose entries are numbers (a pasted decimal comma is read there) */
    boolean takesNumbers() {
        return this != SECTION && this != REMARK && this != METAL && this != NOTE && this != FLAGS;
    }

    Group group() {
        return group;
    }

    /** @return the column name with its unit in the display units, on one line ({@code length mm}) */
    public String header(DisplayUnits u) {
        return headerLines(u).replace('\n', ' ');
    }

    /** @return the column header for the table, name and unit on two lines */
    String headerLines(DisplayUnits u) {
        return switch (this) {
            case LENGTH -> "length\n" + u.length().symbol();
            case WIRE -> "wire\n# or " + u.length().symbol();
            case WRAP1 -> "wrap 1\n" + u.length().symbol();
            case WRAP2 -> "wrap 2\n" + u.length().symbol();
            case OD -> "OD\n" + u.length().symbol();
            case OD1 -> "OD1\n" + u.length().symbol();
            case METAL -> "wrap\nmetal";
            case STRETCHED, BACK, WOUND, BARE_FRONT, BARE_BACK, STRIKE -> name + "\n" + u.length().symbol();
            case PITCH -> "pitch\nHz";
            case TENSION -> "T/string\n" + u.force().symbol();
            case NOTE_TENSION -> "T/note\n" + u.force().symbol();
            case STRESS -> "stress\n" + DisplayFormat.stressUnit(u);
            case BREAK_PCT -> "% of\nbreak";
            case INHARMONICITY -> "B\n";
            case HEADROOM -> "headroom\ncents";
            case DIFF_TENSION -> "ΔT/string\n" + u.force().symbol();
            case DIFF_BREAK -> "Δ % of\nbreak";
            case DIFF_B -> "ΔB\n%";
            default -> name + "\n";
        };
    }

    /**
     * @param headerLines the two-line header in the display units
     * @return the name in the table's column chooser: the plain words and the unit ({@code speaking length, mm})
     */
    String chooserName(String headerLines) {
        String[] parts = headerLines.split("\n", 2);
        String unit = parts.length > 1 ? parts[1].trim() : "";
        String words = switch (this) {
            case WIRE, METAL, BREAK_PCT, DIFF_BREAK -> headerLines.replace('\n', ' ').trim();
            case INHARMONICITY -> "inharmonicity B";
            case DIFF_B -> "ΔB, %";
            default -> word();
        };
        return unit.isEmpty() || words.endsWith(unit) || this == WIRE || this == DIFF_B ? words : words + ", " + unit;
    }

    /** @return a one-line explanation for the column header's tooltip */
    String explanation() {
        return switch (this) {
            case KEY -> "key number, A0 = 1, A4 = 49, C8 = 88";
            case NOTE -> "note name";
            case SECTION -> "section label; a change of label marks a boundary";
            case STRINGS -> "strings per note: 1, 2 or 3";
            case LENGTH -> "speaking length";
            case WIRE -> "plain wire or core: a music-wire size number (12 to 23, half sizes) or a diameter";
            case WRAP1 -> "first (inner) wrap wire diameter; blank for plain wire";
            case WRAP2 -> "second (outer) wrap wire diameter; blank for single-wound";
            case OD -> "outside diameter of a wound string, as a micrometer measures it; entering it works out "
                    + "the outer wrap from the core (and OD1)";
            case OD1 -> "diameter over the first layer of a double-wound string; entering it works out both wraps "
                    + "from the core and the OD";
            case METAL -> "wrap metal: copper, iron or steel";
            case STRETCHED -> "stretched length, hitch pin to tuning pin; used for the elongation of a pitch raise";
            case BACK -> "back length, bridge pin to hitch pin; the wound-string order's winding start is measured from it";
            case WOUND -> "wound length inside the speaking length, for the wound-string order; with both bare ends "
                    + "given, a new wound length changes the bare core at the back";
            case BARE_FRONT -> "bare core of a wound string between the front termination and the winding; with "
                    + "the wound length and the other end given, the wound length follows";
            case BARE_BACK -> "bare core of a wound string between the winding and the bridge pin; with the wound "
                    + "length and the other end given, the wound length follows";
            case STRIKE -> "strike point, from the front termination";
            case PITCH -> "working pitch";
            case TENSION -> "tension per string";
            case NOTE_TENSION -> "tension of all strings of the note";
            case STRESS -> "stress in the plain wire or core";
            case BREAK_PCT -> "stress as percent of the wire's breaking strength";
            case INHARMONICITY -> "inharmonicity coefficient B";
            case HEADROOM -> "cents above the working pitch at which the wire reaches its breaking strength";
            case FLAGS -> "why the note is flagged";
            case DIFF_TENSION -> "tension per string minus the reference scale's";
            case DIFF_BREAK -> "percent of breaking strength minus the reference scale's, in points";
            case DIFF_B -> "inharmonicity relative to the reference scale's, percent";
            case REMARK -> "free text";
        };
    }

    /** @return the cell text of a row in the display units */
    public String text(NoteRow row, DisplayUnits u) {
        Note n = row.note();
        NoteResult r = row.result();
        NoteResult ref = row.reference();
        return switch (this) {
            case KEY -> Integer.toString(n.key());
            case NOTE -> r.noteName();
            case SECTION -> n.section();
            case STRINGS -> Integer.toString(n.strings());
            case LENGTH -> DisplayFormat.length(n.speakingLength(), u);
            case WIRE -> n.wire().musicWireSize().isPresent() ? DisplayFormat.size(n.wire().musicWireSize().getAsDouble())
                    : DisplayFormat.diameter(n.wire().diameter(), u);
            case WRAP1 -> n.isWound() ? DisplayFormat.diameter(n.wrap().inner(), u) : "";
            case WRAP2 -> n.isWound() && n.wrap().isDouble() ? DisplayFormat.diameter(n.wrap().outer(), u) : "";
            case OD -> n.isWound() ? DisplayFormat.diameter(n.outsideDiameter(), u) : "";
            case OD1 -> n.isWound() && n.wrap().isDouble()
                    ? DisplayFormat.diameter(n.wrap().firstLayerDiameter(n.wire().diameter()), u) : "";
            case METAL -> n.isWound() ? n.wrap().metal().sheetName() : "";
            case STRETCHED -> optionalLength(n.stretchedLength(), u);
            case BACK -> optionalLength(n.backLength(), u);
            case WOUND -> optionalLength(n.woundLength(), u);
            case BARE_FRONT -> optionalLength(n.bareFront(), u);
            case BARE_BACK -> optionalLength(n.bareBack(), u);
            case STRIKE -> optionalLength(n.strikePoint(), u);
            case PITCH -> DisplayFormat.fixed(r.frequency(), 2);
            case TENSION -> DisplayFormat.force(r.tension(), u);
            case NOTE_TENSION -> DisplayFormat.force(r.noteTension(), u);
            case STRESS -> DisplayFormat.stress(r.stress(), u);
            case BREAK_PCT -> DisplayFormat.fixed(r.breakPct(), 1);
            case INHARMONICITY -> DisplayFormat.scientific(r.inharmonicity());
            case HEADROOM -> DisplayFormat.fixed(r.headroomCents(), 0);
            case FLAGS -> r.flags().stream().map(f -> f.kind().word()).distinct().collect(Collectors.joining(", "));
            case DIFF_TENSION -> ref == null ? "" : DisplayFormat.forceDifference(r.tension() - ref.tension(), u);
            case DIFF_BREAK -> ref == null ? "" : String.format(Locale.ROOT, "%+.1f", r.breakPct() - ref.breakPct());
            case DIFF_B -> ref == null ? "" : String.format(Locale.ROOT, "%+.1f",
                    100 * (r.inharmonicity() / ref.inharmonicity() - 1));
            case REMARK -> n.remark();
        };
    }

    private static String optionalLength(java.util.OptionalDouble metres, DisplayUnits u) {
        return metres.isPresent() ? DisplayFormat.length(metres.getAsDouble(), u) : "";
    }

    /** @return the hover text of a row's flags, one per line, or "" */
    static String flagDetails(NoteRow row) {
        return row.result().flags().stream().map(NoteColumn::flagLine).collect(Collectors.joining("\n"));
    }

    private static String flagLine(Flag f) {
        return f.kind().word() + ": " + f.detail();
    }
}
