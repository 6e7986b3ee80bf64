package org.scalewright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * The optional {@code --out FILE.csv} of the commands that print their results and may also
 * write them as CSV, and the order they do it in: the file first (so a file that cannot be
 * written ends the command with only its error), then the printout, then "wrote FILE".
 */
public final class CsvOutput {
    @Option(names = "--out", paramLabel = "FILE.csv", description = "also write the results as CSV (SI units)")
    Path file;

    @Spec(Spec.Target.MIXEE)
    CommandSpec command;

    /**
     * @param print prints the results on the command's output
     * @return {@link ExitStatus#OK}
     */
    int writeThenPrint(List<String> comments, List<String> header, List<List<String>> rows, Consumer<PrintWriter> print) {
        PrintWriter w = command.commandLine().getOut();
        String closing = Outputs.csvIfAsked(file, comments, header, rows);
        print.accept(w);
        Outputs.printClosing(w, closing);
        return ExitStatus.OK;
    }
}
