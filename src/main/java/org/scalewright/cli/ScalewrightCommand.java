package org.scalewright.cli;

import java.io.PrintWriter;
import org.scalewright.io.ReadNotes;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The headless command line: {@code scalewright COMMAND …}. */
@Command(name = "scalewright", mixinStandardHelpOptions = true, version = "Scalewright 0.1",
        description = {"Piano scaling workstation: string tension, stress and inharmonicity.",
                "Without a command the desktop window opens on the demo grand; a sheet file alone or "
                        + "'open FILE' opens that sheet in it."},
        subcommands = {OpenCommand.class, AnalyzeCommand.class, PlanPlainCommand.class, PlanWoundCommand.class,
                CheckWireCommand.class, DiagnoseCommand.class, ReportCommand.class, StretchCommand.class,
                ArchiveCommand.class, CommandLine.HelpCommand.class})
public final class ScalewrightCommand implements Runnable {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** @return whether {@code word} is one of the commands ({@code analyze}, {@code help}, …) */
    public static boolean isCommand(String word) {
        // read off the annotations, not a built command line: building every command's model takes
        // a third of a second, which a double-clicked sheet would wait for before its window
        for (Class<?> sub : ScalewrightCommand.class.getAnnotation(Command.class).subcommands()) {
            Command c = sub.getAnnotation(Command.class);
            if (c != null && (c.name().equals(word) || java.util.Arrays.asList(c.aliases()).contains(word))) {
                return true;
            }
        }
        return false;
    }

    /** Runs the command line on the process's standard output and error; returns the exit status. */
    public static int runOnConsole(String[] args) {
        PrintWriter out = new PrintWriter(new java.io.OutputStreamWriter(System.out,
                java.nio.charset.StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new java.io.OutputStreamWriter(System.err,
                java.nio.charset.StandardCharsets.UTF_8), true);
        return run(args, out, err);
    }

    /**
     * Runs the command line and returns the exit status: 0 success, 2 bad input or arguments
     * (one line per problem on stderr), 1 internal error (one line on stderr; the stack trace is
     * appended to {@code scalewright-errors.log} in the temporary folder). Never prints a stack trace.
     */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        return run(new CommandLine(new ScalewrightCommand()), args, out, err, Failures.defaultLog());
    }

    /**
     * Runs a command line built on {@link ScalewrightCommand} (tests add commands to it).
     *
     * @param log the file an internal error's stack trace is appended to
     */
    static int run(CommandLine cl, String[] args, PrintWriter terminalOut, PrintWriter terminalErr,
                   java.nio.file.Path log) {
        // control characters in a sheet's text never reach the terminal raw
        PrintWriter out = TerminalText.printer(terminalOut);
        PrintWriter err = TerminalText.printer(terminalErr);
        cl.setOut(out);
        cl.setErr(err);
        cl.setParameterExceptionHandler((ex, a) -> {
            err.println("error: " + ex.getMessage());
            // the whole command, so that a subcommand's help is found ('scalewright archive log-break --help')
            err.println("try: " + ex.getCommandLine().getCommandSpec().qualifiedName() + " --help");
            err.flush();
            return ExitStatus.BAD_INPUT;
        });
        cl.setExecutionExceptionHandler(new Failures(err, log));
        cl.setExecutionStrategy(parsed -> {
            try {
                OutputChecks.check(parsed);
            } catch (UserError e) {
                err.println("error: " + e.getMessage());
                err.flush();
                return ExitStatus.BAD_INPUT;
            }
            // how an input file was read (its encoding, delimiter, decimal comma) is told before the results
            return ReadNotes.toldTo(note -> {
                err.println("note: " + note);
                err.flush();
            }, () -> new CommandLine.RunLast().execute(parsed));
        });
        if (args.length > 0 && !args[0].startsWith("-") && !cl.getSubcommands().containsKey(args[0])) {
            err.println("error: unknown command '" + args[0] + "'; commands: "
                    + String.join(", ", cl.getSubcommands().keySet()) + "; or a sheet file to open in the window");
            err.flush();
            return ExitStatus.BAD_INPUT;
        }
        int rc = cl.execute(args);
        out.flush();
        err.flush();
        return rc;
    }
}
