package org.scalewright.design.wirecheck;

import org.scalewright.model.Checks;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.StrengthTable;

/**
 * What a wire check is asked: the scale with its present wire, the replacement, the target
 * pitch and the piano's present state for a pitch raise.
 *
 * @param scale       the scale as it stands (its present wire)
 * @param settings    materials and stress bands; its strength table is the present wire's
 * @param replacement the replacement wire's strength table (the present table again when only
 *                    sizes change)
 * @param conversion  how plain wire sizes are converted ({@link WireConversion#keep()}: not at all)
 * @param target      the target pitch standard
 * @param flat        how far flat of the target each note stands now
 * @param overpullPct a note C cents flat is first tuned sharp by this percent of C, %, 0–100
 * @param stageLimit  the change of total tension above which raising in stages is advised
 */
public record WireCheckRequest(Scale scale, AnalysisSettings settings, StrengthTable replacement,
                               WireConversion conversion, PitchStandard target, PitchState flat,
                               double overpullPct, StageLimit stageLimit) {

    public WireCheckRequest {
        if (scale == null || settings == null) {
            throw new IllegalArgumentException("a wire check needs a scale and analysis settings");
        }
        if (scale.notes().isEmpty()) {
            throw new IllegalArgumentException("a wire check needs a scale with at least one note");
        }
        if (replacement == null) {
            replacement = settings.strength();
        }
        if (conversion == null) {
            conversion = WireConversion.keep();
        }
        if (target == null) {
            target = scale.pitch();
        }
        if (flat == null) {
            flat = PitchState.atPitch();
        }
        if (stageLimit == null) {
            stageLimit = StageLimit.DEFAULT;
        }
        if (!(overpullPct >= 0 && overpullPct <= 100)) {
            throw new IllegalArgumentException("overpull must be 0 to 100 %, was " + overpullPct);
        }
    }

    /**
     * Checks an overpull a user gave.
     *
     * @param pct the overpull, % of how flat a note stands, 0 to 100
     * @return {@code pct}
     * @throws InvalidInput outside that range; the message both front ends show
     */
    public static double overpull(double pct) {
        if (!(pct >= 0 && pct <= 100)) {
            throw new InvalidInput("overpull must be 0 to 100 %, was " + Checks.format(pct));
        }
        return pct;
    }

    /** @return a request with no replacement, no conversion, the scale's own pitch and no pitch raise */
    public static WireCheckRequest of(Scale scale, AnalysisSettings settings) {
        return new WireCheckRequest(scale, settings, settings.strength(), WireConversion.keep(), scale.pitch(),
                PitchState.atPitch(), 0, StageLimit.DEFAULT);
    }

    /** @return true when any note is raised: flat of its target now, or a higher target standard */
    public boolean isPitchRaise() {
        return !flat.noRaise() || target.a4() > scale.pitch().a4();
    }
}
