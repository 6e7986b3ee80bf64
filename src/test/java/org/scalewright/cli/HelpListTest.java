package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.scalewright.cli.CommandRun.run;

import java.util.Map;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

/** The top-level help lists every command with its whole summary; {@code open --help} prints. */
class HelpListTest {
    private static String oneLine(String s) {
        return s.replaceAll("\\s+", " ").trim();
    }

    @Test
    @DisplayName("every command is listed with its summary whole: one description line, a finished sentence")
    void everyCommandsSummaryIsWholeInTheList() {
        CommandRun help = run("--help");
        assertEquals(0, help.status(), help.err());
        String listed = oneLine(help.out());
        Map<String, CommandLine> commands = new CommandLine(new ScalewrightCommand()).getSubcommands();
        assertTrue(commands.keySet().containsAll(java.util.List.of("open", "analyze", "report", "help")),
                commands.keySet().toString());
        for (var c : commands.entrySet()) {
            var usage = c.getValue().getCommandSpec().usageMessage();
            // the list shows the first line of the header, else of the description: it must be the whole summary
            String summary = oneLine(usage.header().length > 0 ? usage.header()[0] : usage.description()[0]);
            assertTrue(summary.endsWith("."), c.getKey() + "'s first description line is cut: " + summary);
            assertTrue(listed.contains(c.getKey() + " " + summary.replace("%%", "%")),
                    c.getKey() + " not listed whole:\n" + help.out());
        }
    }

    @Test
    @DisplayName("open --help prints open's help; help COMMAND prints that command's")
    void openHelpPrints() {
        CommandRun open = run("open", "--help");
        assertEquals(0, open.status(), open.err());
        assertTrue(open.out().startsWith("Usage: scalewright open [-hV] [FILE]"), open.out());
        assertTrue(oneLine(open.out()).contains("as a double-click or \"Open with\" in a file manager does."),
                open.out());
        CommandRun analyze = run("help", "analyze");
        assertEquals(0, analyze.status(), analyze.err());
        assertTrue(analyze.out().startsWith("Usage: scalewright analyze"), analyze.out());
    }

    @Test
    @DisplayName("open reaching the command line (not through the launcher) says so, exit 2")
    void openWithoutTheLauncherSaysSo() {
        CommandRun r = run("open", "a.csv");
        assertEquals(ExitStatus.BAD_INPUT, r.status());
        assertTrue(r.err().startsWith("error: open starts the desktop window"), r.err());
        assertFalse(r.err().contains("Exception"), r.err());
    }

    @Test
    void anUnknownWordNamesTheCommandsAndTheSheetPath() {
        CommandRun r = run("missing.csv");
        assertEquals(ExitStatus.BAD_INPUT, r.status());
        assertTrue(r.err().startsWith("error: unknown command 'missing.csv'; commands: open, analyze,"), r.err());
        assertTrue(r.err().contains("or a sheet file to open in the window"), r.err());
        assertTrue(ScalewrightCommand.isCommand("analyze"));
        assertFalse(ScalewrightCommand.isCommand("missing.csv"));
    }

    @Test
    void theQuickCommandTestKnowsEveryCommandTheCommandLineKnows() {
        // the launcher reads the names off the annotations; the built command line is the authority
        var built = new picocli.CommandLine(new ScalewrightCommand()).getSubcommands().keySet();
        for (String name : built) {
            assertTrue(ScalewrightCommand.isCommand(name), name);
        }
        assertFalse(ScalewrightCommand.isCommand("grand-190.csv"));
    }

    @Test
    void aWrongOptionOfASubcommandPointsToThatSubcommandsHelp() {
        CommandRun r = run("archive", "log-break", "grand", "--hz", "1052");
        assertEquals(ExitStatus.BAD_INPUT, r.status());
        assertTrue(r.err().contains("try: scalewright archive log-break --help"), r.err());
        assertTrue(run("analyze", "--nope").err().contains("try: scalewright analyze --help"));
    }
}
