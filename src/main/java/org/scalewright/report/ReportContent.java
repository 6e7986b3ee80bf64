package org.scalewright.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.scalewright.design.orders.StringSchedule;
import org.scalewright.design.orders.WireAllowances;
import org.scalewright.design.orders.WireOrder;
import org.scalewright.design.orders.WoundOrder;
import org.scalewright.design.stretch.OctaveType;
import org.scalewright.design.stretch.StretchCurve;
import org.scalewright.design.stretch.TuningStretch;
import org.scalewright.physics.ScaleAnalysis;

/**
 * What a report of one instrument shows besides its charts, all computed from the analysis.
 *
 * @param sheetName  the scale sheet's file name
 * @param analysis   the analysis of the working scale
 * @param reference  a reference scale drawn beside it (e.g. as measured), if any
 * @param units      units of the tables and charts
 * @param allowances the wire-order allowances
 * @param schedule   the string schedule
 * @param woundOrder the wound-string order
 * @param wireOrder  the plain-wire order
 * @param stretch    the tuning stretch for every octave type, the chosen one first
 * @param paper      the paper of the PDF (null: the usual one for the units, {@link ReportPaper#of})
 */
public record ReportContent(String sheetName, ScaleAnalysis analysis, Optional<Reference> reference,
                            ReportUnits units, WireAllowances allowances, StringSchedule schedule,
                            WoundOrder woundOrder, WireOrder wireOrder, List<StretchCurve> stretch,
                            ReportPaper paper) {

    /**
     * A reference scale.
     *
     * @param sheetName its sheet's file name
     * @param analysis  its analysis
     */
    public record Reference(String sheetName, ScaleAnalysis analysis) {
    }

    public ReportContent {
        if (analysis == null || schedule == null || woundOrder == null || wireOrder == null || allowances == null) {
            throw new IllegalArgumentException("report needs the analysis, schedule, orders and allowances");
        }
        if (stretch == null || stretch.isEmpty()) {
            throw new IllegalArgumentException("report needs at least one stretch curve");
        }
        sheetName = sheetName == null ? "" : sheetName;
        reference = reference == null ? Optional.empty() : reference;
        units = units == null ? ReportUnits.METRIC : units;
        stretch = List.copyOf(stretch);
        paper = paper == null ? ReportPaper.of(units) : paper;
    }

    /**
     * Computes everything a report shows except the charts; the PDF on the usual paper for
     * the units ({@link #withPaper} to choose another).
     *
     * @param sheetName  the scale sheet's file name
     * @param analysis   the working scale's analysis
     * @param reference  a reference scale, or empty
     * @param units      table units
     * @param octave     the octave type whose stretch is {@code stretch_cents}
     * @param allowances the wire-order allowances
     */
    public static ReportContent compute(String sheetName, ScaleAnalysis analysis, Optional<Reference> reference,
                                        ReportUnits units, OctaveType octave, WireAllowances allowances) {
        List<StretchCurve> stretch = new ArrayList<>();
        stretch.add(TuningStretch.of(analysis, octave));
        for (OctaveType o : OctaveType.values()) {
            if (o != octave) {
                stretch.add(TuningStretch.of(analysis, o));
            }
        }
        return new ReportContent(sheetName, analysis, reference, units, allowances, StringSchedule.of(analysis),
                WoundOrder.of(analysis), WireOrder.of(analysis, allowances), stretch, null);
    }

    /** @return the same content with the PDF on {@code paper} (null: the usual one for the units) */
    public ReportContent withPaper(ReportPaper paper) {
        return new ReportContent(sheetName, analysis, reference, units, allowances, schedule, woundOrder, wireOrder,
                stretch, paper);
    }

    /** @return the stretch curve of the chosen octave type */
    public StretchCurve chosenStretch() {
        return stretch.get(0);
    }

    /** @return the stretch curves in octave-type order 2:1, 4:2, 6:3 */
    public List<StretchCurve> stretchInOrder() {
        return stretch.stream().sorted(java.util.Comparator.comparing(StretchCurve::octave)).toList();
    }

    /** @return the scale's title, or the sheet name when it has none */
    public String title() {
        String t = analysis.scale().title();
        return t.isEmpty() ? sheetName : t;
    }
}
