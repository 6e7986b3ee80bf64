package org.scalewright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * The optional {@code --out FILE.csv|FILE.xlsx} of the commands that print their results and may also
 * write them as a table, with {@code --decimal-comma} for the CSV dialect of spreadsheets in
 * decimal-comma locales, and the order they do it in: the file first (so a file that cannot be
 * written ends the command with only its error), then the printout, then "wrote FILE".
 */
public final class CsvOutput {
    @Option(names = "--out", paramLabel = "FILE.csv|FILE.xlsx", description = "also write the results as a table "
            + "(SI units): CSV, or an .xlsx workbook when the name ends in .xlsx (headings in words with units, "
            + "numbers as numbers, the notes and cautions on a sheet of their own)")
    Path file;

    @Mixin
    DecimalCommaOption dialect;

    @Spec(Spec.Target.MIXEE)
    CommandSpec command;

    /**
     * @param print prints the results on the command's output
     * @return {@link ExitStatus#OK}
     */
    int writeThenPrint(List<String> comments, List<String> header, List<List<String>> rows, Consumer<PrintWriter> print) {
        PrintWriter w = command.commandLine().getOut();
        String closing = Outputs.tableIfAsked(file, dialect.dialect(), comments, header, rows);
        print.accept(w);
        Outputs.printClosing(w, closing);
        return ExitStatus.OK;
    }
}
