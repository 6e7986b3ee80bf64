package org.scalewright.cli;

import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.scalewright.archive.Archive;
import org.scalewright.archive.Job;
import org.scalewright.model.PitchStandard;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code archive log-job}: a job done on an instrument. */
@Command(name = "log-job", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Record a job done on an instrument: its kind, notes, the pitch standard and strength table "
                + "used and the scale version worked to.")
public final class ArchiveLogJobCommand extends InstrumentSubcommand {
    @Option(names = "--kind", paramLabel = "TEXT", required = true,
            description = "what kind of job: restringing, pitch raise, rescale, tuning …")
    String kind;

    @Option(names = "--notes", paramLabel = "TEXT", description = "notes on the job")
    String notes;

    @Option(names = "--a4", paramLabel = "HZ", description = "the pitch standard used: A4 in Hz")
    Double a4;

    @Option(names = "--strength-table", paramLabel = "NAME", description = "the name of the strength table used")
    String table;

    @Option(names = "--to-version", paramLabel = "N", description = "the scale version the job worked to")
    Integer version;

    @Mixin
    DateOption date;

    @Override
    public Integer call() {
        OptionalDouble pitch = a4 == null ? OptionalDouble.empty() : OptionalDouble.of(PitchStandard.of(a4).a4());
        Job job = new Job(date.day(), kind, notes, pitch, table,
                version == null ? OptionalInt.empty() : OptionalInt.of(version));
        try (Archive a = db.open()) {
            a.logJob(instrument.name, job);
        }
        terminal().println(job.loggedOn(instrument.name));
        return ExitStatus.OK;
    }
}
