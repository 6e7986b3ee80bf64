package org.scalewright.app.session;

import java.nio.file.Path;

/** File names the window proposes and completes. */
public final class CsvFileNames {
    private CsvFileNames() {
    }

    /** @return {@code p}, with {@code .csv} added when its name has no extension */
    public static Path withCsvExtension(Path p) {
        String name = p.getFileName().toString();
        return name.contains(".") ? p : p.resolveSibling(name + ".csv");
    }

    /** @return true when {@code p} names a {@code .csv} file (any case) */
    public static boolean isCsv(Path p) {
        Path name = p.getFileName();
        return name != null && name.toString().toLowerCase(java.util.Locale.ROOT).endsWith(".csv");
    }
}
