package org.scalewright.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** {@code archive}: the workshop archive of instruments, scale versions, jobs and broken strings. */
@Command(name = "archive", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"The workshop archive: every instrument, its scale versions, its jobs and its broken "
                + "strings, in one database file. A string that broke at a pitch read off a tuning device tells "
                + "the stress its wire really broke at; 'diagnose --archive' takes the breaks into its finding."},
        subcommands = {ArchiveCreateCommand.class, ArchiveAddInstrumentCommand.class, ArchiveInstrumentsCommand.class,
                ArchiveImportCommand.class, ArchiveVersionsCommand.class, ArchiveExportCommand.class,
                ArchiveLogJobCommand.class, ArchiveLogBreakCommand.class, ArchiveBreaksCommand.class,
                ArchiveHistoryCommand.class, ArchiveDumpCommand.class, ArchiveLoadCommand.class},
        footer = {"", "Where it lives: archive.db in the user's data folder (Linux: $XDG_DATA_HOME/scalewright or "
                + "~/.local/share/scalewright; macOS: ~/Library/Application Support/Scalewright; Windows: "
                + "%%APPDATA%%\\Scalewright), or the file given with --db.",
                "", "Back it up with 'archive dump --out FOLDER' (a folder of CSV files that 'archive load' reads "
                + "back into a new archive), or copy the file while no program has it open.",
                "", "Example: archive create; archive add-instrument grand-190; archive import-sheet grand-190 "
                + "SHEET.csv --label as-measured; archive log-break grand-190 --key 64 --pitch 1052; "
                + "archive breaks grand-190"})
public final class ArchiveCommand implements Runnable {
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
