package org.scalewright.report;

import org.scalewright.io.CsvSheet;
import java.io.IOException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.scalewright.io.AtomicFiles;

/**
 * The files of a report, held in memory until everything is computed, then written into one
 * directory as a whole: the new folder is swapped in for the old one.
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
     * Checks that {@code dir} can take a report before anything is computed: a folder that may be
     * replaced, or a new name in an existing folder (io.AtomicFiles#problemWithFolder). What the
     * folder holds is checked when the report is written.
     *
     * @return a problem in words, or null when the directory will do
     */
    public static String problemWith(Path dir) {
        String problem = AtomicFiles.problemWithFolder(dir, null);
        return problem == null ? null : dir.toAbsolutePath() + " cannot take the report: " + problem;
    }

    /**
     * Writes the report whole: into a new folder beside {@code dir}, which is then swapped in, so
     * that {@code dir} holds the old report or the new one, never a mixture, and no temporary files
     * are left ({@link AtomicFiles#writeFolder}). An existing {@code dir} may hold only files of a
     * report, which the new one replaces.
     *
     * @return the paths written, in order
     */
    public List<Path> writeTo(Path dir) throws IOException {
        AtomicFiles.writeFolder(dir, files);
        List<Path> written = new java.util.ArrayList<>();
        for (String name : files.keySet()) {
            written.add(dir.resolve(name));
        }
        return written;
    }
}
