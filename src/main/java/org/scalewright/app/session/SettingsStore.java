package org.scalewright.app.session;

import java.util.HashMap;
import java.util.Map;
import java.util.Optional;
import java.util.function.BiConsumer;
import java.util.function.Consumer;
import java.util.function.UnaryOperator;
import java.util.prefs.BackingStoreException;
import java.util.prefs.Preferences;

/**
 * Where the window's settings are kept between starts: a small store of text values by name.
 * The window keeps them in the JDK's {@link Preferences} (the user's node of the program), which
 * writes them to lasting storage by itself, at the latest when the program ends; tests give a
 * throwaway node or {@link #inMemory()}.
 */
public final class SettingsStore {
    private final UnaryOperator<String> reader;
    private final BiConsumer<String, String> writer;
    private final Consumer<String> remover;
    private final Runnable flusher;

    private SettingsStore(UnaryOperator<String> reader, BiConsumer<String, String> writer, Consumer<String> remover,
            Runnable flusher) {
        this.reader = reader;
        this.writer = writer;
        this.remover = remover;
        this.flusher = flusher;
    }

    /** @return a store in {@code node} */
    public static SettingsStore of(Preferences node) {
        return new SettingsStore(key -> node.get(key, null), node::put, node::remove, () -> flush(node));
    }

    /** @return a store that forgets everything when the program ends (tests, or no preferences) */
    public static SettingsStore inMemory() {
        Map<String, String> values = new HashMap<>();
        return new SettingsStore(values::get, values::put, values::remove, () -> { });
    }

    /** @return the user's store of the desktop program: the preferences node {@code /org/scalewright/app} */
    public static SettingsStore forUser() {
        try {
            return of(Preferences.userRoot().node("org/scalewright/app"));
        } catch (SecurityException e) {
            return inMemory();
        }
    }

    /** @return the value kept under {@code key}, or empty */
    public Optional<String> get(String key) {
        return Optional.ofNullable(reader.apply(key));
    }

    /** Keeps {@code value} under {@code key} (at most {@link Preferences#MAX_VALUE_LENGTH} characters). */
    public void put(String key, String value) {
        writer.accept(key, value);
    }

    /** Forgets the value under {@code key}. */
    public void remove(String key) {
        remover.accept(key);
    }

    /** Writes what was kept to lasting storage now; when that fails the settings are simply not remembered. */
    public void flush() {
        flusher.run();
    }

    private static void flush(Preferences node) {
        try {
            node.flush();
        } catch (BackingStoreException | IllegalStateException e) {
            // not remembered this time; the window works the same
        }
    }
}
