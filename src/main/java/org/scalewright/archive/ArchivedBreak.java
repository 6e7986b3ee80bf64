package org.scalewright.archive;

import java.util.OptionalInt;
import org.scalewright.model.StringBreak;

/**
 * A break as kept in the archive.
 *
 * @param id      its row number in the archive
 * @param record  the break
 * @param version the number of the scale version the string was strung to when it broke, if any
 */
public record ArchivedBreak(long id, StringBreak record, OptionalInt version) {
}
