package org.scalewright.archive;

import java.time.LocalDate;
import java.util.OptionalInt;

/**
 * One version of an instrument's scale: the sheet as written, numbered 1, 2, … per instrument.
 *
 * @param number      the version's number within its instrument
 * @param date        the day it was saved or measured
 * @param label       as measured, planned, as strung or a free label ({@link VersionLabel})
 * @param derivedFrom the number of the version it came from, if any
 * @param sheet       the scale sheet (CSV text, DESIGN §4)
 */
public record ScaleVersion(int number, LocalDate date, String label, OptionalInt derivedFrom, String sheet) {
    /** @return the version's number with its label, as lists and messages name it: {@code 2 (planned)} */
    public String numberAndLabel() {
        return number + " (" + label + ")";
    }
}
