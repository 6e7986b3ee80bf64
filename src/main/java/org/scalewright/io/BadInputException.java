package org.scalewright.io;

import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;

/**
 * Thrown when an input file cannot be read; carries the problems found, each with file, line and
 * column: the first {@value InputLimits#MAX_PROBLEMS}, then one line saying how many more there were.
 */
public class BadInputException extends Exception {
    private static final long serialVersionUID = 1L;
    private final transient List<SheetProblem> problems;

    public BadInputException(List<SheetProblem> problems) {
        this(InputLimits.told(problems), true);
    }

    private BadInputException(List<SheetProblem> told, boolean limited) {
        super(told.stream().map(SheetProblem::toString).collect(Collectors.joining("\n")));
        this.problems = List.copyOf(told);
    }

    /** @return a whole-file problem */
    public static BadInputException of(Path file, String message) {
        return new BadInputException(List.of(new SheetProblem(file, 0, "", message)));
    }

    /** @return the problems as told, in file order (at most {@value InputLimits#MAX_PROBLEMS} and a count of the rest) */
    public List<SheetProblem> problems() {
        return problems;
    }
}
