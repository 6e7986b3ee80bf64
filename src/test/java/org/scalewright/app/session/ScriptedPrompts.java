package org.scalewright.app.session;

import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Optional;

/** Answers the window's questions from a script and records what it was shown. */
public final class ScriptedPrompts implements UserPrompts {
    public final Deque<SaveChoice> saveAnswers = new ArrayDeque<>();
    public final Deque<Path> files = new ArrayDeque<>();
    public final List<String> shown = new ArrayList<>();
    public final List<String> problems = new ArrayList<>();
    public int saveQuestions;
    /** Answers to {@link #confirm}, in order; none left means no. */
    public final Deque<Boolean> confirmAnswers = new ArrayDeque<>();
    public final List<String> questions = new ArrayList<>();

    @Override
    public SaveChoice askToSave(String documentName) {
        saveQuestions++;
        return saveAnswers.isEmpty() ? SaveChoice.CANCEL : saveAnswers.pop();
    }

    @Override
    public Optional<Path> chooseSheetToOpen(String title) {
        return Optional.ofNullable(files.poll());
    }

    @Override
    public Optional<Path> chooseSheetToSave(String suggestedName) {
        return Optional.ofNullable(files.poll());
    }

    @Override
    public Optional<Path> chooseStrengthTable() {
        return Optional.ofNullable(files.poll());
    }

    @Override
    public void showProblems(String title, String intro, List<String> list) {
        shown.add(title);
        problems.addAll(list);
    }

    @Override
    public void showError(String title, String message) {
        shown.add(title + ": " + message);
    }

    @Override
    public void showCautions(List<String> cautions) {
        shown.add("cautions");
        shown.addAll(cautions);
    }

    @Override
    public boolean confirm(String title, String question, String yesWords) {
        questions.add(question);
        return !confirmAnswers.isEmpty() && confirmAnswers.pop();
    }

    @Override
    public void showInformation(String title, String header, String message) {
        shown.add(title + ": " + header + "\n" + message);
    }
}
