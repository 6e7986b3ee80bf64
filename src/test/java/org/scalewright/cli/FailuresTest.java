package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.design.rescale.PlanNotPossible;
import org.scalewright.model.Checks;
import org.scalewright.model.InvalidInput;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** The exit-status rule of DESIGN §5: bad input 2, anything else 1 with one line and the trace in the log. */
class FailuresTest {
    @TempDir
    Path dir;

    /** A command that fails the way it is told to. */
    @Command(name = "fail")
    static final class FailCommand implements Callable<Integer> {
        @Option(names = "--with")
        String with;

        @Override
        public Integer call() {
            switch (with) {
                case "precondition" -> Checks.positive("core diameter", -1e-3, "mm", 1e3);
                case "null" -> throw new NullPointerException("no scale");
                case "plan" -> throw new PlanNotPossible(List.of("key 60 (C4): reason one", "key 61 (C#4): reason two"));
                case "invalid" -> throw new InvalidInput("maximum percent of breaking strength must be more than 0 "
                        + "and at most 100 %, was 0");
                default -> {
                    return ExitStatus.OK;
                }
            }
            return ExitStatus.OK;
        }
    }

    private record Run(int status, String out, String err) {
    }

    private Run run(Path log, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = new CommandLine(new ScalewrightCommand());
        cl.addSubcommand("fail", new FailCommand());
        int rc = ScalewrightCommand.run(cl, args, new PrintWriter(out), new PrintWriter(err), log);
        return new Run(rc, out.toString(), err.toString());
    }

    @Test
    void anEnginePreconditionIsAnInternalErrorWithOneLineAndTheTraceInTheLog() throws Exception {
        Path log = dir.resolve("errors.log");
        Run r = run(log, "fail", "--with", "precondition");
        assertEquals(ExitStatus.INTERNAL, r.status(), r.err());
        List<String> lines = r.err().lines().toList();
        assertEquals(1, lines.size(), r.err());
        assertTrue(lines.get(0).startsWith("internal error in scalewright fail: IllegalArgumentException: "), r.err());
        assertTrue(lines.get(0).contains("core diameter"), "names what failed: " + r.err());
        assertTrue(lines.get(0).endsWith("details in " + log), r.err());
        assertFalse(r.err().contains("\tat "), "no stack trace on the terminal: " + r.err());
        String logged = Files.readString(log);
        assertTrue(logged.contains("java.lang.IllegalArgumentException"), logged);
        assertTrue(logged.contains("\tat org.scalewright.model.Checks"), "the trace is in the log: " + logged);

        Run again = run(log, "fail", "--with", "null");
        assertEquals(ExitStatus.INTERNAL, again.status());
        assertEquals(1, again.err().lines().count(), again.err());
        assertTrue(Files.readString(log).contains("java.lang.NullPointerException: no scale"), "appended, not replaced");
        assertTrue(Files.readString(log).contains("java.lang.IllegalArgumentException"), "appended, not replaced");
    }

    @Test
    void aPlanThatCannotBeMadeAndARefusedValueAreBadInput() {
        Path log = dir.resolve("errors.log");
        Run plan = run(log, "fail", "--with", "plan");
        assertEquals(ExitStatus.BAD_INPUT, plan.status());
        assertEquals(List.of("error: key 60 (C4): reason one", "error: key 61 (C#4): reason two"),
                plan.err().lines().toList());
        Run invalid = run(log, "fail", "--with", "invalid");
        assertEquals(ExitStatus.BAD_INPUT, invalid.status());
        assertEquals(List.of("error: maximum percent of breaking strength must be more than 0 and at most 100 %, was 0"),
                invalid.err().lines().toList());
        assertFalse(Files.exists(log), "bad input writes no log");
    }

    @Test
    void aLogThatCannotBeWrittenIsSaidOnTheSameLine() {
        Path log = dir.resolve("no-such-folder").resolve("errors.log");
        Run r = run(log, "fail", "--with", "precondition");
        assertEquals(ExitStatus.INTERNAL, r.status());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().contains("no log written"), r.err());
    }
}
