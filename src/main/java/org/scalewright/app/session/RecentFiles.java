package org.scalewright.app.session;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

/**
 * The sheets opened or saved lately, newest first, at most {@value #MOST}, remembered in the
 * settings. A file opened again moves to the top; a file found missing when chosen is taken off.
 */
public final class RecentFiles {
    /** How many recent files are kept. */
    public static final int MOST = 10;

    private final DeskSettings settings;
    private final ObservableList<Path> files = FXCollections.observableArrayList();

    public RecentFiles(DeskSettings settings) {
        this.settings = settings;
        List<Path> kept = new ArrayList<>();
        for (Path p : settings.recentFiles()) {
            Path a = p.toAbsolutePath().normalize();
            if (!kept.contains(a) && kept.size() < MOST) {
                kept.add(a);
            }
        }
        files.setAll(kept);
    }

    /** @return the recent files, newest first (read only for callers; changed through this class) */
    public ObservableList<Path> files() {
        return FXCollections.unmodifiableObservableList(files);
    }

    /** Puts {@code file} at the top, dropping the oldest beyond {@value #MOST}. */
    public void add(Path file) {
        Path a = file.toAbsolutePath().normalize();
        List<Path> next = new ArrayList<>(files);
        next.remove(a);
        next.add(0, a);
        while (next.size() > MOST) {
            next.remove(next.size() - 1);
        }
        files.setAll(next);
        settings.recentFiles(next);
    }

    /** Takes {@code file} off the list (a file that is gone). */
    public void remove(Path file) {
        Path a = file.toAbsolutePath().normalize();
        if (files.remove(a)) {
            settings.recentFiles(new ArrayList<>(files));
        }
    }

    /** Empties the list. */
    public void clear() {
        files.clear();
        settings.recentFiles(List.of());
    }
}
