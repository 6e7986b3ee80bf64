package org.scalewright.design.stretch;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.NavigableMap;
import java.util.OptionalDouble;
import java.util.TreeMap;
import org.scalewright.model.Checks;
import org.scalewright.model.KeyNames;
import org.scalewright.model.KeyRange;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.Pitch;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.StringPhysics;

/**
 * The tuning stretch that a scale's inharmonicity asks for (DESIGN §5): the keys A3–A4
 * (37–49) stay at equal temperament; every key above is tuned so that its partial m sounds
 * with partial 2m of the key an octave below (already stretched), every key below so that its
 * partial 2m sounds with partial m of the key an octave above. Partial n of a string whose
 * first partial sounds at f1 lies at n f1 √((1 + B n²)/(1 + B)) ({@link StringPhysics#partial}).
 */
public final class TuningStretch {
    /** The keys left at equal temperament: A3 (37) to A4 (49). */
    public static final KeyRange EQUAL_TEMPERED_BAND = new KeyRange(37, 49);

    private TuningStretch() {
    }

    /**
     * @param analysis the scale's analysis: each note's B at its working pitch
     * @param octave   the octave type tuned beatless
     * @return the stretch of every key of the scale
     */
    public static StretchCurve of(ScaleAnalysis analysis, OctaveType octave) {
        NavigableMap<Integer, Double> b = new TreeMap<>();
        for (NoteResult r : analysis.notes()) {
            b.put(r.key(), r.inharmonicity());
        }
        return of(b, analysis.scale().pitch().a4(), octave);
    }

    /**
     * @param inharmonicity B of each key of the scale (finite, &ge; 0; any other value makes
     *                      that key and those tuned from it unknown)
     * @param a4            the pitch standard, Hz, &gt; 0
     * @param octave        the octave type tuned beatless
     * @return one point per key given, bass to treble
     */
    public static StretchCurve of(NavigableMap<Integer, Double> inharmonicity, double a4, OctaveType octave) {
        Checks.positive("A4 frequency", a4, "Hz", 1);
        if (octave == null) {
            throw new IllegalArgumentException("octave type must be given, was null");
        }
        int m = octave.upperPartial();
        Map<Integer, Double> tuned = new HashMap<>();
        List<String> problems = new ArrayList<>();
        for (int key : inharmonicity.keySet()) {
            if (EQUAL_TEMPERED_BAND.contains(key)) {
                tuned.put(key, Pitch.equalTempered(key, a4));
            }
        }
        for (int key : inharmonicity.navigableKeySet()) {
            if (key > EQUAL_TEMPERED_BAND.last()) {
                tuneFrom(key, key - 12, inharmonicity, tuned, problems, m, true);
            }
        }
        for (int key : inharmonicity.descendingKeySet()) {
            if (key < EQUAL_TEMPERED_BAND.first()) {
                tuneFrom(key, key + 12, inharmonicity, tuned, problems, m, false);
            }
        }
        List<StretchPoint> points = new ArrayList<>(inharmonicity.size());
        for (Map.Entry<Integer, Double> e : inharmonicity.entrySet()) {
            int key = e.getKey();
            Double f = tuned.get(key);
            points.add(new StretchPoint(key, KeyNames.name(key), e.getValue(), Pitch.equalTempered(key, a4),
                    f == null ? OptionalDouble.empty() : OptionalDouble.of(f)));
        }
        return new StretchCurve(octave, a4, points, problems);
    }

    private static void tuneFrom(int key, int partner, Map<Integer, Double> b, Map<Integer, Double> tuned,
                                 List<String> problems, int m, boolean above) {
        Double bHere = b.get(key);
        Double bPartner = b.get(partner);
        String why = null;
        if (!usable(bHere)) {
            why = "its inharmonicity is not known (no positive tension)";
        } else if (bPartner == null) {
            why = "key " + partner + " (" + KeyNames.name(partner) + "), its octave toward the middle, "
                    + "is not in the scale";
        } else if (!usable(bPartner)) {
            why = "key " + partner + " (" + KeyNames.name(partner) + "), its octave toward the middle, "
                    + "has no known inharmonicity";
        } else if (!tuned.containsKey(partner)) {
            why = "key " + partner + " (" + KeyNames.name(partner) + "), its octave toward the middle, "
                    + "has no stretch";
        }
        if (why != null) {
            problems.add("key " + key + " (" + KeyNames.name(key) + "): no stretch, " + why);
            return;
        }
        double fPartner = tuned.get(partner);
        double f;
        if (above) {
            // partial m of this key = partial 2m of the key an octave below
            double target = StringPhysics.partial(fPartner, bPartner, 2 * m);
            f = target / StringPhysics.partial(1.0, bHere, m);
        } else {
            // partial 2m of this key = partial m of the key an octave above
            double target = StringPhysics.partial(fPartner, bPartner, m);
            f = target / StringPhysics.partial(1.0, bHere, 2 * m);
        }
        tuned.put(key, f);
    }

    private static boolean usable(Double b) {
        return b != null && Double.isFinite(b) && b >= 0;
    }
}
