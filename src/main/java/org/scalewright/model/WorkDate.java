package org.scalewright.model;

import java.time.LocalDate;
import java.time.format.DateTimeParseException;

/** A day as the user types it for a break, a job or a version: ISO 8601, {@code 2026-12-02}. */
public final class WorkDate {
    private WorkDate() {
    }

    /**
     * @param text  a date written YYYY-MM-DD
     * @param today the present day; a later date is refused as a typing error
     * @return the day
     * @throws InvalidInput when the text is not such a date, or lies after {@code today}
     */
    public static LocalDate parse(String text, LocalDate today) {
        String t = text == null ? "" : text.strip();
        LocalDate d;
        try {
            d = LocalDate.parse(t);
        } catch (DateTimeParseException e) {
            throw new InvalidInput("date must be written YYYY-MM-DD (such as " + today + "), was '" + t + "'");
        }
        if (d.isAfter(today)) {
            throw new InvalidInput("date must not be after today (" + today + "), was " + d);
        }
        return d;
    }
}
