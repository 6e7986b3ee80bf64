package org.scalewright.cli;

import java.time.LocalDate;
import org.scalewright.model.WorkDate;
import picocli.CommandLine.Option;

/** The {@code --date YYYY-MM-DD} of the archive commands that record something; today by default. */
public final class DateOption {
    @Option(names = "--date", paramLabel = "YYYY-MM-DD", description = "the day (default: today)")
    String date;

    /** @return the day given, or today; a malformed or future date is refused (exit status 2) */
    LocalDate day() {
        LocalDate today = LocalDate.now();
        try {
            return date == null ? today : WorkDate.parse(date, today);
        } catch (org.scalewright.model.InvalidInput e) {
            throw new UserError("--date: " + e.getMessage());
        }
    }
}
