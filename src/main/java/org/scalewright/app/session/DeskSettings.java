package org.scalewright.app.session;

import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.TreeSet;
import org.scalewright.model.DisplayUnits;
import org.scalewright.model.ForceUnit;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.NumberText;

/**
 * The window's settings remembered between starts, by name: display units, strength table,
 * the A4 last typed, window size, divider positions, the last folder and the recent files.
 * A value that cannot be read back (an older or hand-edited store) counts as not remembered.
 */
public final class DeskSettings {
    static final String UNITS = "units";
    static final String STRENGTH = "strength";
    static final String A4 = "a4-hz";
    static final String WINDOW = "window-size";
    static final String DIVIDERS = "dividers.";
    static final String LAST_FOLDER = "last-folder";
    static final String RECENT = "recent-files";
    static final String SHOWN_COLUMNS = "shown-columns";

    /** What the strength setting holds for the built-in tables; a maker's table is kept as its path. */
    public static final String STRENGTH_MINIMUM = "astm-a228-minimum";
    public static final String STRENGTH_MAXIMUM = "astm-a228-maximum";

    private final SettingsStore store;

    public DeskSettings(SettingsStore store) {
        this.store = store;
    }

    /** @return settings that last only as long as the program (tests, or a window that must not remember) */
    public static DeskSettings forgetful() {
        return new DeskSettings(SettingsStore.inMemory());
    }

    public Optional<DisplayUnits> units() {
        return store.get(UNITS).flatMap(v -> {
            String[] p = v.split(",");
            try {
                return p.length == 2 ? Optional.of(new DisplayUnits(LengthUnit.valueOf(p[0]), ForceUnit.valueOf(p[1])))
                        : Optional.empty();
            } catch (IllegalArgumentException e) {
                return Optional.empty();
            }
        });
    }

    public void units(DisplayUnits u) {
        store.put(UNITS, u.length().name() + "," + u.force().name());
    }

    /** @return {@link #STRENGTH_MINIMUM}, {@link #STRENGTH_MAXIMUM} or the path of a maker's table */
    public Optional<String> strength() {
        return store.get(STRENGTH);
    }

    public void strength(StrengthChoice c) {
        store.put(STRENGTH, c.file().map(Path::toString).orElse(
                c.table() == StrengthChoice.maximum().table() ? STRENGTH_MAXIMUM : STRENGTH_MINIMUM));
    }

    /** @return the pitch standard last typed into the A4 field, Hz */
    public OptionalDouble a4() {
        double[] v = numbers(A4, 1);
        return v == null ? OptionalDouble.empty() : OptionalDouble.of(v[0]);
    }

    public void a4(double hz) {
        store.put(A4, NumberText.plain(hz));
    }

    /** @return the window's width and height, px */
    public Optional<double[]> windowSize() {
        return Optional.ofNullable(numbers(WINDOW, 2)).filter(v -> v[0] >= 200 && v[1] >= 150);
    }

    public void windowSize(double width, double height) {
        store.put(WINDOW, NumberText.plain(Math.rint(width)) + "," + NumberText.plain(Math.rint(height)));
    }

    /** @return the divider positions (0 to 1) of the split pane named {@code which} */
    public Optional<double[]> dividers(String which) {
        return Optional.ofNullable(numbers(DIVIDERS + which, -1))
                .filter(v -> v.length > 0 && Arrays.stream(v).allMatch(d -> d >= 0 && d <= 1));
    }

    public void dividers(String which, double[] positions) {
        store.put(DIVIDERS + which, String.join(",", Arrays.stream(positions)
                .mapToObj(d -> NumberText.plain(Math.rint(d * 1000) / 1000)).toList()));
    }

    public Optional<Path> lastFolder() {
        return store.get(LAST_FOLDER).flatMap(DeskSettings::path);
    }

    public void lastFolder(Path folder) {
        store.put(LAST_FOLDER, folder.toAbsolutePath().toString());
    }

    /** @return the names of the note table's columns shown from its column menu, as kept */
    public Set<String> shownColumns() {
        Set<String> out = new TreeSet<>();
        store.get(SHOWN_COLUMNS).ifPresent(v -> Arrays.stream(v.split(",")).map(String::trim)
                .filter(n -> !n.isEmpty()).forEach(out::add));
        return out;
    }

    public void shownColumns(Set<String> names) {
        if (names.isEmpty()) {
            store.remove(SHOWN_COLUMNS);
        } else {
            store.put(SHOWN_COLUMNS, String.join(",", new TreeSet<>(names)));
        }
    }

    /** @return the recent files, newest first, as kept (some may no longer exist) */
    public List<Path> recentFiles() {
        List<Path> out = new ArrayList<>();
        store.get(RECENT).ifPresent(v -> v.lines().map(DeskSettings::path).flatMap(Optional::stream).forEach(out::add));
        return out;
    }

    public void recentFiles(List<Path> files) {
        if (files.isEmpty()) {
            store.remove(RECENT);
        } else {
            store.put(RECENT, String.join("\n", files.stream().map(Path::toString).toList()));
        }
    }

    /**
     * Writes the settings to lasting storage now. A change is kept at once for this program and
     * reaches lasting storage by itself, at the latest when the program ends normally; the window
     * calls this once as it closes, not on every change.
     */
    public void flush() {
        store.flush();
    }

    /** @return {@code count} numbers (any count when negative) kept under {@code key}, or null */
    private double[] numbers(String key, int count) {
        Optional<String> v = store.get(key);
        if (v.isEmpty()) {
            return null;
        }
        try {
            double[] out = Arrays.stream(v.get().split(",")).map(String::trim)
                    .mapToDouble(t -> Double.parseDouble(t.toLowerCase(Locale.ROOT))).toArray();
            boolean finite = Arrays.stream(out).allMatch(Double::isFinite);
            return finite && (count < 0 || out.length == count) ? out : null;
        } catch (NumberFormatException e) {
            return null;
        }
    }

    private static Optional<Path> path(String text) {
        if (text == null || text.isBlank()) {
            return Optional.empty();
        }
        try {
            return Optional.of(Path.of(text.trim()));
        } catch (InvalidPathException e) {
            return Optional.empty();
        }
    }
}
