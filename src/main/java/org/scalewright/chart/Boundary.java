package org.scalewright.chart;

import java.util.ArrayList;
import java.util.List;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;

/**
 * A place between two keys where a curve is expected to jump: a section boundary (e.g. the
 * break between bass and tenor bridge) or a change between wound and plain strings.
 *
 * @param position the key-number position, half-way between the two keys
 * @param label    what changes, in plain words
 * @param kind     section boundary, wound/plain change, or both at once
 */
public record Boundary(double position, String label, Kind kind) {

    /** What kind of boundary it is. */
    public enum Kind { SECTION, WOUND_PLAIN, BOTH }

    /** @return the boundaries of a scale, bass to treble */
    public static List<Boundary> of(ScaleAnalysis analysis) {
        List<NoteResult> notes = analysis.notes();
        List<Boundary> out = new ArrayList<>();
        for (int i = 1; i < notes.size(); i++) {
            NoteResult below = notes.get(i - 1);
            NoteResult here = notes.get(i);
            boolean section = !here.section().equals(below.section());
            boolean wound = here.wound() != below.wound();
            if (!section && !wound) {
                continue;
            }
            String woundText = below.wound() ? "wound | plain" : "plain | wound";
            String sectionText = label(below.section()) + " | " + label(here.section());
            double pos = (below.key() + here.key()) / 2.0;
            if (section && wound) {
                out.add(new Boundary(pos, sectionText + ", " + woundText, Kind.BOTH));
            } else if (section) {
                out.add(new Boundary(pos, sectionText, Kind.SECTION));
            } else {
                out.add(new Boundary(pos, woundText, Kind.WOUND_PLAIN));
            }
        }
        return out;
    }

    private static String label(String section) {
        return section.isEmpty() ? "(no section)" : section;
    }
}
