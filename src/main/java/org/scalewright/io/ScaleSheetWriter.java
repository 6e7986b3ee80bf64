package org.scalewright.io;

import com.opencsv.CSVWriter;
import com.opencsv.ICSVWriter;
import java.io.IOException;
import java.io.StringWriter;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.DoubleUnaryOperator;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.Note;
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
        if (!scale.title().isEmpty()) {
            out.write("# title: " + scale.title().replace('\n', ' ') + "\n");
        }
        out.write("# a4_hz: " + exact(scale.pitch().a4(), x -> x) + "\n");
        for (String c : layout.comments()) {
            out.write("# " + c.replace('\n', ' ').replace('\r', ' ') + "\n");
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
                    cells.add(cell(n, c, layout));
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
                l = l.with(SheetColumn.WRAP1);
                if (n.wrap().isDouble()) {
                    l = l.with(SheetColumn.WRAP2);
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
            case WIRE_SIZE -> n.wire().musicWireSize().isPresent() ? CsvCells.number(n.wire().musicWireSize().getAsDouble()) : "";
            case WIRE_DIAMETER -> n.wire().musicWireSize().isPresent() && layout.has(SheetColumn.WIRE_SIZE) ? ""
                    : length(n.wire().diameter(), c, layout);
            case WRAP1 -> n.isWound() ? length(n.wrap().inner(), c, layout) : "";
            case WRAP2 -> n.isWound() && n.wrap().isDouble() ? length(n.wrap().outer(), c, layout) : "";
            case WRAP_METAL -> n.isWound() ? n.wrap().metal().sheetName() : "";
            case PITCH_HZ -> n.pitchHz().isPresent() ? exact(n.pitchHz().getAsDouble(), x -> x) : "";
            case CENTS -> n.cents() == 0 ? "" : exact(n.cents(), x -> x);
            case STRIKE -> optionalLength(n.strikePoint(), c, layout);
            case TOTAL_LENGTH -> optionalLength(n.stretchedLength(), c, layout);
            case WINDING_LENGTH -> optionalLength(n.woundLength(), c, layout);
            case SECTION -> CsvCells.safeText(oneLine(n.section()));
            case REMARK -> CsvCells.safeText(oneLine(n.remark()));
        };
    }

    /** A sheet row is one line (the reader reads line by line): line breaks in free text become spaces. */
    private static String oneLine(String text) {
        return text.replace("\r\n", " ").replace('\n', ' ').replace('\r', ' ');
    }

    private static String length(double metres, SheetColumn c, SheetLayout layout) {
        LengthUnit unit = layout.unitOf(c);
        return exact(metres, unit::toMetres, unit.fromMetres(metres));
    }

    private static String exact(double value, DoubleUnaryOperator readBack) {
        return exact(value, readBack, value);
    }

    /**
     * @return the shortest decimal for {@code shown} with 10 to 17 significant digits that the reader
     *         turns back into exactly {@code value} ({@code readBack} of the parsed text), so that
     *         read → write → read keeps every value as it was, not only the first 10 digits
     */
    private static String exact(double value, DoubleUnaryOperator readBack, double shown) {
        String text = CsvCells.number(shown);
        for (int digits = 11; digits <= 17 && readBack.applyAsDouble(Double.parseDouble(text)) != value; digits++) {
            text = new BigDecimal(shown).round(new MathContext(digits)).stripTrailingZeros().toPlainString();
        }
        return text;
    }

    private static String optionalLength(OptionalDouble v, SheetColumn c, SheetLayout layout) {
        return v.isPresent() ? length(v.getAsDouble(), c, layout) : "";
    }

}
