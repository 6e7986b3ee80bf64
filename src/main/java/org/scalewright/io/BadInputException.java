package org.scalewright.io;

import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;

/** Thrown when an input file cannot be read; carries every problem found, each with file, line and column. */
public class BadInputException extends Exception {
    private static final long serialVersionUID = 1L;
    private final transient List<SheetProblem> problems;

    public BadInputException(List<SheetProblem> problems) {
        super(problems.stream().map(SheetProblem::toString).collect(Collectors.joining("\n")));
        this.problems = List.copyOf(problems);
    }

    /** @return a whole-file problem */
    public static BadInputException of(Path file, String message) {
        return new BadInputException(List.of(new SheetProblem(file, 0, "", message)));
    }

    /** @return the problems, in file order */
    public List<SheetProblem> problems() {
        return problems;
    }
}
