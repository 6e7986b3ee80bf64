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

    private static boolean shows(String row, double tension, double pct, boolean slack) {
        String t = String.format(Locale.ROOT, "→ %.0f ", tension);
        String p = String.format(Locale.ROOT, "→ %.1f", pct);
        if (row.contains(t) && row.contains(p)) {
            return true;
        }
        if (!slack) {
            return false;
        }
        for (int d = -1; d <= 1; d++) {
            for (int e = -1; e <= 1; e++) {
                if (row.contains(String.format(Locale.ROOT, "→ %.0f ", Math.rint(tension) + d))
                        && row.contains(String.format(Locale.ROOT, "→ %.1f", Math.rint(pct * 10) / 10 + e / 10.0))) {
                    return true;
                }
            }
        }
        return false;
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
        return checkRowsMatchReanalysis(r, written, false);
    }

    /**
     * As {@link #checkRowsMatchReanalysis(Run, Path)}; with {@code slack} a shown figure may also be the
     * neighbour in its last digit: a metric diameter written on an inch sheet reads back to 0.00001 in, not
     * to the exact double the plan computed with (DEVELOPERS.md, "Numbers in files").
     */
    static int checkRowsMatchReanalysis(Run r, Path written, boolean slack) throws Exception {
        ScaleAnalysis again = ScaleAnalyzer.analyze(ScaleSheetReader.standard().read(written),
                BuiltInData.defaultSettings());
        int checked = 0;
        for (NoteResult n : again.notes()) {
            String row = r.row(n.key());
            if (row == null) {
                continue;
            }
            if (!shows(row, n.tension(), n.breakPct(), slack)) {
                throw new AssertionError("key " + n.key() + ": re-analysed → " + n.tension() + " → " + n.breakPct()
                        + " not in row: " + row);
            }
            checked++;
        }
        return checked;
    }
}
