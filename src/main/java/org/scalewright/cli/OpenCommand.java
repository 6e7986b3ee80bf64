package org.scalewright.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code open [FILE]}: listed and explained with the other commands, but carried out by the
 * launcher ({@code org.scalewright.Main}), which starts the window; only {@code open --help}
 * and {@code open --version} reach the command line.
 */
@Command(name = "open", mixinStandardHelpOptions = true,
        description = "Open a scale sheet in the desktop window (the invented demo grand without FILE). A sheet "
                + "file given alone does the same (scalewright FILE.csv), as a double-click or \"Open with\" in a "
                + "file manager does.")
final class OpenCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(arity = "0..1", paramLabel = "FILE", description = "the scale sheet (.csv)")
    String file;

    @Override
    public Integer call() {
        spec.commandLine().getErr().println("error: open starts the desktop window, which only the program's "
                + "launcher does: run scalewright open FILE (java -jar scalewright.jar open FILE)");
        return ExitStatus.BAD_INPUT;
    }
}
