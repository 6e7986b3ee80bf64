package org.scalewright.app.export;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.WeakHashMap;
import javafx.application.Platform;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.StringExpression;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.jfree.chart.JFreeChart;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.UserPrompts;
import org.scalewright.chart.ChartFiles;
import org.scalewright.chart.Curve;
import org.scalewright.chart.CurveData;
import org.scalewright.chart.ScaleCurves;
import org.scalewright.chart.StretchChart;
import org.scalewright.design.orders.WireAllowances;
import org.scalewright.design.stretch.OctaveType;
import org.scalewright.io.AnalysisCsv;
import org.scalewright.io.AtomicFiles;
import org.scalewright.io.CsvDialect;
import org.scalewright.io.TableFiles;
import org.scalewright.model.NumberText;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.report.ChartsNotDrawn;
import org.scalewright.io.CsvSheet;
import org.scalewright.report.ReportCharts;
import org.scalewright.report.ReportContent;
import org.scalewright.report.ReportFiles;
import org.scalewright.report.ReportPackage;
import org.scalewright.report.ReportPaper;
import org.scalewright.report.ReportUnits;
import org.scalewright.report.Reports;
import org.scalewright.report.ScheduleCsv;
import org.scalewright.report.StretchCsv;
import org.scalewright.report.WireOrderCsv;
import org.scalewright.report.WoundOrderCsv;

/**
 * Exports of the working scale: the whole report into a folder (PDF, charts as PNG and SVG,
 * the CSV tables), or one piece into a file chosen by the user. Tables are in the display's
 * length unit (millimetres or inches); the session's reference scale is drawn beside the
 * working scale. After each export {@link #noteProperty()} and {@link #written()} say what was
 * written (names and sizes), or why nothing was.
 */
public final class ExportViewModel {
    private static final Map<ScaleSession, ExportViewModel> PER_WINDOW = new WeakHashMap<>();

    /** One file written. */
    record Written(Path path, long bytes) {
        @Override
        public String toString() {
            return path.getFileName() + "  " + ExportViewModel.size(bytes);
        }
    }

    private final ScaleSession session;
    private final UserPrompts prompts;
    private final ObjectProperty<OctaveType> octave = new SimpleObjectProperty<>(OctaveType.TWO_ONE);
    private final ObjectProperty<ReportPaper> paper = new SimpleObjectProperty<>();
    /** True once the user has chosen the paper; until then it follows the display's units. */
    private boolean paperChosen;
    private boolean followingUnits;
    private final ReadOnlyStringWrapper note = new ReadOnlyStringWrapper("Nothing exported yet.");
    private final ReadOnlyBooleanWrapper noteIsProblem = new ReadOnlyBooleanWrapper();
    private final ReadOnlyBooleanWrapper busy = new ReadOnlyBooleanWrapper();
    private final ObservableList<Written> written = FXCollections.observableArrayList();
    /** Draws the report's charts (tests put a failing one here). */
    Reports.ChartDrawer charts = ReportCharts::reportCharts;

    ExportViewModel(ScaleSession session, UserPrompts prompts) {
        this.session = session;
        this.prompts = prompts;
        followUnits();
        session.unitsProperty().addListener((o, was, is) -> {
            if (!paperChosen) {
                followUnits();
            }
        });
        paper.addListener((o, was, is) -> {
            if (is == null) {
                paperChosen = false;
                followUnits();
            } else if (!followingUnits) {
                paperChosen = true;
            }
        });
    }

    private void followUnits() {
        followingUnits = true;
        try {
            paper.set(ReportPaper.of(units()));
        } finally {
            followingUnits = false;
        }
    }

    /** @return the one export view model of a window (its session), shared by its Exports tab and its File menu */
    public static ExportViewModel of(ScaleSession session, UserPrompts prompts) {
        synchronized (PER_WINDOW) {
            return PER_WINDOW.computeIfAbsent(session, s -> new ExportViewModel(s, prompts));
        }
    }

    /** @return the settings an export uses, in words: the length unit and the reference */
    StringExpression settingsTextProperty() {
        return Bindings.createStringBinding(() -> "Lengths in "
                        + units().length().symbol() + " (the display's units)  ·  reference: " + referenceText(),
                session.unitsProperty(), session.referenceNameProperty(), session.referenceAnalysisProperty());
    }

    /** @return the octave type whose stretch is {@code stretch_cents} in the stretch table */
    ObjectProperty<OctaveType> octaveProperty() {
        return octave;
    }

    /**
     * @return the paper of the PDF: A4 for metric display units and Letter for imperial until
     *         the user chooses one, then the chosen one whatever the units (null goes back to
     *         following the units)
     */
    ObjectProperty<ReportPaper> paperProperty() {
        return paper;
    }

    /** @return what the last export wrote, or why it wrote nothing */
    ReadOnlyStringProperty noteProperty() {
        return note.getReadOnlyProperty();
    }

    ReadOnlyBooleanProperty noteIsProblemProperty() {
        return noteIsProblem.getReadOnlyProperty();
    }

    /** @return the files the last export wrote, with their sizes */
    ObservableList<Written> written() {
        return written;
    }

    /** @return the units of the tables: those of the display */
    ReportUnits units() {
        return ReportUnits.of(session.units().length());
    }

    /** @return the reference drawn beside the working scale, in words */
    String referenceText() {
        Optional<ReportContent.Reference> r = reference();
        return r.map(x -> x.sheetName()).orElse("none");
    }

    // ---- the whole report ----

    /** Asks for a folder and writes the whole report into it. @return true when written */
    boolean exportReport() {
        Optional<Path> dir = prompts.chooseExportFolder("Write the whole report into a folder");
        return dir.isPresent() && writeReportTo(dir.get());
    }

    /**
     * Asks for a folder and writes the whole report into it, drawing the charts and the PDF on
     * a background thread so the window stays responsive (a few seconds); the files are written
     * and the note updated back on the JavaFX thread. Must be called on the JavaFX thread.
     */
    void exportReportInBackground() {
        Optional<Path> dir = prompts.chooseExportFolder("Write the whole report into a folder");
        if (dir.isEmpty() || busy.get()) {
            return;
        }
        Optional<ReportContent> content = checkedContent(dir.get());
        if (content.isEmpty()) {
            return;
        }
        busy.set(true);
        note.set("Writing the report into " + dir.get().toAbsolutePath() + " …");
        noteIsProblem.set(false);
        Thread worker = new Thread(() -> {
            ReportFiles files = null;
            RuntimeException failure = null;
            try {
                files = Reports.make(content.get(), charts);
            } catch (RuntimeException e) {
                failure = e;
            }
            ReportFiles made = files;
            RuntimeException problem = failure;
            Platform.runLater(() -> {
                busy.set(false);
                if (problem != null) {
                    failed("Report not written", "the report could not be made: " + why(problem)
                            + ". Nothing was written.");
                } else {
                    writeFiles(dir.get(), made);
                }
            });
        }, "report-export");
        worker.setDaemon(true);
        worker.start();
    }

    /** @return true while a report is being made in the background */
    ReadOnlyBooleanProperty busyProperty() {
        return busy.getReadOnlyProperty();
    }

    /**
     * Writes the PDF report, the charts and the CSV tables into {@code dir} (created when it
     * does not exist but its parent does). A folder that cannot take them is refused with the
     * reason, and nothing is written.
     *
     * @return true when every file was written
     */
    boolean writeReportTo(Path dir) {
        Optional<ReportContent> content = checkedContent(dir);
        if (content.isEmpty()) {
            return false;
        }
        ReportFiles files;
        try {
            files = Reports.make(content.get(), charts);
        } catch (RuntimeException e) {
            return failed("Report not written", "the report could not be made: " + why(e) + ". Nothing was written.");
        }
        return writeFiles(dir, files);
    }

    /** @return the report content when there is a scale and {@code dir} can take the report */
    private Optional<ReportContent> checkedContent(Path dir) {
        Optional<ReportContent> content = content();
        if (content.isEmpty()) {
            return content;
        }
        String problem = ReportFiles.problemWith(dir);
        if (problem != null) {
            failed("Report not written", problem + ". Nothing was written.");
            return Optional.empty();
        }
        return content;
    }

    private boolean writeFiles(Path dir, ReportFiles files) {
        List<Path> paths;
        try {
            paths = files.writeTo(dir);
        } catch (IOException | RuntimeException e) {
            return failed("Report not written", "could not write into " + dir.toAbsolutePath() + ": " + why(e)
                    + ". The report is swapped in as a whole folder, so the folder is as it was.");
        }
        List<Written> list = new ArrayList<>();
        long total = 0;
        for (Path p : paths) {
            long n = files.content(p.getFileName().toString()).length;
            list.add(new Written(p, n));
            total += n;
        }
        succeeded(list, "Wrote the report into " + dir.toAbsolutePath() + ": " + list.size() + " files, "
                + size(total));
        return true;
    }

    // ---- one piece ----

    /** Asks for a file and writes one piece into it. @return true when written */
    boolean export(ExportPiece piece) {
        String ext = piece.format().extension();
        Optional<Path> file = prompts.chooseExportFile("Export " + piece.title().toLowerCase(java.util.Locale.ROOT)
                + " as " + ext.toUpperCase(java.util.Locale.ROOT), piece.suggestedName(baseName()), ext);
        if (file.isEmpty()) {
            return false;
        }
        // a table may go into a workbook: a name typed with .xlsx keeps it (io.TableFiles)
        boolean workbook = piece.format() == ExportFormat.CSV && TableFiles.isWorkbook(file.get());
        return write(piece, workbook ? file.get() : withExtension(file.get(), ext));
    }

    /**
     * Writes one piece into {@code file}, atomically: on failure the file is as it was.
     *
     * @return true when written
     */
    boolean write(ExportPiece piece, Path file) {
        Optional<ReportContent> content = content();
        if (content.isEmpty()) {
            return false;
        }
        String title = piece.title() + " not written";
        if (Files.isDirectory(file)) {
            return failed(title, file.toAbsolutePath() + " is a folder, not a file. Nothing was written.");
        }
        Path parent = file.toAbsolutePath().getParent();
        if (parent == null || !Files.isDirectory(parent)) {
            return failed(title, "the folder of " + file.toAbsolutePath() + " does not exist. Nothing was written.");
        }
        try {
            writePiece(piece, content.get(), file);
        } catch (IOException | RuntimeException e) {
            return failed(title, "could not write " + file.toAbsolutePath() + ": " + why(e)
                    + ". The file is as it was before.");
        }
        long n;
        try {
            n = Files.size(file);
        } catch (IOException e) {
            n = 0;
        }
        succeeded(List.of(new Written(file, n)), "Wrote " + piece.title().toLowerCase(java.util.Locale.ROOT)
                + " to " + file.toAbsolutePath() + " (" + size(n) + ")");
        return true;
    }

    private void writePiece(ExportPiece piece, ReportContent c, Path file) throws IOException {
        List<String> head = comments(c);
        switch (piece.content()) {
            case SCHEDULE -> csv(file, ScheduleCsv.sheet(c.schedule(), c.units(), head));
            case WOUND_ORDER -> csv(file, WoundOrderCsv.sheet(c.woundOrder(), c.units(), head));
            case WIRE_ORDER -> csv(file, WireOrderCsv.sheet(c.wireOrder(), c.units(), head));
            case STRETCH_TABLE -> csv(file, StretchCsv.sheet(c.chosenStretch(), c.stretchInOrder(), head));
            case RESULTS -> csv(file, new CsvSheet(AnalysisCsv.comments(c.analysis()), AnalysisCsv.HEADER,
                    AnalysisCsv.rows(c.analysis())));
            case REPORT -> AtomicFiles.write(file, Reports.make(c, charts)
                    .content(ReportPackage.PDF), false);
            default -> {
                byte[] bytes = ChartsNotDrawn.guard(() -> {
                    JFreeChart chart = chart(piece, c);
                    return piece.format() == ExportFormat.PNG
                            ? ChartFiles.png(chart, ChartFiles.PRINT_WIDTH, ChartFiles.PRINT_HEIGHT,
                                    ChartFiles.PRINT_DPI)
                            : ChartFiles.svgBytes(chart, ChartFiles.PRINT_WIDTH, ChartFiles.PRINT_HEIGHT);
                });
                AtomicFiles.write(file, bytes, false);
            }
        }
    }

    /** A table: a workbook when the name chosen ends in .xlsx (io.TableFiles), else CSV. */
    private static void csv(Path file, CsvSheet s) throws IOException {
        TableFiles.write(file, "results", s.comments(), s.header(), s.rows(), CsvDialect.PLAIN, false);
    }

    /** @return the chart of a chart piece, drawn in the display's units with the reference beside */
    private JFreeChart chart(ExportPiece piece, ReportContent c) {
        CurveData data = CurveData.of(c.analysis(), session.units())
                .withReference(c.reference().map(ReportContent.Reference::analysis).orElse(null));
        return switch (piece.content()) {
            case TENSION_CURVE -> ScaleCurves.build(Curve.TENSION, data);
            case BREAK_PERCENT_CURVE -> ScaleCurves.build(Curve.BREAK_PERCENT, data);
            case INHARMONICITY_CURVE -> ScaleCurves.build(Curve.INHARMONICITY, data);
            case STRETCH_CURVE -> StretchChart.build(c.title(), c.stretchInOrder());
            default -> throw new IllegalArgumentException("not a chart: " + piece);
        };
    }

    // ---- shared ----

    /** @return the report's content for the working scale, or empty (with a note) when there are no notes */
    Optional<ReportContent> content() {
        ScaleAnalysis a = session.analysis();
        if (a == null || a.notes().isEmpty()) {
            failed("Nothing to export", "the working scale has no notes; open a scale sheet first.");
            return Optional.empty();
        }
        try {
            return Optional.of(ReportContent.compute(sheetName(), a, reference(), units(), octave.get(),
                    WireAllowances.DEFAULT).withPaper(paper.get()));
        } catch (IllegalArgumentException e) {
            failed("Nothing exported", "the report could not be made: " + why(e) + ".");
            return Optional.empty();
        }
    }

    private Optional<ReportContent.Reference> reference() {
        ScaleAnalysis r = session.referenceAnalysisProperty().get();
        if (r == null || r.notes().isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new ReportContent.Reference(session.referenceNameProperty().get(), r));
    }

    /** The header comments every exported table starts with (as in the whole report). */
    private static List<String> comments(ReportContent c) {
        List<String> l = new ArrayList<>();
        l.add("scale: " + c.title());
        l.add("sheet: " + c.sheetName());
        l.add("a4_hz: " + NumberText.number(c.analysis().scale().pitch().a4()));
        l.add("strength table: " + c.analysis().settings().strength().name());
        c.reference().ifPresent(r -> l.add("reference: " + r.sheetName()));
        l.add("units: " + c.units().word());
        return l;
    }

    /** @return the sheet's file name, or the document's name for a sheet not yet saved */
    String sheetName() {
        return session.file().map(p -> p.getFileName().toString())
                .orElse(session.documentNameProperty().get().replaceAll(" \\(.*\\)$", ""));
    }

    /** @return the sheet's name without its extension, for suggested file names */
    String baseName() {
        String n = sheetName().replaceAll("\\.csv$", "");
        return n.equals("untitled") ? "scale" : n;
    }

    static Path withExtension(Path p, String ext) {
        String name = p.getFileName().toString();
        return name.toLowerCase(java.util.Locale.ROOT).endsWith("." + ext) ? p : p.resolveSibling(name + "." + ext);
    }

    private void succeeded(List<Written> files, String summary) {
        written.setAll(files);
        noteIsProblem.set(false);
        note.set(summary + " at " + LocalTime.now().format(DateTimeFormatter.ofPattern("HH:mm")) + ":");
        session.inform(summary.substring(0, 1).toLowerCase(java.util.Locale.ROOT) + summary.substring(1));
    }

    private boolean failed(String title, String why) {
        written.clear();
        noteIsProblem.set(true);
        note.set(title + ": " + why);
        session.complain(title.toLowerCase(java.util.Locale.ROOT) + ": " + why);
        prompts.showError(title, why.substring(0, 1).toUpperCase(java.util.Locale.ROOT) + why.substring(1));
        return false;
    }

    private static String why(Exception e) {
        String m = e.getMessage();
        if (e instanceof ChartsNotDrawn) {
            return m; // already one line naming the cause and what to install
        }
        String kind = e.getClass().getSimpleName().replace("Exception", "").replaceAll("([a-z])([A-Z])", "$1 $2")
                .toLowerCase(java.util.Locale.ROOT);
        return m == null ? kind : kind + " (" + m + ")";
    }

    /** @return a byte count in words: {@code 812 bytes}, {@code 14 kB}, {@code 1.2 MB} */
    static String size(long bytes) {
        if (bytes < 1000) {
            return bytes + " bytes";
        }
        if (bytes < 1_000_000) {
            return Math.round(bytes / 1000.0) + " kB";
        }
        return String.format(java.util.Locale.ROOT, "%.1f MB", bytes / 1e6);
    }
}
