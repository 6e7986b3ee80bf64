package org.scalewright.design.wirecheck;

import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.StrengthTable;

/**
 * A wire-check request for tests, changed one setting at a time: each change gives a new
 * request and leaves this one as it was.
 *
 * @param request the request as it stands
 */
public record Asked(WireCheckRequest request) {
    /** @return no replacement, no conversion, the scale's own pitch and no pitch raise */
    public static Asked of(Scale scale, AnalysisSettings settings) {
        return new Asked(WireCheckRequest.of(scale, settings));
    }

    /** @return the check of the request */
    public static WireCheckReport run(Asked asked) {
        return WireCheck.run(asked.request);
    }

    public Asked withReplacement(StrengthTable table) {
        WireCheckRequest r = request;
        return new Asked(new WireCheckRequest(r.scale(), r.settings(), table, r.conversion(), r.target(), r.flat(),
                r.overpullPct(), r.stageLimit()));
    }

    public Asked withConversion(WireConversion c) {
        WireCheckRequest r = request;
        return new Asked(new WireCheckRequest(r.scale(), r.settings(), r.replacement(), c, r.target(), r.flat(),
                r.overpullPct(), r.stageLimit()));
    }

    public Asked withTarget(PitchStandard p) {
        WireCheckRequest r = request;
        return new Asked(new WireCheckRequest(r.scale(), r.settings(), r.replacement(), r.conversion(), p, r.flat(),
                r.overpullPct(), r.stageLimit()));
    }

    public Asked withFlat(PitchState state) {
        WireCheckRequest r = request;
        return new Asked(new WireCheckRequest(r.scale(), r.settings(), r.replacement(), r.conversion(), r.target(),
                state, r.overpullPct(), r.stageLimit()));
    }

    public Asked withOverpull(double pct) {
        WireCheckRequest r = request;
        return new Asked(new WireCheckRequest(r.scale(), r.settings(), r.replacement(), r.conversion(), r.target(),
                r.flat(), pct, r.stageLimit()));
    }

    public Asked withStageLimit(StageLimit limit) {
        WireCheckRequest r = request;
        return new Asked(new WireCheckRequest(r.scale(), r.settings(), r.replacement(), r.conversion(), r.target(),
                r.flat(), r.overpullPct(), limit));
    }
}
