package org.scalewright.app.session;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Small invented scale sheets written into a test's temporary folder (never check values). */
public final class TestSheets {
    private TestSheets() {
    }

    /** Ten notes: four wound bass strings (keys 1–4, diameters in mm) and six plain (keys 5–10, size numbers). */
    public static final String SMALL = """
            # title: small invented test scale
            # a4_hz: 440
            key,section,strings,length_mm,wire,wire_mm,wrap1_mm,wrap2_mm,wrap_metal
            1,bass,1,1400,,1.50,1.10,0.90,copper
            2,bass,1,1380,,1.50,1.00,0.85,copper
            3,bass,2,1360,,1.40,0.95,,copper
            4,bass,2,1340,,1.40,0.90,,copper
            5,tenor,3,1100,20,,,,
            6,tenor,3,1060,20,,,,
            7,tenor,3,1020,19.5,,,,
            8,tenor,3,985,19.5,,,,
            9,tenor,3,950,19,,,,
            10,tenor,3,915,19,,,,
            """;

    public static Path write(Path dir, String name, String text) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, text);
        return p;
    }

    public static Path small(Path dir) throws IOException {
        return write(dir, "small.csv", SMALL);
    }

    /** The invented demo grand of the project, read from the working directory (the project root). */
    public static Path demoGrand() {
        Path p = Path.of("demo-instruments", "grand-190", "grand-190.csv");
        if (!Files.isRegularFile(p)) {
            throw new IllegalStateException("the demo grand is missing at " + p.toAbsolutePath());
        }
        return p;
    }
}
