package org.scalewright.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.scalewright.io.AtomicFiles;

/**
 * The files of a report, held in memory until everything is computed, then written into one
 * directory, each file atomically.
 */
public final class ReportFiles {
    private final Map<String, byte[]> files = new LinkedHashMap<>();

    /** Adds a file by name (no directories); a second file of the same name replaces the first. */
    public ReportFiles add(String name, byte[] content) {
        if (name == null || name.isBlank() || name.contains("/") || name.contains("\\")) {
            throw new IllegalArgumentException("report file name must be a plain file name, was '" + name + "'");
        }
        files.put(name, content.clone());
        return this;
    }

    /** Adds a CSV sheet as UTF-8 text. */
    public ReportFiles add(String name, CsvSheet sheet) {
        return add(name, sheet.toText().getBytes(java.nio.charset.StandardCharsets.UTF_8));
    }

    /** @return the file names, in the order added */
    public List<String> names() {
        return List.copyOf(files.keySet());
    }

    /** @return the content of a file, or null */
    public byte[] content(String name) {
        byte[] b = files.get(name);
        return b == null ? null : b.clone();
    }

    /**
     * Checks that {@code dir} can take the files: it is a directory, or does not exist yet and its
     * parent is one.
     *
     * @return a problem in words, or null when the directory will do
     */
    public static String problemWith(Path dir) {
        Path abs = dir.toAbsolutePath();
        if (Files.exists(abs)) {
            if (!Files.isDirectory(abs)) {
                return abs + " is a file, not a directory";
            }
            if (!Files.isWritable(abs)) {
                return "directory " + abs + " cannot be written to";
            }
            return null;
        }
        Path parent = abs.getParent();
        if (parent == null || !Files.isDirectory(parent)) {
            return "the parent directory of " + abs + " does not exist";
        }
        return null;
    }

    /**
     * Creates {@code dir} if needed and writes every file into it atomically.
     *
     * @return the paths written, in order
     */
    public List<Path> writeTo(Path dir) throws IOException {
        Files.createDirectories(dir);
        List<Path> written = new java.util.ArrayList<>();
        for (Map.Entry<String, byte[]> e : files.entrySet()) {
            Path f = dir.resolve(e.getKey());
            AtomicFiles.write(f, e.getValue(), false);
            written.add(f);
        }
        return written;
    }
}
