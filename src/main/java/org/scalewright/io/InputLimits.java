package org.scalewright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.scalewright.model.KeyNames;

/**
 * How much every reader takes in (DESIGN §4, "Limits"; DEVELOPERS.md, "Choices made"): the size
 * of a file, its rows, and how many problems are told before the rest is only counted. The
 * limits are far above any piano's data, so that they only stop a file that is not what it
 * claims to be before it costs time or memory.
 */
public final class InputLimits {
    /** The largest input file read, bytes (2 MiB; an 88-key sheet with remarks is about 10 kB). */
    public static final long MAX_FILE_BYTES = 2L * 1024 * 1024;
    /**
     * The most data rows of a scale sheet, a target curve or a pitch file: every row is one key
     * and only {@value KeyNames#LOWEST_KEY} … {@value KeyNames#HIGHEST_KEY} are accepted, so 400
     * leaves room for rows that will be refused one by one with their place.
     */
    public static final int MAX_KEY_ROWS = 400;
    /** The most data rows of a strength table (a maker's table has some tens of diameters). */
    public static final int MAX_TABLE_ROWS = 1000;
    /** The most problems told one by one; the rest are counted in one more line. */
    public static final int MAX_PROBLEMS = 50;

    private InputLimits() {
    }

    /**
     * @return the problems as they are told: the first {@value #MAX_PROBLEMS}, and when there
     *         were more, one line more saying how many more there were
     */
    static List<SheetProblem> told(List<SheetProblem> problems) {
        if (problems.size() <= MAX_PROBLEMS) {
            return problems;
        }
        List<SheetProblem> out = new ArrayList<>(problems.subList(0, MAX_PROBLEMS));
        int more = problems.size() - MAX_PROBLEMS;
        Path file = problems.get(MAX_PROBLEMS).file();
        out.add(new SheetProblem(file, 0, "", more + " more problem" + (more == 1 ? "" : "s")
                + " not shown (the first " + MAX_PROBLEMS + " are above)"));
        return out;
    }
}
