package org.scalewright.physics;

/**
 * Total tension of one section of a scale (a run of consecutive notes with one label).
 *
 * @param section  section label ("" when the scale has none)
 * @param firstKey lowest key of the section
 * @param lastKey  highest key of the section
 * @param notes    number of notes
 * @param strings  number of strings
 * @param tension  sum of strings × tension per string, N (a note with no positive tension adds nothing)
 */
public record SectionTotal(String section, int firstKey, int lastKey, int notes, int strings, double tension) {
}
