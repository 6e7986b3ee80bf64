package org.scalewright.archive;

import java.time.LocalDate;
import java.util.List;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * A job done on an instrument.
 *
 * @param date          the day
 * @param kind          what kind of job (free text: restringing, pitch raise, rescale, regulation …)
 * @param notes         free text
 * @param a4            the pitch standard used, Hz, if recorded
 * @param strengthTable the name of the strength table used ("" when not recorded)
 * @param version       the number of the scale version the job worked to, if any
 */
public record Job(LocalDate date, String kind, String notes, OptionalDouble a4, String strengthTable,
                  OptionalInt version) {
    /** The kinds of job a workshop usually records, offered first; any other text is a kind as well. */
    public static final List<String> USUAL_KINDS = List.of("restringing", "pitch raise", "rescale", "tuning",
            "regulation", "repair");

    /** @throws ArchiveRefused when the kind is blank */
    public Job {
        kind = kind == null ? "" : kind.strip();
        if (kind.isEmpty()) {
            throw new ArchiveRefused("a job needs its kind (" + String.join(", ", USUAL_KINDS) + " or another)");
        }
        notes = notes == null ? "" : notes.strip();
        strengthTable = strengthTable == null ? "" : strengthTable.strip();
        a4 = a4 == null ? OptionalDouble.empty() : a4;
        version = version == null ? OptionalInt.empty() : version;
    }

    /** @return what logging this job on {@code instrument} is told as: {@code logged job 'tuning' on 'grand-190', 2026-11-20} */
    public String loggedOn(String instrument) {
        return "logged job '" + kind + "' on '" + instrument + "', " + date;
    }
}
