package org.scalewright.physics;

/**
 * One flag raised on a note.
 *
 * @param key    key number of the flagged note
 * @param kind   why
 * @param detail the reason in plain words with the figures
 */
public record Flag(int key, FlagKind kind, String detail) {
}
