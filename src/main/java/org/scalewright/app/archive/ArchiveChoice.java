package org.scalewright.app.archive;

import java.nio.file.Path;
import java.util.prefs.Preferences;
import org.scalewright.archive.ArchiveLocation;

/**
 * Which archive file the window uses: the one chosen last (kept in the user's preferences), else
 * the default in the user's data folder ({@link ArchiveLocation}); the system property
 * {@code scalewright.archive} overrides both.
 */
public final class ArchiveChoice {
    private static final String KEY = "archiveFile";

    private ArchiveChoice() {
    }

    /** @return the archive file to start with */
    public static Path file() {
        String chosen = System.getProperty("scalewright.archive");
        if (chosen != null && !chosen.isBlank()) {
            return Path.of(chosen);
        }
        String kept = prefs().get(KEY, null);
        return kept != null ? Path.of(kept) : ArchiveLocation.defaultFile();
    }

    /** Keeps {@code file} for the next start. */
    public static void remember(Path file) {
        prefs().put(KEY, file.toAbsolutePath().toString());
    }

    private static Preferences prefs() {
        return Preferences.userNodeForPackage(ArchiveChoice.class);
    }
}
