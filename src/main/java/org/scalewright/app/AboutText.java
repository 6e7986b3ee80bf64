package org.scalewright.app;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.util.Optional;
import java.util.Properties;
import org.scalewright.io.LogFiles;

/** What Help › About says: the program's version, where its log and settings are kept. */
final class AboutText {
    /** Written into the jar by Maven from the project's version. */
    private static final String POM_PROPERTIES = "/META-INF/maven/org.scalewright/scalewright/pom.properties";

    private AboutText() {
    }

    /** @return the version the jar was built as ({@code 0.1.0-SNAPSHOT}), or words saying it is unknown */
    static String version() {
        try (InputStream in = AboutText.class.getResourceAsStream(POM_PROPERTIES)) {
            if (in != null) {
                Properties p = new Properties();
                p.load(in);
                String v = p.getProperty("version");
                if (v != null && !v.isBlank()) {
                    return v.trim();
                }
            }
        } catch (IOException | IllegalArgumentException e) {
            // said below
        }
        String manifest = AboutText.class.getPackage().getImplementationVersion();
        return manifest != null ? manifest : "(version unknown: not run from the built jar)";
    }

    /**
     * @param log the log file in use, or empty when none could be written
     * @return the About text, a line per fact
     */
    static String text(Optional<Path> log) {
        Path folder = LogFiles.userLogFolder();
        return String.join("\n",
                "Scalewright " + version(),
                "A piano scaling workstation: string tensions, stress, inharmonicity, rescaling.",
                "",
                "Log file: " + log.map(Path::toString).orElse("none (the folder " + folder + " could not be written)"),
                "Log folder: " + folder + " (" + LogFiles.ROLL_COUNT + " files of up to "
                        + LogFiles.ROLL_BYTES / (1024 * 1024) + " MiB, the newest scalewright-0.log)",
                "Settings: the Java preferences of this user, node /org/scalewright/app",
                "Java " + System.getProperty("java.version") + ", JavaFX " + System.getProperty("javafx.version", "?")
                        + ", " + System.getProperty("os.name") + " " + System.getProperty("os.arch"),
                "",
                "Tensions and pitch raises can break strings and harm people: see Help > Safety cautions, "
                        + "and follow the maker's specifications and licensed practice.");
    }
}
