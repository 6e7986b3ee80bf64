package org.scalewright.design.diagnosis;

import java.util.List;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Scale;
import org.scalewright.model.WireSizeTable;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.StrengthTable;

/**
 * What a section diagnosis is asked.
 *
 * @param scale           the scale, at its own pitch standard
 * @param range           the keys where strings break (at least one note of the scale)
 * @param settings        materials, stress bands and the strength table the wire is judged by
 * @param candidates      other wire makers' tables to try as a stronger wire (may be empty)
 * @param marginPct       a note stands out when its percent of breaking strength differs from
 *                        the trend of its section by more than this, % (default 8 %)
 * @param sizes           music-wire sizes, for trying a thinner size of inch wire
 * @param metricDiameters metric plain-wire diameters, m, for trying a thinner metric wire
 */
public record DiagnosisRequest(Scale scale, KeyRange range, AnalysisSettings settings, List<StrengthTable> candidates,
                               double marginPct, WireSizeTable sizes, List<Double> metricDiameters) {
    /** Default stand-out margin: 8 % (DESIGN §5; common practice, no source). */
    public static final double DEFAULT_MARGIN_PCT = 8.0;

    public DiagnosisRequest {
        if (scale == null || range == null || settings == null) {
            throw new IllegalArgumentException("a diagnosis needs a scale, a key range and analysis settings");
        }
        if (scale.notesIn(range).isEmpty()) {
            throw new IllegalArgumentException("key range " + range + " holds no note of the scale");
        }
        if (!(marginPct > 0 && marginPct < 100)) {
            throw new IllegalArgumentException("stand-out margin must be between 0 and 100 %, was " + marginPct);
        }
        candidates = candidates == null ? List.of() : List.copyOf(candidates);
        metricDiameters = metricDiameters == null ? List.of()
                : List.copyOf(metricDiameters.stream().sorted().toList());
    }

    /** @return a request with the default margin and no candidate tables */
    public static DiagnosisRequest of(Scale scale, KeyRange range, AnalysisSettings settings, WireSizeTable sizes,
                                      List<Double> metricDiameters) {
        return new DiagnosisRequest(scale, range, settings, List.of(), DEFAULT_MARGIN_PCT, sizes, metricDiameters);
    }

    public DiagnosisRequest withCandidates(List<StrengthTable> tables) {
        return new DiagnosisRequest(scale, range, settings, tables, marginPct, sizes, metricDiameters);
    }

    public DiagnosisRequest withMargin(double pct) {
        return new DiagnosisRequest(scale, range, settings, candidates, pct, sizes, metricDiameters);
    }
}
