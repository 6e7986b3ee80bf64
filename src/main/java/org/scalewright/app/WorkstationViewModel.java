package org.scalewright.app;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.StringBinding;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyStringProperty;
import org.scalewright.app.curves.CurvesViewModel;
import org.scalewright.app.export.ExportViewModel;
import org.scalewright.app.session.Choice;
import org.scalewright.app.session.CsvFileNames;
import org.scalewright.app.session.DeskSettings;
import org.scalewright.app.session.DisplayFormat;
import org.scalewright.app.session.RecentFiles;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.StrengthChoice;
import org.scalewright.app.session.TypedEntry;
import org.scalewright.app.session.UserPrompts;
import org.scalewright.app.table.FlagsViewModel;
import org.scalewright.app.table.NoteColumn;
import org.scalewright.app.table.NoteTableViewModel;
import javafx.collections.ObservableList;
import org.scalewright.io.AtomicFiles;
import org.scalewright.io.BadInputException;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.SheetProblem;
import org.scalewright.io.SheetTemplate;
import org.scalewright.io.StrengthTableReader;
import org.scalewright.model.DisplayUnits;
import org.scalewright.model.ForceUnit;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.Scale;
import org.scalewright.physics.StrengthTable;

/**
 * The window's commands: new from a template, open, open recent, close, revert, save, save as
 * (with the unsaved-changes question), reference scale, strength table, units, pitch
 * standard, cautions; the settings remembered between starts; and the part view models.
 */
public final class WorkstationViewModel {
    /** The display-unit choices offered. */
    static final class UnitChoice {
        static final Choice<DisplayUnits> METRIC = new Choice<>("mm and N", DisplayUnits.METRIC);
        static final Choice<DisplayUnits> IMPERIAL = new Choice<>("in and lbf", DisplayUnits.IMPERIAL);
        static final Choice<DisplayUnits> METRIC_KGF = new Choice<>("mm and kgf",
                new DisplayUnits(LengthUnit.MM, ForceUnit.KGF));

        private UnitChoice() {
        }

        static List<Choice<DisplayUnits>> values() {
            return List.of(METRIC, IMPERIAL, METRIC_KGF);
        }
    }

    private final ScaleSession session;
    private final UserPrompts prompts;
    private final NoteTableViewModel table;
    private final CurvesViewModel curves;
    private final FlagsViewModel flags;
    private final StatusViewModel status;
    private final StringBinding windowTitle;
    private final DeskSettings settings;
    private final RecentFiles recent;

    /** A window that remembers nothing between starts (tests). */
    public WorkstationViewModel(ScaleSession session, UserPrompts prompts) {
        this(session, prompts, DeskSettings.forgetful());
    }

    /**
     * A window whose units, strength table and recent files are taken from {@code settings}
     * and kept there as they change.
     */
    public WorkstationViewModel(ScaleSession session, UserPrompts prompts, DeskSettings settings) {
        this.session = session;
        this.prompts = prompts;
        this.settings = settings;
        this.recent = new RecentFiles(settings);
        restoreSettings();
        this.table = new NoteTableViewModel(session);
        restoreShownColumns();
        this.curves = new CurvesViewModel(session);
        this.flags = new FlagsViewModel(session);
        this.status = new StatusViewModel(session);
        windowTitle = Bindings.createStringBinding(() -> (session.isDirty() ? "* " : "")
                        + session.documentNameProperty().get() + " — Scalewright",
                session.dirtyProperty(), session.documentNameProperty());
    }

    public ScaleSession session() {
        return session;
    }

    /** @return the dialogs and file choosers the tools ask through */
    UserPrompts prompts() {
        return prompts;
    }

    public NoteTableViewModel table() {
        return table;
    }

    public CurvesViewModel curves() {
        return curves;
    }

    FlagsViewModel flags() {
        return flags;
    }

    StatusViewModel status() {
        return status;
    }

    // ---- what the window's menus and tool bar show, from the session ----

    void undo() {
        session.undo();
    }

    void redo() {
        session.redo();
    }

    ReadOnlyBooleanProperty canUndoProperty() {
        return session.canUndoProperty();
    }

    ReadOnlyBooleanProperty canRedoProperty() {
        return session.canRedoProperty();
    }

    /** @return what Undo would take back, in words */
    ReadOnlyStringProperty undoTextProperty() {
        return session.undoTextProperty();
    }

    ReadOnlyStringProperty redoTextProperty() {
        return session.redoTextProperty();
    }

    ObjectProperty<DisplayUnits> unitsProperty() {
        return session.unitsProperty();
    }

    void useCurrentAsReference() {
        session.useCurrentAsReference();
    }

    BooleanProperty showReferenceProperty() {
        return session.showReferenceProperty();
    }

    BooleanProperty showDifferencesProperty() {
        return session.showDifferencesProperty();
    }

    ReadOnlyStringProperty referenceNameProperty() {
        return session.referenceNameProperty();
    }

    ReadOnlyObjectProperty<StrengthChoice> strengthProperty() {
        return session.strengthProperty();
    }

    ReadOnlyObjectProperty<Scale> scaleProperty() {
        return session.scaleProperty();
    }

    /** @return the working scale's pitch standard as shown in the A4 field: {@code 440.0} */
    String a4Text() {
        return DisplayFormat.decimals(session.scale().pitch().a4(), 1, 2);
    }

    /** @return the exports of this window, shared by its File menu and its Exports tab */
    ExportViewModel exports() {
        return ExportViewModel.of(session, prompts);
    }

    StringBinding windowTitleProperty() {
        return windowTitle;
    }

    /** @return the settings remembered between starts (window size and dividers are kept by the view) */
    DeskSettings settings() {
        return settings;
    }

    // ---- settings kept between starts ----

    private void restoreSettings() {
        settings.units().ifPresent(u -> session.unitsProperty().set(u));
        settings.strength().ifPresent(this::restoreStrength);
        session.unitsProperty().addListener((o, a, b) -> settings.units(b));
        session.strengthProperty().addListener((o, a, b) -> settings.strength(b));
    }

    /** The note table's columns shown from its column menu, as last time; each choice kept as made. */
    private void restoreShownColumns() {
        Set<String> kept = settings.shownColumns();
        for (NoteColumn c : NoteColumn.values()) {
            if (c.shownWhenChosen()) {
                table.shownProperty(c).set(kept.contains(c.settingName()));
                table.shownProperty(c).addListener((o, a, b) -> {
                    Set<String> now = new TreeSet<>(settings.shownColumns());
                    if (b) {
                        now.add(c.settingName());
                    } else {
                        now.remove(c.settingName());
                    }
                    settings.shownColumns(now);
                });
            }
        }
    }

    private void restoreStrength(String kept) {
        if (kept.equals(DeskSettings.STRENGTH_MAXIMUM)) {
            session.setStrength(StrengthChoice.maximum());
        } else if (!kept.equals(DeskSettings.STRENGTH_MINIMUM)) {
            Path file = Path.of(kept);
            try {
                session.setStrength(StrengthChoice.maker(file, StrengthTableReader.read(file)));
            } catch (BadInputException | RuntimeException e) {
                session.setStrength(StrengthChoice.minimum());
                session.complain("the maker's strength table used last time (" + file + ") could not be read; "
                        + "using ASTM A228 minimum");
            }
        }
    }

    // ---- files ----

    /** Opens a sheet chosen by the user, after settling unsaved changes. */
    void open() {
        if (!settleUnsavedChanges()) {
            return;
        }
        prompts.chooseSheetToOpen("Open scale sheet").ifPresent(p -> openSheet(p, true));
    }

    /**
     * Opens {@code sheet} without asking about unsaved changes (at start, or after they were
     * settled). A sheet that fails to load shows its problems and opens nothing; the window keeps
     * what it showed (at start: an empty scale). Whatever the file holds, the window stays open:
     * a fault of the program while opening is shown as such, not passed on.
     *
     * @return true when it was opened
     */
    public boolean openSheet(Path sheet, boolean saveBack) {
        try {
            session.open(sheet, saveBack);
            if (saveBack) {
                recent.add(sheet);
            }
            return true;
        } catch (BadInputException e) {
            prompts.showProblems("Sheet not opened", sheet + " could not be read; nothing was opened or changed.",
                    e.problems().stream().map(SheetProblem::toString).toList());
            session.complain("could not open " + sheet.getFileName() + ": " + e.problems().size() + " problem"
                    + (e.problems().size() == 1 ? "" : "s"));
            return false;
        } catch (RuntimeException e) {
            String why = e.getClass().getSimpleName() + (e.getMessage() == null ? "" : ": " + e.getMessage());
            prompts.showProblems("Sheet not opened", sheet + " could not be opened because of an error in the program "
                    + "(please report it with the file); nothing was opened or changed.", List.of(why));
            session.complain("could not open " + sheet.getFileName() + ": an error in the program (" + why + ")");
            return false;
        }
    }

    /** Saves to the sheet's file, or asks for one. @return true when saved */
    boolean save() {
        Optional<Path> target = session.file();
        if (target.isEmpty()) {
            return saveAs();
        }
        return writeTo(target.get());
    }

    /** Asks for a file and saves to it. @return true when saved */
    boolean saveAs() {
        String suggested = session.file().map(p -> p.getFileName().toString())
                .orElse(suggestedName(session.documentNameProperty().get()));
        Optional<Path> target = prompts.chooseSheetToSave(suggested);
        return target.isPresent() && writeTo(CsvFileNames.withCsvExtension(target.get()));
    }

    private boolean writeTo(Path target) {
        try {
            session.saveAs(target);
            recent.add(target);
            return true;
        } catch (IOException | RuntimeException e) {
            String why = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
            prompts.showError("Sheet not saved", "Could not save to " + target + ": " + why
                    + ".\nThe file on disk is unchanged.");
            session.complain("not saved: " + why);
            return false;
        }
    }

    /**
     * Asks what to do with unsaved changes, if there are any.
     *
     * @return true when the caller may go on (saved, discarded or nothing to save)
     */
    boolean settleUnsavedChanges() {
        if (!session.isDirty()) {
            return true;
        }
        return switch (prompts.askToSave(session.documentNameProperty().get())) {
            case SAVE -> save();
            case DISCARD -> true;
            case CANCEL -> false;
        };
    }

    /** @return the sheets opened or saved lately, newest first */
    ObservableList<Path> recentFiles() {
        return recent.files();
    }

    /**
     * Opens a sheet from the recent list, after settling unsaved changes. A file that is no
     * longer there is said so and taken off the list.
     *
     * @return true when it was opened
     */
    boolean openRecent(Path sheet) {
        if (!java.nio.file.Files.isRegularFile(sheet)) {
            recent.remove(sheet);
            prompts.showError("Sheet not found", sheet + " is no longer there (moved, renamed or deleted); "
                    + "it was taken off the recent files.");
            session.complain("not found: " + sheet + " (taken off the recent files)");
            return false;
        }
        return settleUnsavedChanges() && openSheet(sheet, true);
    }

    void clearRecentFiles() {
        recent.clear();
        session.inform("the recent files list is empty");
    }

    /**
     * Opens sheets dropped on the window: the first {@code .csv} file, after settling unsaved
     * changes; anything else is refused with a message.
     *
     * @return true when a sheet was opened
     */
    boolean openDropped(List<Path> files) {
        Optional<Path> sheet = files.stream().filter(CsvFileNames::isCsv).findFirst();
        if (sheet.isEmpty()) {
            session.complain("only a scale sheet (.csv) can be dropped here; " + (files.isEmpty() ? "nothing"
                    : files.get(0).getFileName()) + " was not opened");
            return false;
        }
        if (!settleUnsavedChanges()) {
            return false;
        }
        boolean opened = openSheet(sheet.get(), true);
        if (opened && files.size() > 1) {
            session.inform("opened " + sheet.get() + "; one sheet at a time, the other dropped files were left");
        }
        return opened;
    }

    /** Closes the sheet after settling unsaved changes, leaving the window empty. */
    boolean close() {
        if (!settleUnsavedChanges()) {
            return false;
        }
        session.close();
        return true;
    }

    /**
     * Goes back to the sheet as it was last opened or saved, dropping the edits since, after
     * asking; the edits can no longer be undone.
     *
     * @return true when the sheet was read again
     */
    boolean revert() {
        Optional<Path> sheet = session.source();
        if (sheet.isEmpty()) {
            session.complain("nothing to revert to: no sheet is open");
            return false;
        }
        if (!session.isDirty()) {
            session.inform("nothing to revert: " + sheet.get().getFileName() + " has no unsaved changes");
            return false;
        }
        if (!prompts.confirm("Revert to the saved sheet", "Drop every change to " + session.documentNameProperty().get()
                + " since it was opened or saved and read " + sheet.get() + " again? This cannot be undone.",
                "Revert")) {
            return false;
        }
        boolean demo = session.file().isEmpty();
        return openSheet(sheet.get(), !demo);
    }

    /**
     * Makes a new blank sheet from a bundled template: asks where to keep it, writes it (with
     * the pitch standard last typed into the A4 field) and closes the open sheet. The
     * measurements of a blank sheet must be filled in before it can be opened (each note needs
     * its speaking length and wire), which the message says.
     *
     * @return the sheet written, or empty when cancelled or not written
     */
    Optional<Path> newSheet(SheetTemplate template) {
        if (!settleUnsavedChanges()) {
            return Optional.empty();
        }
        Optional<Path> chosen = prompts.chooseSheetToSave(template.suggestedName());
        if (chosen.isEmpty()) {
            return Optional.empty();
        }
        Path target = CsvFileNames.withCsvExtension(chosen.get());
        try {
            AtomicFiles.write(target, template.text(settings.a4()).getBytes(java.nio.charset.StandardCharsets.UTF_8),
                    true);
        } catch (IOException | RuntimeException e) {
            String why = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
            prompts.showError("Sheet not made", "Could not write " + target + ": " + why + ".");
            session.complain("new sheet not written: " + why);
            return Optional.empty();
        }
        session.close();
        recent.add(target);
        String message = "A blank sheet for a " + template.title().toLowerCase(java.util.Locale.ROOT)
                + " was written to\n" + target + "\n\nIt names the keys, sections and strings per note; "
                + "fill in each note's speaking length and wire (and the wraps of wound strings) in a spreadsheet "
                + "or a text editor, then open it here with File > Open recent. The column layout is in "
                + "scales/README.md and in the sheet's own comment lines.";
        prompts.showInformation("New sheet", "New blank sheet: " + target.getFileName(), message);
        session.inform("new blank sheet " + target + ": fill in the measurements, then open it");
        return Optional.of(target);
    }

    /** @return true when the window may close */
    boolean mayClose() {
        return settleUnsavedChanges();
    }

    static String suggestedName(String documentName) {
        String base = documentName.replaceAll(" \\(.*\\)$", "").replaceAll("\\.csv$", "");
        return (base.isBlank() || base.equals("untitled") ? "scale" : base + "-edited") + ".csv";
    }

    // ---- reference ----

    void openReference() {
        prompts.chooseSheetToOpen("Open reference scale").ifPresent(p -> {
            try {
                session.openReference(p);
            } catch (BadInputException e) {
                prompts.showProblems("Reference not opened", p + " could not be read; the reference is unchanged.",
                        e.problems().stream().map(SheetProblem::toString).toList());
            }
        });
    }

    // ---- settings ----

    void useBuiltInMinimum() {
        session.setStrength(StrengthChoice.minimum());
    }

    void useBuiltInMaximum() {
        session.setStrength(StrengthChoice.maximum());
    }

    /** Reads a maker's strength table chosen by the user; a bad table shows its problems and changes nothing. */
    boolean useMakersTable() {
        Optional<Path> file = prompts.chooseStrengthTable();
        if (file.isEmpty()) {
            return false;
        }
        try {
            StrengthTable t = StrengthTableReader.read(file.get());
            session.setStrength(StrengthChoice.maker(file.get(), t));
            return true;
        } catch (BadInputException e) {
            prompts.showProblems("Strength table not read", file.get()
                            + " could not be read; the strength table is unchanged.",
                    e.problems().stream().map(SheetProblem::toString).toList());
            return false;
        }
    }

    void setUnits(Choice<DisplayUnits> choice) {
        session.unitsProperty().set(choice.value());
    }

    /**
     * Sets A4 from the text typed by the user.
     *
     * @return true when the text was a valid pitch (changed or not)
     */
    boolean setA4(String text) {
        try {
            double a4 = TypedEntry.parse(text, "A4", "Hz");
            session.setA4(a4);
            settings.a4(a4);
            return true;
        } catch (InvalidInput e) {
            session.complain(e.getMessage());
            return false;
        }
    }

    void showCautions() {
        prompts.showCautions(BuiltInData.cautions());
    }

    /** Shows the version, where the log file and the settings are kept. */
    void showAbout() {
        prompts.showInformation("About Scalewright", "Scalewright " + AboutText.version(),
                AboutText.text(DesktopLog.file()));
    }
}
