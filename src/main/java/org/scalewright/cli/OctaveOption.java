package org.scalewright.cli;

import org.scalewright.design.stretch.OctaveType;
import org.scalewright.model.InvalidInput;
import picocli.CommandLine.Option;

/** The {@code --octave 2:1|4:2|6:3} of the commands that compute a tuning stretch. */
public final class OctaveOption {
    @Option(names = "--octave", paramLabel = "2:1|4:2|6:3", defaultValue = "2:1",
            description = "octave type tuned beatless (default: ${DEFAULT-VALUE})")
    String octave;

    /** @return the octave type given; a bad one is a user error naming the option */
    OctaveType type() {
        try {
            return OctaveType.parse(octave);
        } catch (InvalidInput e) {
            throw new UserError("--octave: " + e.getMessage());
        }
    }
}
