package org.scalewright.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.scalewright.io.AtomicFiles;
import org.scalewright.io.CsvDialect;
import org.scalewright.io.TableFiles;
import org.scalewright.io.OutputRefused;
import org.scalewright.io.ScaleSheetWriter;
import org.scalewright.model.Scale;

/**
 * Writes command output files, turning a file-system failure into a one-line user error. A file
 * replaced by {@code --out} is kept as {@code NAME.bak}; a symbolic link, a named pipe, a device or a
 * read-only file is refused (io.AtomicFiles), and an input of the command is refused before
 * anything is computed ({@link OutputChecks}).
 */
public final class Outputs {
    private Outputs() {
    }

    /**
     * Writes a table of results atomically, keeping a file it replaces as {@code NAME.bak}: an .xlsx
     * workbook when the name ends in .xlsx, else CSV in {@code dialect} ({@link TableFiles}).
     */
    public static void table(Path file, CsvDialect dialect, List<String> comments, List<String> header,
                             List<List<String>> rows) {
        checkTarget(file);
        String refusal = TableFiles.refusal(file);
        if (refusal != null) {
            throw new UserError("--out: " + refusal);
        }
        try {
            TableFiles.write(file, "results", comments, header, rows, dialect, true);
        } catch (OutputRefused e) {
            throw refused(file, e);
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
    public static String tableIfAsked(Path out, CsvDialect dialect, List<String> comments, List<String> header,
                                      List<List<String>> rows) {
        if (out == null) {
            return "";
        }
        table(out, dialect, comments, header, rows);
        return "wrote " + out;
    }

    /** Prints the closing line of {@link #csvIfAsked}, after a blank line, when there is one. */
    public static void printClosing(java.io.PrintWriter w, String closing) {
        if (!closing.isEmpty()) {
            w.println();
            w.println(closing);
        }
    }

    /** Writes a scale sheet atomically, keeping the input's units and a file it replaces as {@code NAME.bak}. */
    public static void sheet(Path file, Scale scale) {
        checkTarget(file);
        if (TableFiles.isWorkbook(file) || TableFiles.refusal(file) != null) {
            throw new UserError("--out: a scale sheet is written as CSV (it is read back by this program and by "
                    + "any spreadsheet); name it .csv");
        }
        try {
            ScaleSheetWriter.write(scale, file, true);
        } catch (OutputRefused e) {
            throw refused(file, e);
        } catch (IOException e) {
            throw new UserError("cannot write " + file + ": " + describe(e));
        }
    }

    /**
     * A missing folder, a folder in the way, a link, a pipe, a device or a read-only file is said
     * plainly (not as the temporary file's error).
     */
    static void checkTarget(Path file) {
        String problem = AtomicFiles.problemWithFile(file);
        if (problem != null) {
            throw new UserError("cannot write " + file + ": " + problem);
        }
    }

    private static UserError refused(Path file, OutputRefused e) {
        return new UserError("cannot write " + file + ": " + e.getMessage());
    }

    static String describe(IOException e) {
        String m = e.getMessage();
        return e.getClass().getSimpleName().replace("Exception", "").replaceAll("([a-z])([A-Z])", "$1 $2")
                .toLowerCase(java.util.Locale.ROOT) + (m == null ? "" : " (" + m + ")");
    }
}
