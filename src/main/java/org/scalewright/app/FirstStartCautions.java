package org.scalewright.app;

import java.util.prefs.BackingStoreException;
import java.util.prefs.Preferences;

/**
 * Remembers, in the user's preferences, that the safety cautions were shown once, so that
 * they open by themselves on the first start only (they stay under Help > Safety cautions).
 */
final class FirstStartCautions {
    private static final String KEY = "cautions-shown";
    private final Preferences prefs;

    FirstStartCautions(Preferences prefs) {
        this.prefs = prefs;
    }

    /** The preferences node of the desktop app. */
    static FirstStartCautions forUser() {
        return new FirstStartCautions(Preferences.userNodeForPackage(FirstStartCautions.class));
    }

    boolean alreadyShown() {
        return prefs.getBoolean(KEY, false);
    }

    void markShown() {
        prefs.putBoolean(KEY, true);
        try {
            prefs.flush();
        } catch (BackingStoreException e) {
            // not remembered: the cautions show again next time, which is harmless
        }
    }
}
