package org.scalewright.design.diagnosis;

import java.util.ArrayList;
import java.util.List;

/** What the figures cannot see, for a technician to look at where strings break. Our own words. */
final class Inspection {
    private Inspection() {
    }

    static List<String> items(StressCause cause, boolean woundInRange, boolean pitchShare) {
        List<String> items = new ArrayList<>();
        items.add("Where the wire bends over a bridge pin, an agraffe or the capo bar: a sharp bend, a groove cut "
                + "into the termination, or a rough or burred edge starts a crack at any stress.");
        items.add("Rust or pitting on the speaking length, at the tuning-pin coil and at the hitch-pin loop.");
        items.add("Kinks, twists and nicks from stringing, and coils that were bent open and closed again.");
        items.add("How the last pitch raise was done: a large raise in one pass takes the strings past their "
                + "working stress while the plate and bridges settle.");
        items.add("Where the wire came from: wire from an unknown batch, or older than the rest, may fall short "
                + "of the strength table; ask the maker for certified figures.");
        if (cause == StressCause.LENGTH_AND_PITCH) {
            items.add("The measurement itself: measure the speaking lengths of these notes again from the front "
                    + "termination actually in use (agraffe or capo bar) to the bridge pin before changing anything.");
        }
        if (pitchShare) {
            items.add("Whether these notes are tuned where the sheet says: a note kept sharp, or a cents offset in "
                    + "the sheet, raises the stress.");
        }
        if (woundInRange) {
            items.add("Wound strings: a loose or buzzing winding, and a core nicked where the winding starts or ends.");
        }
        return items;
    }
}
