package org.scalewright.app;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
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
import org.scalewright.app.session.DisplayFormat;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.StrengthChoice;
import org.scalewright.app.session.TypedEntry;
import org.scalewright.app.session.UserPrompts;
import org.scalewright.app.table.FlagsViewModel;
import org.scalewright.app.table.NoteTableViewModel;
import org.scalewright.io.BadInputException;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.SheetProblem;
import org.scalewright.io.StrengthTableReader;
import org.scalewright.model.DisplayUnits;
import org.scalewright.model.ForceUnit;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.Scale;
import org.scalewright.physics.StrengthTable;

/**
 * The window's commands: open, save, save as (with the unsaved-changes question), reference
 * scale, strength table, units, pitch standard, cautions; and the part view models.
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

    public WorkstationViewModel(ScaleSession session, UserPrompts prompts) {
        this.session = session;
        this.prompts = prompts;
        this.table = new NoteTableViewModel(session);
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
            session.setA4(TypedEntry.parse(text, "A4", "Hz"));
            return true;
        } catch (InvalidInput e) {
            session.complain(e.getMessage());
            return false;
        }
    }

    void showCautions() {
        prompts.showCautions(BuiltInData.cautions());
    }
}
