package org.scalewright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import org.scalewright.model.CoreWire;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.KeyNames;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.Note;
import org.scalewright.model.NumberText;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.model.SheetColumn;
import org.scalewright.model.WireSize;
import org.scalewright.model.WireNotation;
import org.scalewright.model.WireSizeTable;
import org.scalewright.model.WindingFit;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;

/**
 * Reads a scale sheet (DESIGN §4). Every problem is collected with its file, line and column;
 * when there is any, nothing is returned (no half-loaded scale).
 */
public final class ScaleSheetReader {
    /**
     * The shortest length or thinnest diameter a sheet may give, m (0.001 mm, the step a
     * diameter is written in; anything smaller would be written back as 0).
     */
    public static final double SMALLEST_LENGTH = 1e-6;
    /** The longest length or thickest diameter a sheet may give, m (10 m, beyond any piano). */
    public static final double LARGEST_LENGTH = 10;
    /** The lowest {@code pitch_hz} a sheet may give, Hz. */
    public static final double LOWEST_PITCH_HZ = 1;
    /** The highest {@code pitch_hz} a sheet may give, Hz (the top of hearing). */
    public static final double HIGHEST_PITCH_HZ = 20_000;
    /** The most {@code cents} a note may be moved from its equal-tempered pitch, either way (an octave). */
    public static final double MAX_CENTS = 1200;

    private final WireSizeTable sizes;

    /** @param sizes the music-wire sizes a {@code wire} cell may name */
    public ScaleSheetReader(WireSizeTable sizes) {
        this.sizes = sizes;
    }

    /** A reader with the built-in music-wire sizes. */
    public static ScaleSheetReader standard() {
        return new ScaleSheetReader(BuiltInData.musicWireSizes());
    }

    /**
     * @param file a scale sheet: CSV (delimiter, encoding and decimal mark as DESIGN §4 allows) or .xlsx
     * @return the scale, with the sheet's layout kept for writing back
     * @throws BadInputException listing every problem (file, line, column, what was expected)
     */
    public Scale read(Path file) throws BadInputException {
        return parse(file, CsvTable.read(file, CsvTable.RowLimit.KEYS));
    }

    /** Reads a sheet from bytes already in memory; {@code file} names it in messages. */
    public Scale read(Path file, byte[] content) throws BadInputException {
        return parse(file, CsvTable.parse(file, content, CsvTable.RowLimit.KEYS));
    }

    private Scale parse(Path file, CsvTable table) throws BadInputException {
        List<SheetProblem> problems = new ArrayList<>();
        PitchStandard pitch = PitchStandard.ISO_16;
        String a4 = table.commentValue("a4_hz");
        if (a4 != null) {
            try {
                pitch = PitchStandard.of(Double.parseDouble(a4));
            } catch (NumberFormatException e) {
                problems.add(new SheetProblem(file, table.commentLine("a4_hz"), "", "the '# a4_hz:' comment must give "
                        + "a frequency in Hz, was '" + a4 + "'"));
            } catch (InvalidInput e) {
                problems.add(new SheetProblem(file, table.commentLine("a4_hz"), "", "the '# a4_hz:' comment: "
                        + e.getMessage()));
            }
        }
        String title = table.commentValue("title");
        SheetHeader header = SheetHeader.parse(file, table.header(), table.headerLine(), problems);
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        if (table.rows().isEmpty()) {
            throw new BadInputException(List.of(new SheetProblem(file, table.headerLine(), "",
                    "the sheet has a header but no notes")));
        }
        List<Note> notes = new ArrayList<>();
        Map<Integer, Integer> keyLines = new HashMap<>();
        Map<SheetColumn, Integer> decimals = new EnumMap<>(SheetColumn.class);
        for (CsvTable.Row row : table.rows()) {
            Note n = new RowReader(file, header, row, sizes, problems, decimals).note();
            if (n != null) {
                Integer earlier = keyLines.putIfAbsent(n.key(), row.line());
                if (earlier != null) {
                    problems.add(new SheetProblem(file, row.line(), header.name(SheetColumn.KEY),
                            "key " + n.key() + " appears twice (first on line " + earlier + ")"));
                } else {
                    notes.add(n);
                }
            }
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        List<String> freeComments = table.comments().stream()
                .filter(c -> !isSetting(c, "title") && !isSetting(c, "a4_hz")).toList();
        return new Scale(title == null ? "" : title, pitch, notes, header.layout().withComments(freeComments)
                .withDecimals(decimals).withLines(keyLines));
    }

    private static boolean isSetting(String comment, String name) {
        int colon = comment.indexOf(':');
        return colon > 0 && comment.substring(0, colon).strip().equalsIgnoreCase(name);
    }

    /** Reads one row; adds its problems and returns null when it has any. */
    private static final class RowReader {
        private final Path file;
        private final SheetHeader header;
        private final CsvTable.Row row;
        private final WireSizeTable sizes;
        private final List<SheetProblem> problems;
        private final int before;
        private final Map<SheetColumn, Integer> decimals;

        RowReader(Path file, SheetHeader header, CsvTable.Row row, WireSizeTable sizes, List<SheetProblem> problems,
                  Map<SheetColumn, Integer> decimals) {
            this.decimals = decimals;
            this.file = file;
            this.header = header;
            this.row = row;
            this.sizes = sizes;
            this.problems = problems;
            this.before = problems.size();
        }

        Note note() {
            if (row.cells().size() > header.width()) {
                problem("", "the row has " + row.cells().size() + " cells but the header has " + header.width()
                        + " columns");
                return null;
            }
            Integer key = key();
            Integer strings = integer(SheetColumn.STRINGS, true);
            if (strings != null && (strings < 1 || strings > 3)) {
                problem(SheetColumn.STRINGS, "strings per note must be 1, 2 or 3, was " + strings);
            }
            Double length = length(SheetColumn.SPEAKING_LENGTH, true);
            CoreWire wire = wire();
            Wrap wrap = wrap(wire);
            Double pitchHz = within(SheetColumn.PITCH_HZ, LOWEST_PITCH_HZ, HIGHEST_PITCH_HZ, "Hz");
            Double cents = within(SheetColumn.CENTS, -MAX_CENTS, MAX_CENTS, "cents");
            if (pitchHz != null && cents != null) {
                problem(SheetColumn.CENTS, "give either " + header.name(SheetColumn.PITCH_HZ) + " (the pitch as "
                        + "measured) or " + header.name(SheetColumn.CENTS) + " (an offset from the equal-tempered "
                        + "pitch) on a row, not both");
            }
            Double strike = length(SheetColumn.STRIKE, false);
            Double total = length(SheetColumn.TOTAL_LENGTH, false);
            Double winding = length(SheetColumn.WINDING_LENGTH, false);
            Double front = bare(SheetColumn.BARE_FRONT);
            Double back = bare(SheetColumn.BARE_BACK);
            Double backLength = length(SheetColumn.BACK_LENGTH, false);
            if (length != null && !Note.backLengthFits(opt(backLength), length, opt(total))) {
                problem(SheetColumn.BACK_LENGTH, "the back length " + withUnit(SheetColumn.BACK_LENGTH) + " and the "
                        + "speaking length " + withUnit(SheetColumn.SPEAKING_LENGTH) + " leave nothing of the stretched "
                        + "length " + withUnit(SheetColumn.TOTAL_LENGTH) + " (" + header.name(SheetColumn.TOTAL_LENGTH)
                        + ", hitch pin to tuning pin) for the front length to the tuning pin");
            }
            if (problems.size() > before) {
                return null;
            }
            if (!bareEndsAgree(wrap, length, winding, front, back)) {
                return null;
            }
            try {
                return new Note(key, strings, length, wire, wrap, opt(pitchHz), cents == null ? 0 : cents,
                        opt(strike), opt(total), opt(winding), text(SheetColumn.SECTION), text(SheetColumn.REMARK),
                        opt(front), opt(back), opt(backLength));
            } catch (IllegalArgumentException e) {
                problem("", e.getMessage());
                return null;
            }
        }

        private CoreWire wire() {
            String size = cell(SheetColumn.WIRE_SIZE);
            String diam = cell(SheetColumn.WIRE_DIAMETER);
            if (!size.isEmpty() && !diam.isEmpty()) {
                problem(SheetColumn.WIRE_DIAMETER, "give the wire either as a size number (wire) or as a diameter ("
                        + header.name(SheetColumn.WIRE_DIAMETER) + "), not both");
                return null;
            }
            if (size.isEmpty() && diam.isEmpty()) {
                problem("wire", "the wire is missing; give a size number (wire) or a diameter (wire_mm or wire_in)");
                return null;
            }
            if (!size.isEmpty()) {
                Double s = number(SheetColumn.WIRE_SIZE, true, false);
                if (s == null) {
                    return null;
                }
                var found = sizes.bySize(s);
                if (found.isEmpty()) {
                    problem(SheetColumn.WIRE_SIZE, "wire size " + size + " is not in the music-wire size table ("
                            + sizes.rangeText() + " in half steps); give a diameter in wire_mm or wire_in instead");
                    return null;
                }
                WireSize w = found.get();
                return CoreWire.ofSize(w.size(), w.diameter());
            }
            Double d = length(SheetColumn.WIRE_DIAMETER, true);
            return d == null ? null : CoreWire.ofDiameter(d);
        }

        /**
         * The winding, given one way or the other: by its wrap wires ({@code wrap1}, {@code wrap2}),
         * or by what a micrometer measures on the string ({@code od}, and {@code od1} over the first
         * layer of a double-wound string), the wraps then following from the core.
         */
        private Wrap wrap(CoreWire wire) {
            Double w1 = length(SheetColumn.WRAP1, false);
            Double w2 = length(SheetColumn.WRAP2, false);
            Double od = length(SheetColumn.OD, false);
            Double od1 = length(SheetColumn.OD1, false);
            String metalText = cell(SheetColumn.WRAP_METAL);
            WrapMetal metal = WrapMetal.COPPER;
            if (!metalText.isEmpty()) {
                metal = WrapMetal.parse(metalText);
                if (metal == null) {
                    problem(SheetColumn.WRAP_METAL, "wrap metal must be copper, iron or steel, was '" + metalText + "'");
                    return null;
                }
            }
            if (w2 != null && w1 == null) {
                problem(SheetColumn.WRAP2, "a second wrap needs a first wrap (" + header.name(SheetColumn.WRAP1) + ")");
                return null;
            }
            boolean byWraps = !cell(SheetColumn.WRAP1).isEmpty() || !cell(SheetColumn.WRAP2).isEmpty();
            boolean byOd = !cell(SheetColumn.OD).isEmpty() || !cell(SheetColumn.OD1).isEmpty();
            if (byWraps && byOd) {
                problem(cell(SheetColumn.OD).isEmpty() ? SheetColumn.OD1 : SheetColumn.OD, "give the winding either by "
                        + "its wrap wires (" + header.name(SheetColumn.WRAP1) + ") or by its outside diameter ("
                        + header.name(SheetColumn.OD) + "), not both on one row");
                return null;
            }
            if (od1 != null && od == null) {
                problem(SheetColumn.OD1, "a diameter over the first layer needs the outside diameter ("
                        + header.name(SheetColumn.OD) + ") on the same row");
                return null;
            }
            if (od != null) {
                return wrapFromOd(wire, od, od1, metal);
            }
            if (w1 == null || problems.size() > before) {
                return null;
            }
            return new Wrap(w1, w2 == null ? 0 : w2, metal);
        }

        /** single wound w1 = (OD − d)/2; double wound w1 = (OD1 − d)/2, w2 = (OD − OD1)/2 (DESIGN §3) */
        private Wrap wrapFromOd(CoreWire wire, double od, Double od1, WrapMetal metal) {
            if (wire == null) {
                if (cell(SheetColumn.WIRE_SIZE).isEmpty() && cell(SheetColumn.WIRE_DIAMETER).isEmpty()) {
                    problem(SheetColumn.OD, "an outside diameter needs the core it is wound on: give the core in "
                            + "wire (size number) or as a diameter (wire_mm or wire_in)");
                }
                return null;
            }
            double d = wire.diameter();
            if (!(od > d)) {
                problem(SheetColumn.OD, "the outside diameter " + cell(SheetColumn.OD) + " " + unitOf(SheetColumn.OD)
                        + " must be larger than the core, " + shown(d, SheetColumn.OD));
                return null;
            }
            if (od1 != null && !(od1 > d && od1 < od)) {
                problem(SheetColumn.OD1, "the diameter over the first layer " + cell(SheetColumn.OD1) + " "
                        + unitOf(SheetColumn.OD1) + " must lie between the core, " + shown(d, SheetColumn.OD1)
                        + ", and the outside diameter, " + shown(od, SheetColumn.OD1));
                return null;
            }
            if (problems.size() > before) {
                return null;
            }
            return Wrap.fromOd(d, od1 == null ? 0 : od1, od, metal);
        }

        private String unitOf(SheetColumn c) {
            return header.unit(c).symbol();
        }

        /** @return a diameter (m) in the unit of column {@code c}, with the unit */
        private String shown(double metres, SheetColumn c) {
            return WireNotation.diameter(metres, header.unit(c)) + " " + unitOf(c);
        }

        /**
         * Checks the bare ends against the rest of the row: they belong to a wound string; one
         * alone needs the wound length; together they fit in the speaking length; with the wound
         * length they add up to the speaking length within {@link Note#WINDING_TOLERANCE}.
         *
         * @return true when they agree (or none is given)
         */
        private boolean bareEndsAgree(Wrap wrap, double length, Double winding, Double front, Double back) {
            WindingFit fit = WindingFit.of(wrap != null, length, opt(winding), opt(front), opt(back));
            SheetColumn given = front != null ? SheetColumn.BARE_FRONT : SheetColumn.BARE_BACK;
            double sum = (front == null ? 0 : front) + (back == null ? 0 : back);
            switch (fit) {
                case FITS -> {
                    return true;
                }
                case BARE_ON_PLAIN_WIRE -> problem(given, "bare core at the ends belongs to a wound string; this row "
                        + "has no winding (give " + header.name(SheetColumn.WRAP1) + " or " + header.name(SheetColumn.OD)
                        + ")");
                case BARE_LONGER_THAN_SPEAKING -> problem(given, "bare core at the ends, " + lengthText(sum,
                        header.unit(given)) + " together, is longer than the speaking length, " + lengthText(length,
                        header.unit(given)));
                case ONE_END_WITHOUT_WINDING -> problem(given, "give both " + header.name(SheetColumn.BARE_FRONT)
                        + " and " + header.name(SheetColumn.BARE_BACK) + ", or one of them with the wound length ("
                        + header.name(SheetColumn.WINDING_LENGTH) + ")");
                case WINDING_AND_END_TOO_LONG -> problem(SheetColumn.WINDING_LENGTH, "the winding "
                        + cell(SheetColumn.WINDING_LENGTH) + " " + unitOf(SheetColumn.WINDING_LENGTH)
                        + " and the bare core " + cell(given) + " " + unitOf(given)
                        + " are longer than the speaking length together");
                case DO_NOT_ADD_UP -> problem(SheetColumn.WINDING_LENGTH, "winding + bare core at the front + at the "
                        + "back must add up to the speaking length within " + lengthText(Note.WINDING_TOLERANCE,
                        LengthUnit.MM) + ": " + cell(SheetColumn.WINDING_LENGTH) + " + " + cell(SheetColumn.BARE_FRONT)
                        + " + " + cell(SheetColumn.BARE_BACK) + " is " + lengthText(winding + sum,
                        header.unit(SheetColumn.WINDING_LENGTH)) + ", the speaking length "
                        + lengthText(length, header.unit(SheetColumn.WINDING_LENGTH)));
            }
            return false;
        }

        /** @return a bare end in metres: 0 (winding right to the termination) or a length as {@link #length} */
        private Double bare(SheetColumn c) {
            Double v = number(c, false, false);
            if (v == null) {
                return null;
            }
            if (v == 0) {
                return 0.0;
            }
            if (v < 0) {
                problem(c, "must be 0 or more, was " + cell(c));
                return null;
            }
            return length(c, false);
        }

        private static OptionalDouble opt(Double v) {
            return v == null ? OptionalDouble.empty() : OptionalDouble.of(v);
        }

        /** @return a length cell as typed with its unit: {@code 700 mm} */
        private String withUnit(SheetColumn c) {
            return cell(c) + " " + unitOf(c);
        }

        private String cell(SheetColumn c) {
            int p = header.position(c);
            if (p < 0 || p >= row.cells().size()) {
                return "";
            }
            return row.cells().get(p);
        }

        /** Free text; a leading apostrophe the writer put before {@code = + - @} is taken off again. */
        private String text(SheetColumn c) {
            String t = cell(c);
            if (t.length() > 1 && t.charAt(0) == '\'' && "=+-@".indexOf(t.charAt(1)) >= 0) {
                return t.substring(1);
            }
            return t;
        }

        /** @return the key number, when it is a whole number from {@link KeyNames#LOWEST_KEY} to {@link KeyNames#HIGHEST_KEY} */
        private Integer key() {
            String t = cell(SheetColumn.KEY);
            if (t.isEmpty()) {
                problem(SheetColumn.KEY, "a value is required here (a whole number)");
                return null;
            }
            if (!t.matches("[+-]?\\d+")) {
                problem(SheetColumn.KEY, "expected a whole number, was '" + t + "'");
                return null;
            }
            // compared as digits first, so that a number past the int range is told as typed
            if (t.replaceFirst("^[+-]?0*", "").length() > 4 || !KeyNames.accepted(Integer.parseInt(t))) {
                problem(SheetColumn.KEY, KeyNames.outOfRange(t));
                return null;
            }
            return Integer.parseInt(t);
        }

        /** @return an optional number from {@code low} to {@code high}, in {@code unit} */
        private Double within(SheetColumn c, double low, double high, String unit) {
            Double v = number(c, false, false);
            if (v != null && (v < low || v > high)) {
                problem(c, "must be " + NumberText.plain(low) + " to " + NumberText.plain(high) + " " + unit
                        + ", was " + cell(c));
                return null;
            }
            return v;
        }

        private Integer integer(SheetColumn c, boolean required) {
            String t = cell(c);
            if (t.isEmpty()) {
                if (required) {
                    problem(c, "a value is required here (a whole number)");
                }
                return null;
            }
            try {
                return Integer.parseInt(t);
            } catch (NumberFormatException e) {
                problem(c, "expected a whole number, was '" + t + "'");
                return null;
            }
        }

        private Double number(SheetColumn c, boolean required, boolean positive) {
            String t = cell(c);
            if (t.isEmpty()) {
                if (required) {
                    problem(c, "a value is required here (a number)");
                }
                return null;
            }
            if (!CsvTable.isDecimal(t)) {
                problem(c, "expected a number, was '" + t + "'");
                return null;
            }
            double v = Double.parseDouble(t);
            if (!Double.isFinite(v)) {
                problem(c, "expected a finite number, was '" + t + "'");
                return null;
            }
            if (positive && !(v > 0)) {
                problem(c, "must be greater than 0, was " + t);
                return null;
            }
            decimals.merge(c, decimalsTyped(t), Math::min);
            return v;
        }

        /** @return the decimals of a typed number: {@code 0.30} → 2, {@code 1480} and {@code 1e-3} → 0 */
        private static int decimalsTyped(String t) {
            int dot = t.indexOf('.');
            if (dot < 0 || t.indexOf('e') >= 0 || t.indexOf('E') >= 0) {
                return 0;
            }
            return t.length() - dot - 1;
        }

        /** @return the length in metres */
        private Double length(SheetColumn c, boolean required) {
            Double v = number(c, required, true);
            if (v == null) {
                return null;
            }
            LengthUnit u = header.unit(c);
            double metres = u.toMetres(v);
            if (!(metres >= SMALLEST_LENGTH && metres <= LARGEST_LENGTH)) {
                problem(c, "must be " + lengthText(SMALLEST_LENGTH, u) + " to " + lengthText(LARGEST_LENGTH, u)
                        + ", was " + cell(c) + " " + u.symbol());
                return null;
            }
            return metres;
        }

        private static String lengthText(double metres, LengthUnit u) {
            return NumberText.significant(u.fromMetres(metres), 3) + " " + u.symbol();
        }

        private void problem(SheetColumn c, String message) {
            problem(header.name(c), message);
        }

        private void problem(String column, String message) {
            problems.add(new SheetProblem(file, row.line(), column, message));
        }
    }
}
