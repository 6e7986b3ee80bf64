package org.scalewright.app.session;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.UnaryOperator;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import org.scalewright.model.DisplayUnits;
import org.scalewright.io.BadInputException;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.ReadNotes;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.io.ScaleSheetWriter;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

/**
 * The state shared by every part of the window: the working scale and its edit history, the
 * sheet file, the reference scale, the analysis settings, the display units and the selected
 * key. Every change of the scale or the settings is analysed at once; the parts of the window
 * listen to {@link #analysisProperty()} and friends.
 */
public final class ScaleSession {
    private final EditHistory history;
    private final ReadOnlyObjectWrapper<Scale> scale = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyObjectWrapper<ScaleAnalysis> analysis = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyObjectWrapper<Scale> reference = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyObjectWrapper<ScaleAnalysis> referenceAnalysis = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyStringWrapper referenceName = new ReadOnlyStringWrapper("");
    private final ReadOnlyObjectWrapper<StrengthChoice> strength = new ReadOnlyObjectWrapper<>(StrengthChoice.minimum());
    private final ReadOnlyObjectWrapper<AnalysisSettings> settings =
            new ReadOnlyObjectWrapper<>(BuiltInData.defaultSettings());
    private final ObjectProperty<DisplayUnits> units = new SimpleObjectProperty<>(DisplayUnits.METRIC);
    private final ObjectProperty<Integer> selectedKey = new SimpleObjectProperty<>();
    private final ReadOnlyObjectWrapper<Path> file = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyStringWrapper documentName = new ReadOnlyStringWrapper("untitled");
    /** The sheet the working scale was read from (also the demo, which is not saved back), or null. */
    private final ReadOnlyObjectWrapper<Path> source = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyBooleanWrapper dirty = new ReadOnlyBooleanWrapper();
    private final ReadOnlyBooleanWrapper canUndo = new ReadOnlyBooleanWrapper();
    private final ReadOnlyBooleanWrapper canRedo = new ReadOnlyBooleanWrapper();
    private final ReadOnlyStringWrapper undoText = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper redoText = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper("");
    private final ReadOnlyBooleanWrapper messageIsProblem = new ReadOnlyBooleanWrapper();
    private final BooleanProperty showReference = new SimpleBooleanProperty(true);
    private final BooleanProperty showDifferences = new SimpleBooleanProperty(false);

    /** A session on an empty scale (no sheet open). */
    public ScaleSession() {
        Scale empty = emptyScale();
        history = new EditHistory(empty);
        setScale(empty);
        setReference(empty, "none");
    }

    private static Scale emptyScale() {
        return new Scale("", PitchStandard.ISO_16, List.of(), null);
    }

    // ---- the working scale and its edits ----

    public ReadOnlyObjectProperty<Scale> scaleProperty() {
        return scale.getReadOnlyProperty();
    }

    public Scale scale() {
        return scale.get();
    }

    public ReadOnlyObjectProperty<ScaleAnalysis> analysisProperty() {
        return analysis.getReadOnlyProperty();
    }

    public ScaleAnalysis analysis() {
        return analysis.get();
    }

    /**
     * Applies an edit to the working scale and records it for undo.
     *
     * @return false when the edit changed nothing (nothing recorded)
     */
    public boolean edit(String description, UnaryOperator<Scale> change) {
        Scale next = change.apply(scale());
        if (!history.push(next, description)) {
            return false;
        }
        Timings.editStarted(description);
        setScale(next);
        inform("changed " + description);
        return true;
    }

    public void undo() {
        if (history.canUndo()) {
            String what = history.undoDescription();
            Timings.editStarted("undo " + what);
            setScale(history.undo());
            inform("undid " + what);
        }
    }

    public void redo() {
        if (history.canRedo()) {
            String what = history.redoDescription();
            Timings.editStarted("redo " + what);
            setScale(history.redo());
            inform("redid " + what);
        }
    }

    /**
     * Sets the pitch standard (an undoable edit of the scale).
     *
     * @param a4 frequency of A4, Hz, in the range {@link PitchStandard#of} accepts
     * @return true when the scale changed
     * @throws org.scalewright.model.InvalidInput when A4 is outside that range (nothing changes)
     */
    public boolean setA4(double a4) {
        PitchStandard p = PitchStandard.of(a4);
        return edit("A4 to " + DisplayFormat.decimals(a4, 1, 2) + " Hz", s -> s.withPitch(p));
    }

    private void setScale(Scale s) {
        scale.set(s);
        reanalyse();
    }

    private void reanalyse() {
        analysis.set(ScaleAnalyzer.analyze(scale.get(), settings.get()));
        Scale ref = reference.get();
        referenceAnalysis.set(ref == null ? null : ScaleAnalyzer.analyze(ref, settings.get()));
        updateHistoryState();
    }

    private void updateHistoryState() {
        dirty.set(history.isDirty());
        canUndo.set(history.canUndo());
        canRedo.set(history.canRedo());
        undoText.set(history.undoDescription());
        redoText.set(history.redoDescription());
    }

    public ReadOnlyBooleanProperty dirtyProperty() {
        return dirty.getReadOnlyProperty();
    }

    public boolean isDirty() {
        return dirty.get();
    }

    public ReadOnlyBooleanProperty canUndoProperty() {
        return canUndo.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty canRedoProperty() {
        return canRedo.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty undoTextProperty() {
        return undoText.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty redoTextProperty() {
        return redoText.getReadOnlyProperty();
    }

    // ---- files ----

    ReadOnlyObjectProperty<Path> fileProperty() {
        return file.getReadOnlyProperty();
    }

    /** @return the sheet file saves go to, or empty when Save must ask (new or demo sheet) */
    public Optional<Path> file() {
        return Optional.ofNullable(file.get());
    }

    public ReadOnlyStringProperty documentNameProperty() {
        return documentName.getReadOnlyProperty();
    }

    /**
     * Opens a sheet: it becomes the working scale and the reference, and the history starts
     * afresh. A sheet that fails to load changes nothing.
     *
     * @param saveBack false for a sheet that must not be saved over (the demo): Save then asks for a file
     * @throws BadInputException with every problem of the sheet
     */
    public void open(Path sheet, boolean saveBack) throws BadInputException {
        List<String> notes = new ArrayList<>();
        Scale loaded = ReadNotes.toldTo(notes::add, () -> ScaleSheetReader.standard().read(sheet));
        // analysed once before anything changes, so that a fault leaves the session as it was
        ScaleAnalyzer.analyze(loaded, settings.get());
        // a workbook, or a CSV file a spreadsheet wrote in its own way (notes), is not saved over with our CSV
        boolean asWritten = !notes.isEmpty() || !sheet.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".csv");
        history.reset(loaded);
        file.set(saveBack && !asWritten ? sheet : null);
        source.set(sheet);
        documentName.set(sheet.getFileName().toString() + (saveBack ? "" : " (demo)"));
        selectedKey.set(null);
        reference.set(loaded);
        referenceName.set("as opened: " + sheet.getFileName());
        setScale(loaded);
        String told = notes.isEmpty() ? "" : "; " + String.join("; ", notes);
        inform(!saveBack ? "opened the demo sheet " + sheet.getFileName() + " (" + loaded.notes().size()
                + " notes); Save asks for a new file, so the demo stays as it is"
                : asWritten ? "opened " + sheet.getFileName() + " (" + loaded.notes().size() + " notes)" + told
                + "; Save asks for a new CSV file, so the spreadsheet's file stays as it is"
                : "opened " + sheet + " (" + loaded.notes().size() + " notes)");
    }

    /** @return the sheet the working scale was read from or last saved to (the demo included), or empty */
    public Optional<Path> source() {
        return Optional.ofNullable(source.get());
    }

    /**
     * Closes the sheet: the window is left with an empty scale, no file and no reference, the
     * history empty. The caller settles unsaved changes first.
     */
    public void close() {
        Scale empty = emptyScale();
        history.reset(empty);
        file.set(null);
        source.set(null);
        documentName.set("untitled");
        selectedKey.set(null);
        setReference(empty, "none");
        setScale(empty);
        inform("closed; open a sheet with File > Open or File > Open recent");
    }

    /**
     * Opens a scale that has no file of its own (a version from the workshop archive): it becomes
     * the working scale and the reference, the history starts afresh, and Save asks for a file.
     *
     * @param name what the window calls it ({@code grand-190, version 2 (planned)})
     */
    public void openUnfiled(Scale scale, String name) {
        ScaleAnalyzer.analyze(scale, settings.get());
        history.reset(scale);
        file.set(null);
        source.set(null); // nothing on disk to revert to
        documentName.set(name);
        selectedKey.set(null);
        reference.set(scale);
        referenceName.set("as opened: " + name);
        setScale(scale);
        inform("opened " + name + " (" + scale.notes().size() + " notes); Save asks for a file");
    }

    /** Saves to the current file; false when there is none (use {@link #saveAs}). */
    boolean save() throws IOException {
        if (file.get() == null) {
            return false;
        }
        saveAs(file.get());
        return true;
    }

    /**
     * Writes the sheet atomically, keeping the previous file as {@code NAME.bak}; on failure
     * the file on disk is unchanged and the session still points at its old file. A read-only
     * file, a symbolic link, a named pipe or a device is refused ({@link org.scalewright.io.OutputRefused},
     * whose message says why), so a save never loses what is on disk.
     */
    public void saveAs(Path target) throws IOException {
        ScaleSheetWriter.write(scale(), target, true);
        file.set(target);
        source.set(target);
        documentName.set(target.getFileName().toString());
        history.markSaved();
        updateHistoryState();
        inform("saved " + target);
    }

    // ---- reference ----

    public ReadOnlyObjectProperty<ScaleAnalysis> referenceAnalysisProperty() {
        return referenceAnalysis.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<Scale> referenceProperty() {
        return reference.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty referenceNameProperty() {
        return referenceName.getReadOnlyProperty();
    }

    void setReference(Scale ref, String name) {
        reference.set(ref);
        referenceName.set(name);
        referenceAnalysis.set(ScaleAnalyzer.analyze(ref, settings.get()));
    }

    public void useCurrentAsReference() {
        setReference(scale(), "copy of the working scale");
        inform("the working scale as it is now is the reference");
    }

    /** Makes {@code ref} the reference scale under the name {@code name} (a version from the archive). */
    public void useAsReference(Scale ref, String name) {
        setReference(ref, name);
        inform("reference: " + name);
    }

    public void openReference(Path sheet) throws BadInputException {
        List<String> notes = new ArrayList<>();
        setReference(ReadNotes.toldTo(notes::add, () -> ScaleSheetReader.standard().read(sheet)),
                "from " + sheet.getFileName());
        inform("reference scale read from " + sheet + (notes.isEmpty() ? "" : "; " + String.join("; ", notes)));
    }

    public BooleanProperty showReferenceProperty() {
        return showReference;
    }

    public BooleanProperty showDifferencesProperty() {
        return showDifferences;
    }

    // ---- settings ----

    public ReadOnlyObjectProperty<StrengthChoice> strengthProperty() {
        return strength.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<AnalysisSettings> settingsProperty() {
        return settings.getReadOnlyProperty();
    }

    public void setStrength(StrengthChoice choice) {
        strength.set(choice);
        settings.set(settings.get().withStrength(choice.table()));
        reanalyse();
        inform("strength table: " + choice.table().name());
    }

    public ObjectProperty<DisplayUnits> unitsProperty() {
        return units;
    }

    public DisplayUnits units() {
        return units.get();
    }

    // ---- selection and messages ----

    public ObjectProperty<Integer> selectedKeyProperty() {
        return selectedKey;
    }

    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty messageIsProblemProperty() {
        return messageIsProblem.getReadOnlyProperty();
    }

    public void inform(String text) {
        messageIsProblem.set(false);
        message.set(text);
    }

    public void complain(String text) {
        messageIsProblem.set(true);
        message.set(text);
    }
}
