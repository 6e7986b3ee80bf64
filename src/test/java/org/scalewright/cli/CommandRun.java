package org.scalewright.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/**
 * One run of the command line in-process, for the command tests.
 *
 * @param status the exit status
 * @param out    what it printed on standard output
 * @param err    what it printed on standard error
 */
record CommandRun(int status, String out, String err) {
    /** @param args the command line's arguments @return what the run gave */
    static CommandRun run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int status = ScalewrightCommand.run(args, new PrintWriter(out), new PrintWriter(err));
        return new CommandRun(status, out.toString(), err.toString());
    }
}
