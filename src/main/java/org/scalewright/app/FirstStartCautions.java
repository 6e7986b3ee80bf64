package org.scalewright.app;

import org.scalewright.app.session.SettingsStore;

/**
 * Remembers, in the window's settings store, that the safety cautions were shown once, so that
 * they open by themselves on the first start only (they stay under Help > Safety cautions).
 */
final class FirstStartCautions {
    private static final String KEY = "cautions-shown";
    private final SettingsStore store;

    FirstStartCautions(SettingsStore store) {
        this.store = store;
    }

    /** The store of the desktop app, {@link SettingsStore#forUser()}. */
    static FirstStartCautions forUser() {
        return new FirstStartCautions(SettingsStore.forUser());
    }

    boolean alreadyShown() {
        return store.get(KEY).map(Boolean::parseBoolean).orElse(false);
    }

    /** Marks them shown and writes that out at once (it happens once per user). */
    void markShown() {
        store.put(KEY, "true");
        store.flush();
    }
}
