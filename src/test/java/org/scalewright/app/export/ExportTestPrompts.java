package org.scalewright.app.export;

import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Optional;
import org.scalewright.app.session.UserPrompts;

/** Answers the export choosers from a script and records the errors shown and the extensions asked for. */
public final class ExportTestPrompts implements UserPrompts {
    public final Deque<Path> files = new ArrayDeque<>();
    final List<String> errors = new ArrayList<>();
    final List<String> extensionsAsked = new ArrayList<>();
    final List<String> suggestedNames = new ArrayList<>();

    @Override
    public SaveChoice askToSave(String documentName) {
        return SaveChoice.CANCEL;
    }

    @Override
    public Optional<Path> chooseSheetToOpen(String title) {
        return Optional.empty();
    }

    @Override
    public Optional<Path> chooseSheetToSave(String suggestedName) {
        return Optional.empty();
    }

    @Override
    public Optional<Path> chooseStrengthTable() {
        return Optional.empty();
    }

    @Override
    public void showProblems(String title, String intro, List<String> problems) {
        errors.add(title + ": " + intro);
    }

    @Override
    public void showError(String title, String message) {
        errors.add(title + ": " + message);
    }

    @Override
    public void showCautions(List<String> cautions) {
    }

    @Override
    public Optional<Path> chooseExportFile(String title, String suggestedName, String extension) {
        extensionsAsked.add(extension);
        suggestedNames.add(suggestedName);
        return Optional.ofNullable(files.poll());
    }

    @Override
    public Optional<Path> chooseExportFolder(String title) {
        return Optional.ofNullable(files.poll());
    }
}
