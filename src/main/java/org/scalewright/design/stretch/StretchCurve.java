package org.scalewright.design.stretch;

import java.util.List;
import java.util.Optional;

/**
 * The tuning stretch of a scale for one octave type.
 *
 * @param octave   the octave type tuned beatless
 * @param a4       the pitch standard the equal temperament is taken from, Hz
 * @param points   one point per key of the scale, bass to treble
 * @param problems keys whose stretch could not be found, and why, one line each
 */
public record StretchCurve(OctaveType octave, double a4, List<StretchPoint> points, List<String> problems) {

    public StretchCurve {
        points = List.copyOf(points);
        problems = List.copyOf(problems);
    }

    /** @return the point of a key, if the scale has it */
    public Optional<StretchPoint> point(int key) {
        return points.stream().filter(p -> p.key() == key).findFirst();
    }
}
