package org.scalewright.archive;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;

/**
 * Where the archive lives when no file is named: {@code archive.db} in the user's data folder —
 * on Linux {@code $XDG_DATA_HOME/scalewright} (else {@code ~/.local/share/scalewright}, the XDG Base
 * Directory Specification), on macOS {@code ~/Library/Application Support/Scalewright}, on Windows
 * {@code %APPDATA%\Scalewright}. The system property {@code scalewright.archive} names another file.
 */
public final class ArchiveLocation {
    /** The file's name in the data folder. */
    public static final String FILE_NAME = "archive.db";

    private ArchiveLocation() {
    }

    /** @return the default archive file of this user on this system */
    public static Path defaultFile() {
        String chosen = System.getProperty("scalewright.archive");
        if (chosen != null && !chosen.isBlank()) {
            return Path.of(chosen);
        }
        return dataFolder(System.getProperty("os.name", ""), System.getenv(), System.getProperty("user.home", "."))
                .resolve(FILE_NAME);
    }

    /**
     * @param os   the system's name ({@code os.name})
     * @param env  the environment
     * @param home the user's home folder
     * @return the user's data folder for Scalewright
     */
    static Path dataFolder(String os, Map<String, String> env, String home) {
        String o = os.toLowerCase(Locale.ROOT);
        if (o.startsWith("windows")) {
            String appData = env.get("APPDATA");
            return (appData != null && !appData.isBlank() ? Path.of(appData) : Path.of(home, "AppData", "Roaming"))
                    .resolve("Scalewright");
        }
        if (o.startsWith("mac")) {
            return Path.of(home, "Library", "Application Support", "Scalewright");
        }
        String xdg = env.get("XDG_DATA_HOME");
        // the specification: a relative XDG_DATA_HOME is invalid and is ignored
        Path base = xdg != null && !xdg.isBlank() && Path.of(xdg).isAbsolute() ? Path.of(xdg)
                : Path.of(home, ".local", "share");
        return base.resolve("scalewright");
    }

    /** Creates the folder of the default archive file where it does not exist yet. */
    public static void createFolderOf(Path file) {
        Path parent = file.toAbsolutePath().getParent();
        try {
            Files.createDirectories(parent);
        } catch (IOException e) {
            throw new ArchiveRefused("cannot create the folder " + parent + " for the archive: " + e.getMessage());
        }
    }
}
