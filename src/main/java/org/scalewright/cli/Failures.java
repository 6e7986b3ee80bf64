package org.scalewright.cli;

import java.io.PrintWriter;
import org.scalewright.io.BadInputException;
import org.scalewright.io.SheetProblem;
import org.scalewright.model.InvalidInput;
import picocli.CommandLine;

/** Turns exceptions from a command into messages and exit statuses, without stack traces. */
final class Failures implements CommandLine.IExecutionExceptionHandler {
    private final PrintWriter err;

    Failures(PrintWriter err) {
        this.err = err;
    }

    @Override
    public int handleExecutionException(Exception ex, CommandLine cl, CommandLine.ParseResult parsed) {
        Throwable e = ex;
        if (e instanceof BadInputException bad) {
            for (SheetProblem p : bad.problems()) {
                err.println("error: " + p);
            }
            err.flush();
            return ExitStatus.BAD_INPUT;
        }
        if (e instanceof UserError || e instanceof InvalidInput || e instanceof IllegalArgumentException) {
            for (String line : e.getMessage().split("\n")) {
                err.println("error: " + line);
            }
            err.flush();
            return ExitStatus.BAD_INPUT;
        }
        err.println("internal error: " + e + (e.getStackTrace().length > 0 ? " at " + e.getStackTrace()[0] : ""));
        err.println("please report this with the input that caused it");
        err.flush();
        return ExitStatus.INTERNAL;
    }
}
