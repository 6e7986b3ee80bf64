package org.scalewright.app.session;

import java.util.HashMap;
import java.util.Map;
import java.util.Optional;
import java.util.prefs.BackingStoreException;
import java.util.prefs.Preferences;

/**
 * Where the window's settings are kept between starts: a small store of text values by name.
 * The window keeps them in the JDK's {@link Preferences} (the user's node of the program);
 * tests give a throwaway node or {@link #inMemory()}.
 */
public interface SettingsStore {
    /** @return the value kept under {@code key}, or empty */
    Optional<String> get(String key);

    /** Keeps {@code value} under {@code key} (at most {@link Preferences#MAX_VALUE_LENGTH} characters). */
    void put(String key, String value);

    /** Forgets the value under {@code key}. */
    void remove(String key);

    /** Writes what was kept to lasting storage; when that fails the settings are simply not remembered. */
    void flush();

    /** @return a store in {@code node} */
    static SettingsStore of(Preferences node) {
        return new SettingsStore() {
            @Override
            public Optional<String> get(String key) {
                return Optional.ofNullable(node.get(key, null));
            }

            @Override
            public void put(String key, String value) {
                node.put(key, value);
            }

            @Override
            public void remove(String key) {
                node.remove(key);
            }

            @Override
            public void flush() {
                try {
                    node.flush();
                } catch (BackingStoreException | IllegalStateException e) {
                    // not remembered this time; the window works the same
                }
            }
        };
    }

    /** @return a store that forgets everything when the program ends (tests, or no preferences) */
    static SettingsStore inMemory() {
        Map<String, String> values = new HashMap<>();
        return new SettingsStore() {
            @Override
            public Optional<String> get(String key) {
                return Optional.ofNullable(values.get(key));
            }

            @Override
            public void put(String key, String value) {
                values.put(key, value);
            }

            @Override
            public void remove(String key) {
                values.remove(key);
            }

            @Override
            public void flush() {
                // nothing lasting
            }
        };
    }

    /** @return the user's store of the desktop program: the preferences node {@code /org/scalewright/app} */
    static SettingsStore forUser() {
        try {
            return of(Preferences.userRoot().node("org/scalewright/app"));
        } catch (SecurityException e) {
            return inMemory();
        }
    }
}
