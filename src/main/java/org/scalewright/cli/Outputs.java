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
        try {
            CsvReportWriter.write(file, comments, header, rows);
        } catch (IOException e) {
            throw new UserError("cannot write " + file + ": " + describe(e));
        }
    }

    /** Writes a scale sheet atomically, keeping the input's units. */
    public static void sheet(Path file, Scale scale) {
        try {
            ScaleSheetWriter.write(scale, file, false);
        } catch (IOException e) {
            throw new UserError("cannot write " + file + ": " + describe(e));
        }
    }

    static String describe(IOException e) {
        String m = e.getMessage();
        return e.getClass().getSimpleName().replace("Exception", "").replaceAll("([a-z])([A-Z])", "$1 $2")
                .toLowerCase(java.util.Locale.ROOT) + (m == null ? "" : " (" + m + ")");
    }
}
