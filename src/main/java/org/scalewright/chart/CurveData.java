package org.scalewright.chart;

import java.util.Optional;
import java.util.OptionalInt;
import org.scalewright.physics.ScaleAnalysis;

/**
 * What a curve chart shows: the working scale, and optionally a reference scale (e.g. as
 * measured), a proposal (e.g. a rescaling plan) and one highlighted key.
 *
 * @param working     the analysis of the working scale (required)
 * @param reference   the analysis of the reference scale, or empty
 * @param proposal    the analysis of a proposed scale, or empty
 * @param units       display units
 * @param selectedKey the key to highlight, or empty
 */
public record CurveData(ScaleAnalysis working, Optional<ScaleAnalysis> reference, Optional<ScaleAnalysis> proposal,
                        DisplayUnits units, OptionalInt selectedKey) {

    public CurveData {
        if (working == null) {
            throw new IllegalArgumentException("curve data needs a working scale, was null");
        }
        reference = reference == null ? Optional.empty() : reference;
        proposal = proposal == null ? Optional.empty() : proposal;
        units = units == null ? DisplayUnits.METRIC : units;
        selectedKey = selectedKey == null ? OptionalInt.empty() : selectedKey;
    }

    /** @return the working scale alone, in the given units */
    public static CurveData of(ScaleAnalysis working, DisplayUnits units) {
        return new CurveData(working, Optional.empty(), Optional.empty(), units, OptionalInt.empty());
    }

    /** @return a copy drawing {@code ref} (null for none) beside the working scale */
    public CurveData withReference(ScaleAnalysis ref) {
        return new CurveData(working, Optional.ofNullable(ref), proposal, units, selectedKey);
    }

    /** @return a copy drawing {@code p} (null for none) as a proposal */
    public CurveData withProposal(ScaleAnalysis p) {
        return new CurveData(working, reference, Optional.ofNullable(p), units, selectedKey);
    }

    /** @return a copy in other display units */
    public CurveData withUnits(DisplayUnits u) {
        return new CurveData(working, reference, proposal, u, selectedKey);
    }

    /** @return a copy highlighting {@code key} */
    public CurveData withSelectedKey(int key) {
        return new CurveData(working, reference, proposal, units, OptionalInt.of(key));
    }

    /** @return a copy with no highlighted key */
    public CurveData withoutSelection() {
        return new CurveData(working, reference, proposal, units, OptionalInt.empty());
    }
}
