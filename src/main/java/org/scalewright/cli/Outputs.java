package org.scalewright.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.scalewright.io.CsvReportWriter;
import org.scalewright.io.ScaleSheetWriter;
import org.scalewright.model.Scale;

/** Writes command output files, turning a file-system failure into a one-line user error. */
public final class Outputs {
    private Outputs() {
    }

    /** Writes a results CSV atomically. */
    public static void csv(Path file, List<String> comments, List<String> header, List<List<String>> rows) {
        checkTarget(file);
        try {
            CsvReportWriter.write(file, comments, header, rows);
        } catch (IOException e) {
            throw new UserError("cannot write " + file + ": " + describe(e));
        }
    }

    /**
     * Writes a results CSV when {@code --out} was given, before anything is printed, so that a
     * file that cannot be written ends the command with only its error.
     *
     * @return a closing line to print after the results ("wrote FILE"), or "" when no file was asked for
     */
    public static String csvIfAsked(Path out, List<String> comments, List<String> header, List<List<String>> rows) {
        if (out == null) {
            return "";
        }
        csv(out, comments, header, rows);
        return "wrote " + out;
    }

    /** Prints the closing line of {@link #csvIfAsked}, after a blank line, when there is one. */
    public static void printClosing(java.io.PrintWriter w, String closing) {
        if (!closing.isEmpty()) {
            w.println();
            w.println(closing);
        }
    }

    /** Writes a scale sheet atomically, keeping the input's units. */
    public static void sheet(Path file, Scale scale) {
        checkTarget(file);
        try {
            ScaleSheetWriter.write(scale, file, false);
        } catch (IOException e) {
            throw new UserError("cannot write " + file + ": " + describe(e));
        }
    }

    /** A missing folder or a folder in the way is said plainly (not as the temporary file's error). */
    private static void checkTarget(Path file) {
        Path abs = file.toAbsolutePath();
        if (java.nio.file.Files.isDirectory(abs)) {
            throw new UserError("cannot write " + file + ": it is a folder; give a file name");
        }
        Path dir = abs.getParent();
        if (dir == null || !java.nio.file.Files.isDirectory(dir)) {
            throw new UserError("cannot write " + file + ": the folder " + dir + " does not exist");
        }
    }

    static String describe(IOException e) {
        String m = e.getMessage();
        return e.getClass().getSimpleName().replace("Exception", "").replaceAll("([a-z])([A-Z])", "$1 $2")
                .toLowerCase(java.util.Locale.ROOT) + (m == null ? "" : " (" + m + ")");
    }
}
