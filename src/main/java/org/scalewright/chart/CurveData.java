package org.scalewright.chart;

import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.scalewright.model.DisplayUnits;
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
 * @param overlays    series of percent of breaking strength drawn over the percent chart (e.g. a
 *                    wire check's after and peak), names unique; may be empty
 */
public record CurveData(ScaleAnalysis working, Optional<ScaleAnalysis> reference, Optional<ScaleAnalysis> proposal,
                        DisplayUnits units, OptionalInt selectedKey, List<CurveOverlay> overlays) {

    public CurveData {
        if (working == null) {
            throw new IllegalArgumentException("curve data needs a working scale, was null");
        }
        reference = reference == null ? Optional.empty() : reference;
        proposal = proposal == null ? Optional.empty() : proposal;
        units = units == null ? DisplayUnits.METRIC : units;
        selectedKey = selectedKey == null ? OptionalInt.empty() : selectedKey;
        overlays = overlays == null ? List.of() : List.copyOf(overlays);
        if (overlays.stream().map(CurveOverlay::name).distinct().count() != overlays.size()) {
            throw new IllegalArgumentException("overlay names must be unique, were "
                    + overlays.stream().map(CurveOverlay::name).toList());
        }
    }

    /** Curve data without overlays. */
    public CurveData(ScaleAnalysis working, Optional<ScaleAnalysis> reference, Optional<ScaleAnalysis> proposal,
                     DisplayUnits units, OptionalInt selectedKey) {
        this(working, reference, proposal, units, selectedKey, List.of());
    }

    /** @return the working scale alone, in the given units */
    public static CurveData of(ScaleAnalysis working, DisplayUnits units) {
        return new CurveData(working, Optional.empty(), Optional.empty(), units, OptionalInt.empty());
    }

    /** @return a copy drawing {@code ref} (null for none) beside the working scale */
    public CurveData withReference(ScaleAnalysis ref) {
        return new CurveData(working, Optional.ofNullable(ref), proposal, units, selectedKey, overlays);
    }

    /** @return a copy drawing {@code p} (null for none) as a proposal */
    public CurveData withProposal(ScaleAnalysis p) {
        return new CurveData(working, reference, Optional.ofNullable(p), units, selectedKey, overlays);
    }

    /** @return a copy in other display units */
    public CurveData withUnits(DisplayUnits u) {
        return new CurveData(working, reference, proposal, u, selectedKey, overlays);
    }

    /** @return a copy highlighting {@code key} */
    public CurveData withSelectedKey(int key) {
        return new CurveData(working, reference, proposal, units, OptionalInt.of(key), overlays);
    }

    /** @return a copy with no highlighted key */
    public CurveData withoutSelection() {
        return new CurveData(working, reference, proposal, units, OptionalInt.empty(), overlays);
    }

    /** @return a copy drawing {@code list} (null for none) over the percent chart instead of the present overlays */
    public CurveData withOverlays(List<CurveOverlay> list) {
        return new CurveData(working, reference, proposal, units, selectedKey, list);
    }
}
