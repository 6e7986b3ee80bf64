package org.scalewright.report;

import org.scalewright.io.CsvSheet;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.scalewright.design.orders.ScheduleRow;
import org.scalewright.design.orders.WireOrder;
import org.scalewright.design.orders.WoundOrderRow;
import org.scalewright.design.stretch.StretchCurve;
import org.scalewright.design.stretch.StretchPoint;
import org.scalewright.design.stretch.TuningStretch;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.NumberText;
import org.scalewright.model.Scale;
import org.scalewright.model.UnitConversions;
import org.scalewright.model.WireNotation;
import org.scalewright.model.Wrap;
import org.scalewright.physics.Flag;
import org.scalewright.physics.FlagKind;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.SectionTotal;
import org.scalewright.report.PdfTable.Column;

/**
 * The PDF report of one instrument (Apache PDFBox): title page with pitch standard, strength
 * table, section totals and cautions; the curves; the flags; the string schedule; the
 * wound-string and plain-wire orders; the tuning stretch; the cautions and the sources of the
 * figures. On the content's paper: by default A4 for metric units, US Letter for imperial.
 */
public final class PdfReportWriter {
    private PdfReportWriter() {
    }

    /**
     * @param r what the report shows
     * @return the PDF file's bytes
     */
    public static byte[] toBytes(ReportDocument r) {
        try (PdfPages p = new PdfPages(r.paper().size(), r.title() + " - string scale report - Scalewright")) {
            p.info(r.title(), "Scalewright");
            titlePage(p, r);
            curves(p, r);
            flags(p, r);
            schedule(p, r);
            woundOrder(p, r);
            wireOrder(p, r);
            stretch(p, r);
            cautionsAndSources(p, r);
            return p.finish();
        } catch (IOException e) {
            throw new UncheckedIOException("the PDF report could not be laid out: " + e.getMessage(), e);
        }
    }

    private static void titlePage(PdfPages p, ReportDocument r) throws IOException {
        ScaleAnalysis a = r.analysis();
        Scale s = a.scale();
        p.newPage();
        p.title(r.title());
        p.paragraph("String scale report: tension, stress and inharmonicity of every string, the string schedule, "
                + "the orders for wound strings and plain wire, and the tuning stretch.");
        p.space(4);
        int first = s.notes().get(0).key();
        int last = s.notes().get(s.notes().size() - 1).key();
        p.field("Scale sheet", r.sheetName() + " - " + s.notes().size() + " keys (" + first + "-" + last + "), "
                + r.schedule().totalStrings() + " strings");
        p.field("Pitch standard", "A4 = " + Cells.size(s.pitch().a4()) + " Hz");
        p.field("Strength table", a.settings().strength().name() + " (percent of breaking strength against it; "
                + "sources at the end)");
        p.field("Stress bands", String.format(Locale.ROOT, "low below %.0f %%, caution from %.0f %%, danger from %.0f %%",
                a.settings().bands().low(), a.settings().bands().caution(), a.settings().bands().danger()));
        p.field("Units", r.units() == ReportUnits.IMPERIAL ? "imperial: inches (mm beside), lbf (N beside)"
                : "metric: millimetres, newtons");
        if (r.reference().isPresent()) {
            ReportContent.Reference ref = r.reference().get();
            String t = ref.analysis().scale().title();
            p.field("Reference scale", ref.sheetName() + (t.isEmpty() ? "" : " (" + t + ")") + ", total tension "
                    + kN(ref.analysis().totalTension()) + "; drawn grey beside the working scale on the curves");
        }
        p.space(6);
        p.subheading("Total tension by section");
        List<List<String>> rows = new ArrayList<>();
        for (SectionTotal t : a.sections()) {
            rows.add(List.of(t.section().isEmpty() ? "(none)" : t.section(), t.firstKey() + "-" + t.lastKey(),
                    Integer.toString(t.notes()), Integer.toString(t.strings()), NumberText.fixed(t.tension() / 1000, 1),
                    NumberText.grouped(UnitConversions.newtonsToLbf(t.tension())),
                    NumberText.fixed(100 * t.tension() / a.totalTension(), 1)));
        }
        int strings = a.sections().stream().mapToInt(SectionTotal::strings).sum();
        rows.add(List.of("whole instrument", first + "-" + last, Integer.toString(s.notes().size()),
                Integer.toString(strings), NumberText.fixed(a.totalTension() / 1000, 1),
                NumberText.grouped(UnitConversions.newtonsToLbf(a.totalTension())), "100.0"));
        p.table(new PdfTable(List.of(Column.text("section"), Column.text("keys"), Column.number("notes"),
                Column.number("strings"), Column.number("tension kN"), Column.number("tension lbf"),
                Column.number("share %")), rows, Set.of(rows.size() - 1)));
        p.subheading("Flags");
        p.paragraph(flagSummary(a));
        p.space(4);
        p.subheading("Cautions");
        for (String c : r.cautions()) {
            p.paragraph(c, 9.5f, true, 0);
        }
    }

    private static String flagSummary(ScaleAnalysis a) {
        if (a.flags().isEmpty()) {
            return "No note is flagged.";
        }
        Map<FlagKind, Integer> count = new EnumMap<>(FlagKind.class);
        for (Flag f : a.flags()) {
            count.merge(f.kind(), 1, Integer::sum);
        }
        String kinds = count.entrySet().stream().map(e -> e.getValue() + " " + e.getKey().word())
                .collect(Collectors.joining(", "));
        return a.flaggedNoteCount() + " of " + a.notes().size() + " notes flagged, " + a.dangerNoteCount()
                + " of them as danger (danger band, over breaking strength or an implausible value): " + kinds
                + ". Each is listed with its reason after the curves.";
    }

    private static void curves(PdfPages p, ReportDocument r) throws IOException {
        if (r.curves().isEmpty()) {
            return;
        }
        p.newPage();
        p.heading("Curves over the keyboard", 200);
        float each = (p.left() - 2 * 30) / 2;
        for (ReportChart f : r.curves()) {
            p.image(f.image(), f.caption(), Math.max(each, 250));
        }
    }

    private static void flags(PdfPages p, ReportDocument r) throws IOException {
        ScaleAnalysis a = r.analysis();
        p.heading("Flagged notes", 60);
        if (a.flags().isEmpty()) {
            p.paragraph("No note is flagged.");
            return;
        }
        List<List<String>> rows = new ArrayList<>();
        for (Flag f : a.flags()) {
            NoteResult n = a.result(f.key()).orElseThrow();
            rows.add(List.of(Integer.toString(f.key()), n.noteName(), n.section(), f.kind().word(), f.detail()));
        }
        p.table(new PdfTable(List.of(Column.number("key"), Column.text("note"), Column.text("section"),
                Column.text("flag"), Column.wrapping("reason")), rows));
    }

    private static void schedule(PdfPages p, ReportDocument r) throws IOException {
        boolean imp = r.units() == ReportUnits.IMPERIAL;
        String lu = imp ? "in" : "mm";
        p.newPage();
        p.heading("String schedule", 80);
        p.paragraph("Per key: strings per note, the plain wire (# = music-wire size) or the wound string (core / "
                + "first wrap + second wrap, " + lu + ", the wrap metal: Cu copper, Fe iron, St steel, and in brackets "
                + "the outside diameter), speaking and stretched length, and per "
                + "string the tension and percent of breaking strength at the working pitch.");
        List<List<String>> rows = new ArrayList<>();
        for (ScheduleRow s : r.schedule().rows()) {
            NoteResult n = r.analysis().result(s.key()).orElseThrow();
            rows.add(List.of(Integer.toString(s.key()), s.noteName(), s.section(), Integer.toString(s.strings()),
                    spec(s.plainSize(), s.coreDiameter(), s.wrap(), imp), length(s.speakingLength(), imp),
                    s.stretchedLength().isPresent() ? length(s.stretchedLength().getAsDouble(), imp) : "",
                    NumberText.fixed(s.frequency(), 2), force(s.tension(), imp), NumberText.fixed(s.breakPct(), 1),
                    n.flags().stream().map(f -> f.kind().word()).distinct().collect(Collectors.joining(", "))));
        }
        p.table(new PdfTable(List.of(Column.number("key"), Column.text("note"), Column.text("section"),
                Column.number("strings"), Column.text("wire"), Column.number("speaking length " + lu),
                Column.number("stretched length " + lu), Column.number("pitch Hz"),
                Column.number("tension " + (imp ? "lbf" : "N")), Column.number("% of breaking strength"),
                Column.wrapping("flags")), rows));
    }

    private static void woundOrder(PdfPages p, ReportDocument r) throws IOException {
        boolean imp = r.units() == ReportUnits.IMPERIAL;
        p.heading("Wound-string order", 120);
        if (r.woundOrder().rows().isEmpty()) {
            p.paragraph("The scale has no wound strings.");
            return;
        }
        p.paragraph("One row per string design, identical strings of several notes on one row; make each as many "
                + "times as its count: " + r.woundOrder().totalStrings() + " wound strings on " + r.woundOrder().notes()
                + " notes in " + r.woundOrder().rows().size() + " designs. "
                + (imp ? "Inches, with millimetres in brackets." : "Millimetres.")
                + " Core with its music-wire size; OD = outside diameter over the winding; ≈ marks an estimated winding "
                + "start, to be checked on the instrument.");
        // the cells are the CSV's own, so the page and wound-order.csv print the same figures
        CsvSheet sheet = WoundOrderCsv.sheet(r.woundOrder(), r.units(), List.of());
        List<String> h = sheet.header();
        List<String> lengths = List.of("od", "speaking_length", "wound_length", "bare_front", "bare_back",
                "winding_start_from_hitch", "stretched_length");
        List<List<String>> rows = new ArrayList<>();
        for (List<String> row : sheet.rows()) {
            List<String> c = new ArrayList<>();
            c.add(row.get(h.indexOf("keys")));
            c.add(row.get(h.indexOf("notes")));
            c.add(row.get(h.indexOf("count")));
            String size = row.get(h.indexOf("core_size"));
            c.add(both(row, h, "core", imp) + (size.isEmpty() ? "" : " #" + size));
            c.add(both(row, h, "wrap1", imp));
            c.add(both(row, h, "wrap2", imp));
            c.add(row.get(h.indexOf("wrap_metal")));
            for (String q : lengths) {
                String cell = both(row, h, q, imp);
                boolean estimate = q.equals("winding_start_from_hitch") && !cell.isEmpty()
                        && row.get(h.indexOf("winding_start_by")).equals("estimate");
                c.add(estimate ? "≈" + cell : cell);
            }
            c.add(row.get(h.indexOf("bare_ends")));
            rows.add(c);
        }
        rows.add(List.of("", "total", Integer.toString(r.woundOrder().totalStrings()), "", "", "", "", "", "", "", "",
                "", "", "", ""));
        p.table(new PdfTable(List.of(Column.wrapping("keys"), Column.wrapping("notes"), Column.number("count"),
                Column.number("core"), Column.number("wrap 1"), Column.number("wrap 2"), Column.text("metal"),
                Column.number("OD"), Column.number("speaking length"), Column.number("wound length"),
                Column.number("bare front"), Column.number("bare back"),
                Column.number("winding starts from hitch"), Column.number("stretched length"),
                Column.text("bare ends")), rows, Set.of(rows.size() - 1)));
        for (String line : WoundOrderCsv.notes(imp)) {
            p.paragraph(line.substring(0, 1).toUpperCase(java.util.Locale.ROOT) + line.substring(1) + ".", 8, true, 0);
        }
    }

    /**
     * @return the cell of quantity {@code q}: mm with all its printed decimals (3 for a diameter, 1 for
     *         a length), or inches with that in brackets
     */
    private static String both(List<String> row, List<String> h, String q, boolean imp) {
        String cell = row.get(h.indexOf(q + "_mm"));
        if (cell.isEmpty()) {
            return cell;
        }
        boolean diameter = List.of("core", "wrap1", "wrap2", "od").contains(q);
        String mm = NumberText.fixed(Double.parseDouble(cell), diameter ? 3 : 1);
        if (!imp) {
            return mm;
        }
        return row.get(h.indexOf(q + "_in")) + " (" + mm + ")";
    }

    private static void wireOrder(PdfPages p, ReportDocument r) throws IOException {
        boolean imp = r.units() == ReportUnits.IMPERIAL;
        WireOrder order = r.wireOrder();
        p.heading("Plain-wire order", 100);
        if (order.rows().isEmpty()) {
            p.paragraph("The scale has no plain-wire strings.");
            return;
        }
        CsvSheet sheet = WireOrderCsv.sheet(order, r.units(), List.of());
        List<String> h = sheet.header();
        List<String> shown = new ArrayList<>(List.of("size", "diameter_mm"));
        if (imp) {
            shown.add("diameter_in");
        }
        shown.addAll(List.of("keys", "notes", "strings", "pieces", "estimated_strings", "length_m"));
        if (imp) {
            shown.add("length_ft");
        }
        shown.add("mass_g");
        List<List<String>> rows = new ArrayList<>();
        for (List<String> row : sheet.rows()) {
            List<String> c = new ArrayList<>();
            for (String name : shown) {
                String v = row.get(h.indexOf(name));
                c.add(display(name, v));
            }
            rows.add(c);
        }
        List<Column> cols = new ArrayList<>();
        for (String name : shown) {
            cols.add(switch (name) {
                case "size" -> Column.text("size");
                case "keys" -> Column.wrapping("keys");
                case "diameter_mm" -> Column.number("diameter mm");
                case "diameter_in" -> Column.number("diameter in");
                case "estimated_strings" -> Column.number("strings estimated");
                case "length_m" -> Column.number("length to buy m");
                case "length_ft" -> Column.number("length to buy ft");
                case "mass_g" -> Column.number("mass g");
                default -> Column.number(name);
            });
        }
        p.table(new PdfTable(cols, rows, Set.of(rows.size() - 1)));
        for (String line : WireOrderCsv.ruleText(order.allowances())) {
            p.paragraph(line, 8, true, 0);
        }
    }

    private static void stretch(PdfPages p, ReportDocument r) throws IOException {
        StretchCurve chosen = r.stretch().get(0);
        p.newPage();
        p.heading("Tuning stretch from inharmonicity", 250);
        p.paragraph("Keys " + TuningStretch.EQUAL_TEMPERED_BAND.first() + "-" + TuningStretch.EQUAL_TEMPERED_BAND.last()
                + " (A3-A4) at equal temperament; each octave outward tuned so that the lower note's partial 2m "
                + "sounds with the upper note's partial m (octave types 2:1, 4:2, 6:3 for m = 1, 2, 3), with each "
                + "note's B at its working pitch. Cents from equal temperament, sharp positive. This is what the "
                + "scale's inharmonicity asks of the tuner, not a tuning to copy.");
        if (r.stretchChart() != null) {
            p.image(r.stretchChart().image(), r.stretchChart().caption(), 330);
        }
        List<Column> cols = new ArrayList<>(List.of(Column.number("key"), Column.text("note"),
                Column.number("B"), Column.number("equal tempered Hz")));
        List<StretchCurve> ordered = r.content().stretchInOrder();
        for (StretchCurve c : ordered) {
            cols.add(Column.number(c.octave().label() + " cents"));
        }
        cols.add(Column.number(chosen.octave().label() + " tuned Hz"));
        List<List<String>> rows = new ArrayList<>();
        for (int i = 0; i < chosen.points().size(); i++) {
            StretchPoint pt = chosen.points().get(i);
            List<String> c = new ArrayList<>(List.of(Integer.toString(pt.key()), pt.noteName(),
                    NumberText.scientific(pt.inharmonicity(), 2), NumberText.fixed(pt.equalTemperedHz(), 2)));
            for (StretchCurve sc : ordered) {
                StretchPoint q = sc.points().get(i);
                c.add(q.stretchCents().isPresent() ? NumberText.signed(
                        q.stretchCents().getAsDouble(), 2) : "");
            }
            c.add(pt.tunedHz().isPresent() ? NumberText.fixed(pt.tunedHz().getAsDouble(), 2) : "");
            rows.add(c);
        }
        p.table(new PdfTable(cols, rows));
        for (String prob : chosen.problems()) {
            p.paragraph(prob, 8, true, 0);
        }
    }

    private static void cautionsAndSources(PdfPages p, ReportDocument r) throws IOException {
        p.heading("Cautions", 60);
        for (String c : r.cautions()) {
            p.paragraph(c, 9.5f, true, 0);
        }
        p.space(6);
        p.heading("Sources of the figures", 60);
        for (String s : r.sources()) {
            p.paragraph(s, 8.5f, true, 0);
        }
    }

    /** @return a wire-order cell as shown: sizes with '#', lengths and masses to fixed decimals */
    private static String display(String column, String cell) {
        if (cell.isEmpty()) {
            return cell;
        }
        int places = switch (column) {
            case "diameter_mm", "length_m" -> 3;
            case "diameter_in" -> 4;
            case "length_ft" -> 2;
            case "mass_g" -> 1;
            default -> -1;
        };
        if (places >= 0) {
            return new java.math.BigDecimal(cell).setScale(places, java.math.RoundingMode.UNNECESSARY).toPlainString();
        }
        if (column.equals("size") && !cell.equals(WireOrderCsv.TOTAL)) {
            return "#" + cell;
        }
        return cell;
    }

    private static String kN(double newtons) {
        return NumberText.fixed(newtons / 1000, 1) + " kN (" + NumberText.grouped(UnitConversions.newtonsToLbf(newtons))
                + " lbf)";
    }

    private static String spec(java.util.OptionalDouble size, double core, Wrap wrap, boolean imp) {
        return WireNotation.of(size, core, wrap, imp ? LengthUnit.IN : LengthUnit.MM);
    }

    private static String length(double metres, boolean imp) {
        return imp ? NumberText.fixed(metres / UnitConversions.METRES_PER_INCH, 2) : NumberText.fixed(metres * 1e3, 1);
    }

    private static String diameter(double metres, boolean imp) {
        return imp ? WireNotation.diameter(metres, LengthUnit.IN) + " (" + WireNotation.diameter(metres, LengthUnit.MM) + ")"
                : WireNotation.diameter(metres, LengthUnit.MM);
    }

    private static String force(double newtons, boolean imp) {
        return imp ? NumberText.fixed(UnitConversions.newtonsToLbf(newtons), 1) : NumberText.fixed(newtons, 0);
    }
}
