package org.scalewright.archive;

import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.Random;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.BreakActivity;
import org.scalewright.model.BreakPlace;
import org.scalewright.model.Scale;
import org.scalewright.model.StringBreak;

/**
 * The child process of {@link ArchiveKillTest}: writes to an archive at random until it is killed,
 * printing each change on standard output only after its transaction has committed. Each row
 * carries a check of its own content, so the test can tell a half-written row.
 *
 * <p>Arguments: the archive file, a seed. Prints {@code ready .} once the archive is open, then
 * lines {@code B id key hz .}, {@code I name .} and {@code V number .}.
 */
public final class ArchiveKillWriter {
    /** The instrument the test creates before the first child runs. */
    static final String INSTRUMENT = "kill-test";

    private ArchiveKillWriter() {
    }

    public static void main(String[] args) throws Exception {
        Path db = Path.of(args[0]);
        Random random = new Random(Long.parseLong(args[1]));
        PrintStream out = new PrintStream(new java.io.FileOutputStream(java.io.FileDescriptor.out), false,
                StandardCharsets.UTF_8);
        Scale small = ScaleSheetReader.standard().read(Path.of("small.csv"), sheet().getBytes(StandardCharsets.UTF_8));
        try (Archive a = Archive.open(db)) {
            out.println("ready .");
            out.flush();
            for (int n = 0; ; n++) {
                int op = random.nextInt(10);
                if (op < 7) {
                    int key = 1 + random.nextInt(3);
                    double hz = 100 + random.nextInt(100_000) / 100.0;
                    StringBreak b = new StringBreak(LocalDate.of(2026, 1, 1).plusDays(random.nextInt(300)), key,
                            OptionalInt.of(1 + random.nextInt(3)), OptionalDouble.of(hz), BreakActivity.TUNING,
                            BreakPlace.BRIDGE, "", remark(key, hz));
                    ArchivedBreak kept = a.logBreak(INSTRUMENT, b, OptionalInt.empty());
                    out.println("B " + kept.id() + " " + key + " " + hz + " .");
                } else if (op < 9) {
                    String name = "i-" + args[1] + "-" + n;
                    a.addInstrument(new Instrument(name, maker(name), "", "", "", ""));
                    out.println("I " + name + " .");
                } else {
                    ScaleVersion v = a.saveVersion(INSTRUMENT, small, "as strung", OptionalInt.empty(),
                            LocalDate.of(2026, 1, 1));
                    out.println("V " + v.number() + " .");
                }
                out.flush();
            }
        }
    }

    /** @return the check a break row carries of its own key and pitch */
    static String remark(int key, double hz) {
        return "k" + key + "-" + hz;
    }

    /** @return the check an instrument row carries of its own name */
    static String maker(String name) {
        return "made-" + name;
    }

    /** @return a three-key sheet the test's versions are written from */
    static String sheet() {
        return "# title: kill test\nkey,strings,length_mm,wire\n1,3,600,15\n2,3,580,15\n3,3,560,15\n";
    }
}
