package org.scalewright.app.session;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * The questions and notices the window puts to the user. The window answers them with
 * dialogs; tests answer them from a script.
 */
public interface UserPrompts {
    /** What to do with unsaved changes. */
    enum SaveChoice { SAVE, DISCARD, CANCEL }

    /** @return whether to save the changes to {@code documentName} before going on */
    SaveChoice askToSave(String documentName);

    /** @return the sheet to open, or empty when the user cancelled */
    Optional<Path> chooseSheetToOpen(String title);

    /** @return where to save the sheet, or empty when the user cancelled */
    Optional<Path> chooseSheetToSave(String suggestedName);

    /** @return the maker's strength table to read, or empty when the user cancelled */
    Optional<Path> chooseStrengthTable();

    /** Shows the problems of a file that could not be read, one per line. */
    void showProblems(String title, String intro, List<String> problems);

    /** Shows that something failed and why. */
    void showError(String title, String message);

    /** Shows the safety cautions. */
    void showCautions(List<String> cautions);

    /**
     * Asks a yes-or-no question before something that cannot be undone (revert to the saved sheet).
     *
     * @return true when the user agreed; by default false (nothing is done without asking)
     */
    default boolean confirm(String title, String question, String yesWords) {
        return false;
    }

    /** Shows a notice that needs no answer (About, a new sheet written); by default not shown. */
    default void showInformation(String title, String header, String message) {
    }

    // ---- exports ----

    /**
     * @param title         the chooser's title
     * @param suggestedName the file name offered
     * @param extension     the file name extension of the export, without the dot ({@code csv}, {@code png}, …)
     * @return where to write an exported file (results CSV, chart, report piece), or empty when
     *         the user cancelled; by default asked like a sheet to save (a window gives it its own
     *         chooser filtered to the extension)
     */
    default Optional<Path> chooseExportFile(String title, String suggestedName, String extension) {
        return chooseSheetToSave(suggestedName);
    }

    /** @return the folder to write the whole report into, or empty when the user cancelled */
    default Optional<Path> chooseExportFolder(String title) {
        return Optional.empty();
    }

    /**
     * @return a per-note file of how far flat the piano stands (key, cents_flat), or empty when
     *         the user cancelled; by default asked like a sheet to open
     */
    default Optional<Path> choosePitchStateFile() {
        return chooseSheetToOpen("Open the cents flat per note");
    }

    /** @return a workshop archive file to use, or empty when the user cancelled; by default asked like a sheet */
    default Optional<Path> chooseArchiveFile() {
        return chooseSheetToOpen("Choose the workshop archive");
    }
}
