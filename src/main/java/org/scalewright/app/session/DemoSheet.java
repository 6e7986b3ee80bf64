package org.scalewright.app.session;

import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Finds the invented demo grand that the window opens when started without a sheet: in
 * {@code demo-instruments/grand-190/} under the working directory, or beside the program's
 * jar (or one folder up, for {@code target/scalewright.jar} in the project).
 */
public final class DemoSheet {
    public static final Path RELATIVE = Path.of("demo-instruments", "grand-190", "grand-190.csv");

    private DemoSheet() {
    }

    /** @return the places looked at, in order */
    public static List<Path> candidates() {
        List<Path> out = new ArrayList<>();
        out.add(Path.of(System.getProperty("user.dir")).resolve(RELATIVE));
        try {
            var source = DemoSheet.class.getProtectionDomain().getCodeSource();
            if (source != null) {
                Path jar = Path.of(source.getLocation().toURI());
                Path dir = Files.isDirectory(jar) ? jar : jar.getParent();
                for (int up = 0; up < 3 && dir != null; up++, dir = dir.getParent()) {
                    out.add(dir.resolve(RELATIVE));
                }
            }
        } catch (URISyntaxException | SecurityException | IllegalArgumentException e) {
            // only the working directory is looked at
        }
        return out;
    }

    /** @return the demo sheet, if one of the candidates exists */
    public static Optional<Path> find() {
        return candidates().stream().filter(Files::isRegularFile).findFirst();
    }
}
