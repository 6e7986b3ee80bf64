package org.scalewright.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

/** Runs the command line in-process for the planning command tests. */
final class PlanCommandRunner {
    record Run(int status, String out, String err) {
        List<String> errLines() {
            return err.isEmpty() ? List.of() : Arrays.asList(err.split("\n"));
        }

        /** @return the change-table row of a key, or null */
        String row(int key) {
            for (String line : out.split("\n")) {
                if (line.matches("\\s*" + key + "\\s+[A-G]#?-?\\d.*")) {
                    return line;
                }
            }
            return null;
        }
    }

    private PlanCommandRunner() {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int rc = ScalewrightCommand.run(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(rc, out.toString(), err.toString());
    }

    /**
     * Reads the written sheet back, analyses it as {@code analyze} does, and checks that each
     * planned key's row shows those figures after the arrow.
     *
     * @return the number of rows checked
     */
    static int checkRowsMatchReanalysis(Run r, Path written) throws Exception {
        ScaleAnalysis again = ScaleAnalyzer.analyze(ScaleSheetReader.standard().read(written),
                BuiltInData.defaultSettings());
        int checked = 0;
        for (NoteResult n : again.notes()) {
            String row = r.row(n.key());
            if (row == null) {
                continue;
            }
            String t = String.format(Locale.ROOT, "→ %.0f ", n.tension());
            String pct = String.format(Locale.ROOT, "→ %.1f", n.breakPct());
            if (!row.contains(t) || !row.contains(pct)) {
                throw new AssertionError("key " + n.key() + ": re-analysed " + t + pct + " not in row: " + row);
            }
            checked++;
        }
        return checked;
    }
}
