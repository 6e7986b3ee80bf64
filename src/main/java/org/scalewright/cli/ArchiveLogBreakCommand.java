package org.scalewright.cli;

import java.time.LocalDate;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.concurrent.Callable;
import org.scalewright.archive.Archive;
import org.scalewright.archive.ArchivedBreak;
import org.scalewright.model.BreakActivity;
import org.scalewright.model.BreakPlace;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.KeyNames;
import org.scalewright.model.StringBreak;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code archive log-break}: a broken string. */
@Command(name = "log-break", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Record a broken string: the key, which string of the unison, the pitch it broke at if it "
                + "was read off a tuning device, what was being done and where along the string it broke.",
                "The break is judged on the latest scale version that describes the strings on the instrument "
                + "(as measured, as strung or a label of your own; not a planned one), or the one given."},
        footer = {"", "A string that breaks during a pitch raise or while being brought up can whip and its wire "
                + "ends cut: wear eye protection, raise a large pitch change in stages, and defer to the maker's "
                + "specifications and licensed, experienced practice."})
public final class ArchiveLogBreakCommand implements Callable<Integer> {
    @Mixin
    InstrumentName instrument;

    @Option(names = "--key", paramLabel = "KEY", required = true,
            description = "key number or note name of the broken string (49 or A4)")
    String key;

    @Option(names = "--string", paramLabel = "N", description = "which string of the unison, 1 to 3 from the left")
    Integer string;

    @Option(names = "--pitch", paramLabel = "HZ", description = "the pitch it broke at, Hz, read off a tuning device")
    Double pitch;

    @Option(names = "--during", paramLabel = "WHAT", defaultValue = "unknown",
            description = "pitch-raise, fitting, tuning, playing or unknown (default: ${DEFAULT-VALUE})")
    String during;

    @Option(names = "--place", paramLabel = "WHERE", defaultValue = "unknown",
            description = "tuning-pin, front-bearing, speaking-length, bridge, hitch-pin or unknown "
                    + "(default: ${DEFAULT-VALUE})")
    String place;

    @Option(names = "--batch", paramLabel = "TEXT", description = "the wire's batch or coil, if known")
    String batch;

    @Option(names = "--remark", paramLabel = "TEXT", description = "a remark")
    String remark;

    @Option(names = "--on-version", paramLabel = "N",
            description = "the scale version the string was strung to (default: the latest describing the strings)")
    Integer version;

    @Mixin
    DateOption date;

    @Mixin
    ArchiveOption db;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        StringBreak b = parse(date.day());
        ArchivedBreak kept;
        try (Archive a = db.open()) {
            kept = a.logBreak(instrument.name, b, version == null ? OptionalInt.empty() : OptionalInt.of(version));
        }
        var w = spec.commandLine().getOut();
        w.println("logged break " + kept.id() + " on '" + instrument.name + "': key " + b.key() + " "
                + KeyNames.name(b.key()) + ", " + b.date() + (b.breakHz().isPresent() ? ", at "
                + Formats.trim(b.breakHz().getAsDouble()) + " Hz" : "") + ", " + b.during().phrase() + ", "
                + b.place().phrase() + (kept.version().isPresent() ? "; judged on version " + kept.version().getAsInt()
                : "; no version describes the strings yet, so its stress cannot be told"));
        if (b.during().underRisingTension()) {
            w.println("Caution: a breaking string can whip and its wire ends cut; wear eye protection and raise a "
                    + "large pitch change in stages.");
        }
        return ExitStatus.OK;
    }

    private StringBreak parse(LocalDate day) {
        try {
            return new StringBreak(day, KeyNames.parse(key), string == null ? OptionalInt.empty()
                    : OptionalInt.of(string), pitch == null ? OptionalDouble.empty() : OptionalDouble.of(pitch),
                    BreakActivity.of(during), BreakPlace.of(place), batch, remark);
        } catch (InvalidInput e) {
            throw new UserError(e.getMessage());
        }
    }
}
