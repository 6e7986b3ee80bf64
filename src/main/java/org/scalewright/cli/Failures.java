package org.scalewright.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import org.scalewright.design.rescale.PlanNotPossible;
import org.scalewright.io.BadInputException;
import org.scalewright.io.LogFiles;
import org.scalewright.io.SheetProblem;
import org.scalewright.model.InvalidInput;
import org.scalewright.report.ChartsNotDrawn;
import picocli.CommandLine;

/**
 * Turns exceptions from a command into messages and exit statuses (DESIGN §5), never a stack
 * trace on the terminal. Bad input — a bad sheet ({@link BadInputException}), a refused value
 * ({@link InvalidInput}, {@link UserError}), a plan the constraints do not allow
 * ({@link PlanNotPossible}), a bad argument — exits 2 with one line per problem. Anything else,
 * an {@link IllegalArgumentException} from an engine precondition included, is a program error:
 * exit 1, one line on standard error, and the stack trace appended to the error log. A machine
 * that cannot draw the charts ({@link ChartsNotDrawn}: no fonts) also exits 1, with one line
 * naming the cause and what to install, and no log: the program is not at fault.
 */
final class Failures implements CommandLine.IExecutionExceptionHandler {
    /** File name of the error log, in the temporary folder ({@code java.io.tmpdir}). */
    static final String LOG_NAME = "scalewright-errors.log";

    private final PrintWriter err;
    private final Path log;

    Failures(PrintWriter err) {
        this(err, defaultLog());
    }

    /** @param log the file the stack trace of an internal error is appended to */
    Failures(PrintWriter err, Path log) {
        this.err = err;
        this.log = log;
    }

    /** @return {@code scalewright-errors.log} in the temporary folder */
    static Path defaultLog() {
        return Path.of(System.getProperty("java.io.tmpdir"), LOG_NAME);
    }

    @Override
    public int handleExecutionException(Exception ex, CommandLine cl, CommandLine.ParseResult parsed) {
        int status = handle(ex, cl == null ? "scalewright" : cl.getCommandSpec().qualifiedName());
        err.flush();
        return status;
    }

    private int handle(Exception e, String command) {
        if (e instanceof BadInputException bad) {
            for (SheetProblem p : bad.problems()) {
                err.println("error: " + p);
            }
            return ExitStatus.BAD_INPUT;
        }
        if (e instanceof PlanNotPossible p) {
            p.reasons().forEach(r -> err.println("error: " + r));
            return ExitStatus.BAD_INPUT;
        }
        if (e instanceof UserError || e instanceof InvalidInput || e instanceof CommandLine.ParameterException) {
            for (String line : String.valueOf(e.getMessage()).split("\n")) {
                err.println("error: " + line);
            }
            return ExitStatus.BAD_INPUT;
        }
        if (e instanceof ChartsNotDrawn) {
            err.println("error: " + e.getMessage());
            return ExitStatus.INTERNAL;
        }
        String what = e.getClass().getSimpleName() + (e.getMessage() == null ? ""
                : ": " + e.getMessage().replace('\n', ' '));
        String where = writeLog(e, command) ? "details in " + log : "no log written (" + log + " could not be written)";
        err.println("internal error in " + command + ": " + what + " (please report it with the input that caused it); "
                + where);
        return ExitStatus.INTERNAL;
    }

    /** Appends the time, the command and the stack trace to the log; false when it cannot be written. */
    private boolean writeLog(Exception e, String command) {
        StringWriter trace = new StringWriter();
        try (PrintWriter t = new PrintWriter(trace)) {
            t.println(OffsetDateTime.now() + " internal error in " + command);
            e.printStackTrace(t);
            t.println();
        }
        return LogFiles.append(log, trace.toString());
    }
}
