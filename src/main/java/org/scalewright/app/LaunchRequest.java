package org.scalewright.app;

import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Optional;
import java.util.Set;
import java.util.function.Predicate;

/**
 * What the window should open at start, and whether the program's arguments ask for the window
 * at all.
 *
 * @param sheet   a sheet named on the command line ({@code open FILE} or a bare {@code FILE}),
 *                or empty for the demo grand
 * @param problem a problem with the command line to show in the window, or ""
 */
public record LaunchRequest(Optional<Path> sheet, String problem) {
    private static final String OPEN = "open";
    /** Options that make {@code open} print instead of opening the window. */
    private static final Set<String> PRINTING_OPTIONS = Set.of("-h", "--help", "-V", "--version");

    /**
     * Whether the arguments ask for the desktop window rather than the command line: none (the
     * demo grand); {@code open [FILE]} unless it asks for help or the version; or a sheet file
     * alone, as a file manager passes it on a double-click or "Open with" — an existing file that
     * is not named like a command (a command wins, so {@code scalewright report} stays a command
     * even beside a file called {@code report}).
     *
     * @param args      the program's arguments
     * @param isCommand tells whether a word is one of the command line's commands; asked only
     *                  when the first argument names an existing file
     */
    public static boolean wantsWindow(String[] args, Predicate<String> isCommand) {
        if (args.length == 0) {
            return true;
        }
        if (args[0].equals(OPEN)) {
            return Arrays.stream(args).noneMatch(PRINTING_OPTIONS::contains);
        }
        return namesAFile(args[0]) && !isCommand.test(args[0]);
    }

    private static boolean namesAFile(String arg) {
        if (arg.startsWith("-") || arg.isBlank()) {
            return false;
        }
        try {
            return Files.isRegularFile(Path.of(arg));
        } catch (InvalidPathException e) {
            return false;
        }
    }

    /**
     * @param args the program's arguments: none, {@code open [FILE]}, or {@code FILE} (a bare
     *             path, see {@link #wantsWindow})
     */
    static LaunchRequest parse(String[] args) {
        if (args.length == 0) {
            return new LaunchRequest(Optional.empty(), "");
        }
        boolean open = args[0].equals(OPEN);
        String[] files = open ? Arrays.copyOfRange(args, 1, args.length) : args;
        if (files.length == 0) {
            return new LaunchRequest(Optional.empty(), "open needs a sheet file: open FILE.csv; showing the demo");
        }
        Optional<Path> sheet;
        try {
            sheet = Optional.of(Path.of(files[0]));
        } catch (InvalidPathException e) {
            return new LaunchRequest(Optional.empty(), "not a file name: " + files[0] + "; showing the demo");
        }
        if (files.length == 1) {
            return new LaunchRequest(sheet, "");
        }
        return new LaunchRequest(sheet, (open ? "open takes" : "the window opens") + " one sheet file; only "
                + files[0] + " was opened");
    }
}
