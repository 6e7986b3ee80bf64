package org.scalewright.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Optional;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.ParseResult;

/**
 * Refuses an {@code --out} that is one of the command's own inputs before anything is read or
 * computed: the scale sheet, {@code --strength}, {@code --reference}, {@code --flat}, a target file —
 * every file named by an argument given. Files are compared by their real paths (links resolved,
 * {@code ./a.csv} and {@code a.csv} alike); an {@code --out} folder that holds an input is refused
 * too, since a report replaces its folder whole.
 */
final class OutputChecks {
    private OutputChecks() {
    }

    /**
     * @param parsed the parsed command line (its innermost subcommand is checked)
     * @throws UserError naming the input that {@code --out} would replace
     */
    static void check(ParseResult parsed) {
        ParseResult pr = parsed;
        while (pr.hasSubcommand()) {
            pr = pr.subcommand();
        }
        OptionSpec outOption = pr.commandSpec().findOption("--out");
        if (outOption == null || !pr.hasMatchedOption(outOption)) {
            return;
        }
        Object value = outOption.getValue();
        if (!(value instanceof Path out)) {
            return;
        }
        Optional<Path> outReal = real(out);
        if (outReal.isEmpty()) {
            return;
        }
        boolean folder = Files.isDirectory(outReal.get());
        for (ArgSpec arg : pr.matchedArgs()) {
            if (arg == outOption) {
                continue;
            }
            for (Path in : paths(arg.getValue())) {
                Optional<Path> inReal = real(in);
                if (inReal.isEmpty()) {
                    continue;
                }
                if (inReal.get().equals(outReal.get())) {
                    throw new UserError("--out: " + out + " is " + what(arg, in)
                            + ", which this command reads; it is left as it is — give another name");
                }
                if (folder && inReal.get().startsWith(outReal.get())) {
                    throw new UserError("--out: " + out + " holds " + what(arg, in)
                            + ", which this command reads, and would be replaced as a whole; give another folder");
                }
            }
        }
    }

    private static String what(ArgSpec arg, Path in) {
        String name = arg.isOption() ? ((OptionSpec) arg).longestName() : arg.paramLabel();
        return "the same file as " + name + " (" + in + ")";
    }

    /** @return the paths an argument's value names: a path, a text, or a collection of them */
    private static List<Path> paths(Object value) {
        List<Path> l = new ArrayList<>();
        if (value instanceof Path p) {
            l.add(p);
        } else if (value instanceof String s && !s.isBlank()) {
            try {
                l.add(Path.of(s));
            } catch (InvalidPathException e) {
                // not a file name
            }
        } else if (value instanceof Collection<?> c) {
            for (Object o : c) {
                l.addAll(paths(o));
            }
        }
        return l;
    }

    /** @return the real path of an existing file or folder (links resolved), or empty */
    private static Optional<Path> real(Path p) {
        try {
            return Files.exists(p) ? Optional.of(p.toRealPath()) : Optional.empty();
        } catch (IOException | SecurityException e) {
            return Optional.empty();
        }
    }
}
