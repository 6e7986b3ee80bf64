package org.scalewright.io;

import com.opencsv.CSVWriter;
import com.opencsv.ICSVWriter;
import java.io.IOException;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.Note;
import org.scalewright.model.NumberText;
import org.scalewright.model.Scale;
import org.scalewright.model.SheetColumn;
import org.scalewright.model.SheetLayout;
import org.scalewright.model.WrapMetal;

/**
 * Writes a scale as a scale sheet (DESIGN §4), keeping the columns and units it was read with
 * and adding only the columns its notes need. Reading the written sheet gives an equal scale.
 */
public final class ScaleSheetWriter {
    private ScaleSheetWriter() {
    }

    /**
     * Writes atomically (temporary file, then move); a failure leaves {@code file} unchanged.
     *
     * @param keepBackup keep the previous file as {@code NAME.bak}
     */
    public static void write(Scale scale, Path file, boolean keepBackup) throws IOException {
        AtomicFiles.write(file, toText(scale).getBytes(StandardCharsets.UTF_8), keepBackup);
    }

    /** @return the sheet as text */
    public static String toText(Scale scale) {
        SheetLayout layout = layoutFor(scale);
        StringWriter out = new StringWriter();
        // title and comments are spreadsheet-safe single cells, as every CSV comment the program writes
        if (!scale.title().isEmpty()) {
            out.write(CommentLines.line("title: " + scale.title()) + "\n");
        }
        out.write(CommentLines.line("a4_hz: " + exact(scale.pitch().a4())) + "\n");
        for (String c : layout.comments()) {
            out.write(CommentLines.line(c) + "\n");
        }
        // quoting and quote doubling are done by quoteWhereNeeded alone; the CSVWriter must not escape again
        try (CSVWriter csv = new CSVWriter(out, ICSVWriter.DEFAULT_SEPARATOR, ICSVWriter.NO_QUOTE_CHARACTER,
                ICSVWriter.NO_ESCAPE_CHARACTER, "\n") {
            @Override
            public void writeNext(String[] line) {
                super.writeNext(quoteWhereNeeded(line), false);
            }
        }) {
            List<String> header = new ArrayList<>();
            for (SheetColumn c : layout.columns()) {
                header.add(c.isLength() ? c.header(layout.unitOf(c)) : c.stem());
            }
            csv.writeNext(header.toArray(String[]::new));
            for (Note n : scale.notes()) {
                List<String> cells = new ArrayList<>();
                for (SheetColumn c : layout.columns()) {
                    cells.add(c == SheetColumn.SECTION || c == SheetColumn.REMARK || c == SheetColumn.WRAP_METAL
                            ? cell(n, c, layout) : padded(cell(n, c, layout), layout.decimalsOf(c)));
                }
                csv.writeNext(cells.toArray(String[]::new));
            }
        } catch (IOException e) {
            throw new IllegalStateException("writing to memory failed", e);
        }
        return out.toString();
    }

    private static String[] quoteWhereNeeded(String[] line) {
        String[] q = new String[line.length];
        for (int i = 0; i < line.length; i++) {
            String s = line[i];
            q[i] = s.contains(",") || s.contains("\"") || s.contains("\n") || s.startsWith("#")
                    ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
        }
        return q;
    }

    /** @return the scale's layout with the columns its notes need added */
    static SheetLayout layoutFor(Scale scale) {
        SheetLayout l = scale.layout();
        for (SheetColumn required : List.of(SheetColumn.KEY, SheetColumn.STRINGS, SheetColumn.SPEAKING_LENGTH)) {
            l = l.with(required);
        }
        for (Note n : scale.notes()) {
            if (!(n.wire().musicWireSize().isPresent() && l.has(SheetColumn.WIRE_SIZE))) {
                l = l.with(SheetColumn.WIRE_DIAMETER);
            }
            if (n.isWound()) {
                // a wrap keeps the form it was given in: by its wires, or by the outside diameter(s)
                SheetColumn first = n.wrap().givenByOd() ? SheetColumn.OD : SheetColumn.WRAP1;
                l = l.with(first);
                if (n.wrap().isDouble()) {
                    l = l.with(n.wrap().givenByOd() ? SheetColumn.OD1 : SheetColumn.WRAP2);
                }
                // copper is what a blank or missing wrap_metal means: add the column only for other metals
                if (n.wrap().metal() != WrapMetal.COPPER) {
                    l = l.with(SheetColumn.WRAP_METAL);
                }
            }
            l = n.pitchHz().isPresent() ? l.with(SheetColumn.PITCH_HZ) : l;
            l = n.cents() != 0 ? l.with(SheetColumn.CENTS) : l;
            l = n.strikePoint().isPresent() ? l.with(SheetColumn.STRIKE) : l;
            l = n.stretchedLength().isPresent() ? l.with(SheetColumn.TOTAL_LENGTH) : l;
            l = n.woundLength().isPresent() ? l.with(SheetColumn.WINDING_LENGTH) : l;
            l = n.bareFront().isPresent() ? l.with(SheetColumn.BARE_FRONT) : l;
            l = n.bareBack().isPresent() ? l.with(SheetColumn.BARE_BACK) : l;
            l = n.backLength().isPresent() ? l.with(SheetColumn.BACK_LENGTH) : l;
            l = n.section().isEmpty() ? l : l.with(SheetColumn.SECTION);
            l = n.remark().isEmpty() ? l : l.with(SheetColumn.REMARK);
        }
        return l;
    }

    private static String cell(Note n, SheetColumn c, SheetLayout layout) {
        return switch (c) {
            case KEY -> Integer.toString(n.key());
            case STRINGS -> Integer.toString(n.strings());
            case SPEAKING_LENGTH -> length(n.speakingLength(), c, layout);
            case WIRE_SIZE -> n.wire().musicWireSize().isPresent() ? NumberText.plain(n.wire().musicWireSize().getAsDouble()) : "";
            case WIRE_DIAMETER -> n.wire().musicWireSize().isPresent() && layout.has(SheetColumn.WIRE_SIZE) ? ""
                    : length(n.wire().diameter(), c, layout);
            case WRAP1 -> byWires(n) ? length(n.wrap().inner(), c, layout) : "";
            case WRAP2 -> byWires(n) && n.wrap().isDouble() ? length(n.wrap().outer(), c, layout) : "";
            case OD -> byOd(n) ? length(n.wrap().od(), c, layout) : "";
            case OD1 -> byOd(n) && n.wrap().isDouble() ? length(n.wrap().od1(), c, layout) : "";
            case WRAP_METAL -> n.isWound() ? n.wrap().metal().sheetName() : "";
            case PITCH_HZ -> n.pitchHz().isPresent() ? exact(n.pitchHz().getAsDouble()) : "";
            case CENTS -> n.cents() == 0 ? "" : exact(n.cents());
            case STRIKE -> optionalLength(n.strikePoint(), c, layout);
            case TOTAL_LENGTH -> optionalLength(n.stretchedLength(), c, layout);
            case WINDING_LENGTH -> optionalLength(n.woundLength(), c, layout);
            case BARE_FRONT -> optionalLength(n.bareFront(), c, layout);
            case BARE_BACK -> optionalLength(n.bareBack(), c, layout);
            case BACK_LENGTH -> optionalLength(n.backLength(), c, layout);
            case SECTION -> CsvCells.safeText(oneLine(n.section()));
            case REMARK -> CsvCells.safeText(oneLine(n.remark()));
        };
    }

    private static boolean byWires(Note n) {
        return n.isWound() && !n.wrap().givenByOd();
    }

    private static boolean byOd(Note n) {
        return n.isWound() && n.wrap().givenByOd();
    }

    /** @return a number with zeros added up to {@code decimals} decimals, as its column was typed ({@code 0.3} → {@code 0.30}) */
    static String padded(String number, int decimals) {
        if (number.isEmpty() || decimals == 0 || number.indexOf('E') >= 0 || number.indexOf('e') >= 0) {
            return number;
        }
        int dot = number.indexOf('.');
        int has = dot < 0 ? 0 : number.length() - dot - 1;
        if (has >= decimals) {
            return number;
        }
        return (dot < 0 ? number + "." : number) + "0".repeat(decimals - has);
    }

    /** A sheet row is one line (the reader reads line by line): line breaks in free text become spaces. */
    private static String oneLine(String text) {
        return text.replace("\r\n", " ").replace('\n', ' ').replace('\r', ' ');
    }

    private static String length(double metres, SheetColumn c, SheetLayout layout) {
        LengthUnit unit = layout.unitOf(c);
        boolean diameter = c == SheetColumn.WIRE_DIAMETER || c == SheetColumn.WRAP1 || c == SheetColumn.WRAP2
                || c == SheetColumn.OD || c == SheetColumn.OD1;
        return NumberText.sheetCell(metres, unit::toMetres, unit.fromMetres(metres), places(unit, diameter));
    }

    /**
     * The precision a computed value is written to (a typed value keeps its digits, {@link NumberText#sheetCell}):
     * a diameter to 0.001 mm, a length to 0.1 mm; in inches one digit more than 0.0001 in and 0.01 in, so
     * that a metric diameter or length written on an inch sheet reads back to the same 0.001 mm or 0.1 mm.
     */
    static int places(LengthUnit unit, boolean diameter) {
        if (unit == LengthUnit.MM) {
            return diameter ? 3 : 1;
        }
        return diameter ? 5 : 3;
    }

    /** @return a value with no catalogue precision (Hz, cents): as typed, else without arithmetic noise */
    private static String exact(double value) {
        return NumberText.sheetCellExact(value, x -> x, value);
    }

    private static String optionalLength(OptionalDouble v, SheetColumn c, SheetLayout layout) {
        return v.isPresent() ? length(v.getAsDouble(), c, layout) : "";
    }

}
