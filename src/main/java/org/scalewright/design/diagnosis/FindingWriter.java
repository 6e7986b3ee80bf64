package org.scalewright.design.diagnosis;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.function.ToDoubleFunction;
import org.scalewright.model.KeyNames;
import org.scalewright.model.KeyRange;
import org.scalewright.model.NumberText;
import org.scalewright.physics.StrengthTable;
import org.scalewright.physics.StressBands;

/** Puts a diagnosis into plain words: the range, the notes standing out, the cause, the remedies. */
final class FindingWriter {
    /** A share of a factor below this, %, is not worth naming as a cause. */
    private static final double NEGLIGIBLE_PCT = 1.0;

    private FindingWriter() {
    }

    static Finding write(DiagnosisRequest request, List<DiagnosedNote> all) {
        KeyRange range = request.range();
        List<DiagnosedNote> notes = all.stream().filter(n -> range.contains(n.key())).toList();
        StressBands bands = request.settings().bands();
        List<DiagnosedNote> high = notes.stream().filter(DiagnosedNote::standsOutHigh).toList();
        List<DiagnosedNote> low = notes.stream().filter(n -> n.standsOut() && n.trendDeviationPct() < 0).toList();
        List<DiagnosedNote> atCaution = notes.stream().filter(n -> n.breakPct() >= bands.caution()).toList();
        boolean woundInRange = notes.stream().anyMatch(n -> n.result().wound());
        StressCause cause = cause(high, atCaution);
        List<String> words = new ArrayList<>();
        words.add(summary(request, notes, atCaution));
        words.add(standingOut(request, high, low));
        words.add(causeWords(cause, high, atCaution));
        List<Remedy> remedies = List.of();
        DiagnosedNote top = notes.stream().max(Comparator.comparingDouble(DiagnosedNote::breakPct)).orElseThrow();
        if (atCaution.isEmpty()) {
            StringBuilder b = new StringBuilder(String.format(Locale.ROOT, "The range is under the caution band "
                    + "(highest %.1f %% at %s): no change is needed to bring it under.", top.breakPct(), name(top)));
            if (!high.isEmpty()) {
                b.append(" The trend of their section gives the notes standing out these speaking lengths:");
                appendTrendLengths(b, high);
            }
            words.add(b.toString());
            if (!request.candidates().isEmpty()) {
                words.add(comparedTables(request, top.breakPct()));
            }
        } else {
            remedies = Remedies.all(request, all, cause);
            long fixing = remedies.stream().filter(Remedy::fixes).count();
            words.add(String.format(Locale.ROOT, "%d of these changes, each applied to a copy of the scale and "
                            + "recomputed, would bring every note of the range under the caution band (%.0f %%); "
                            + "they aim %.1f points under it.", fixing, bands.caution(),
                    SectionDiagnosis.AIM_BELOW_CAUTION));
            if (!high.isEmpty()) {
                StringBuilder b = new StringBuilder("The trend of their section gives the notes standing out these "
                        + "speaking lengths:");
                appendTrendLengths(b, high);
                words.add(b.toString());
            }
        }
        boolean pitchShare = high.stream().anyMatch(n -> n.share().pitchPct() > NEGLIGIBLE_PCT);
        return new Finding(cause, words, remedies, Inspection.items(cause, woundInRange, pitchShare));
    }

    private static StressCause cause(List<DiagnosedNote> high, List<DiagnosedNote> atCaution) {
        if (!high.isEmpty()) {
            double lengthAndPitch = 0;
            double wire = 0;
            for (DiagnosedNote n : high) {
                lengthAndPitch += Math.log1p(n.share().lengthAndPitchPct() / 100);
                wire += Math.log1p(n.share().wirePct() / 100);
            }
            return lengthAndPitch >= wire ? StressCause.LENGTH_AND_PITCH : StressCause.WIRE;
        }
        if (!atCaution.isEmpty()) {
            return atCaution.stream().allMatch(n -> !n.result().wound()) ? StressCause.LENGTH_AND_PITCH
                    : StressCause.WIRE;
        }
        return StressCause.NONE;
    }

    private static String summary(DiagnosisRequest request, List<DiagnosedNote> notes, List<DiagnosedNote> atCaution) {
        StressBands bands = request.settings().bands();
        double min = notes.stream().mapToDouble(DiagnosedNote::breakPct).min().orElse(0);
        double max = notes.stream().mapToDouble(DiagnosedNote::breakPct).max().orElse(0);
        long danger = notes.stream().filter(n -> n.breakPct() >= bands.danger()).count();
        KeyRange r = request.range();
        return String.format(Locale.ROOT, "Keys %d-%d (%s-%s), %d notes at A4 = %s Hz, judged by %s: %.1f to %.1f %% "
                        + "of breaking strength; %d at or above the caution band (%.0f %%), %d in the danger band "
                        + "(%.0f %%).", r.first(), r.last(), KeyNames.name(r.first()), KeyNames.name(r.last()),
                notes.size(), trim(request.scale().pitch().a4()), request.settings().strength().name(), min, max,
                atCaution.size(), bands.caution(), danger, bands.danger());
    }

    private static String standingOut(DiagnosisRequest request, List<DiagnosedNote> high, List<DiagnosedNote> low) {
        if (high.isEmpty() && low.isEmpty()) {
            return String.format(Locale.ROOT, "No note stands out from the trend of its section by more than %.0f %%.",
                    request.marginPct());
        }
        StringBuilder b = new StringBuilder();
        if (!high.isEmpty()) {
            b.append(String.format(Locale.ROOT, "%d note%s stand%s out above the trend of %s section by more than "
                            + "%.0f %%:", high.size(), high.size() == 1 ? "" : "s", high.size() == 1 ? "s" : "",
                    high.size() == 1 ? "its" : "their", request.marginPct()));
            list(b, high);
        }
        if (!low.isEmpty()) {
            b.append(b.length() == 0 ? "" : " ").append(String.format(Locale.ROOT, "%d stand%s out below it:",
                    low.size(), low.size() == 1 ? "s" : ""));
            list(b, low);
        }
        return b.toString();
    }

    private static void list(StringBuilder b, List<DiagnosedNote> notes) {
        String sep = " ";
        for (DiagnosedNote n : notes) {
            b.append(String.format(Locale.ROOT, "%s%s %.1f %% (%+.1f %% from %.1f %%)", sep, name(n), n.breakPct(),
                    n.trendDeviationPct(), n.trendPct()));
            sep = ", ";
        }
        b.append('.');
    }

    private static String causeWords(StressCause cause, List<DiagnosedNote> high, List<DiagnosedNote> atCaution) {
        if (cause == StressCause.NONE) {
            return "Nothing in the figures explains breaking strings here: no note stands out above its trend and "
                    + "none reaches the caution band. Look at what the figures cannot see (below).";
        }
        if (high.isEmpty()) {
            boolean plain = atCaution.stream().noneMatch(n -> n.result().wound());
            if (plain) {
                return "No note stands out: the range runs high as a whole. These are plain wire, whose stress "
                        + "(4 L² f² ρ, less a small stiffness term) is the same for any diameter, so it is the scale "
                        + "itself, its speaking lengths at this pitch, that sets it, not the wire.";
            }
            return "No note stands out: the range runs high as a whole. On wound strings the core carries the "
                    + "winding's mass as well as its own, so the stress is set by the wire: the winding is heavy "
                    + "for the core at these lengths.";
        }
        boolean allPlain = high.stream().noneMatch(n -> n.result().wound());
        StringBuilder b = new StringBuilder();
        if (cause == StressCause.LENGTH_AND_PITCH) {
            b.append("The stress is set by length and pitch, not by the wire.");
            if (allPlain) {
                b.append(" These are plain wire, whose stress (4 L² f² ρ, less a small stiffness term) is the same "
                        + "for any diameter.");
            }
        } else {
            b.append("The stress is set by the wire.");
            if (allPlain) {
                b.append(" The strength of the wire on these notes is lower than the trend of the section: a "
                        + "thicker size (thicker plain wire is weaker) or a weaker table.");
            } else {
                b.append(" On wound strings the core carries the winding: a heavy winding on a thin core raises "
                        + "the stress.");
            }
        }
        DiagnosedNote worst = high.stream().max(Comparator.comparingDouble(DiagnosedNote::trendDeviationPct))
                .orElseThrow();
        b.append(String.format(Locale.ROOT, " Their speaking lengths differ from the trend of the section by %s "
                        + "(%s: %s mm where the trend gives %s mm), which alone changes their stress by %s",
                range(high, n -> 100 * (n.speakingLength() / n.trendLength() - 1)), name(worst),
                mm(worst.speakingLength()), mm(worst.trendLength()), range(high, n -> n.share().lengthPct())));
        b.append(String.format(Locale.ROOT, "; the pitch by %s", range(high, n -> n.share().pitchPct())));
        if (!allPlain) {
            b.append(String.format(Locale.ROOT, "; the mass per area of the core by %s",
                    range(high, n -> n.share().massPct())));
        }
        b.append(String.format(Locale.ROOT, "; the wire's strength by %s.", range(high, n -> n.share().strengthPct())));
        return b.toString();
    }

    /**
     * Appends each note's trend length: the section's trend of speaking length at that key, the
     * very figure the table and the CSV show ({@link DiagnosedNote#trendLength()}), rounded by {@link #mm}.
     */
    private static void appendTrendLengths(StringBuilder b, List<DiagnosedNote> notes) {
        String sep = " ";
        for (DiagnosedNote n : notes) {
            b.append(sep).append(name(n)).append(' ').append(mm(n.trendLength())).append(" mm (now ")
                    .append(mm(n.speakingLength())).append(')');
            sep = ", ";
        }
        b.append('.');
    }

    /**
     * What each table given to compare would do to the range, whether or not anything runs high:
     * the range's highest percent of breaking strength recomputed with it, beside the present one.
     */
    private static String comparedTables(DiagnosisRequest request, double now) {
        StressBands bands = request.settings().bands();
        StringBuilder b = new StringBuilder();
        for (StrengthTable t : request.candidates()) {
            double with = Remedies.maxPct(request.scale(), request.range(), request.settings().withStrength(t));
            String band = with >= bands.danger() ? "in the danger band"
                    : with >= bands.caution() ? "in the caution band" : "under the caution band";
            b.append(b.length() == 0 ? "" : " ").append("With '").append(t.name())
                    .append("' the highest note of the range would be at ").append(NumberText.fixed(with, 1))
                    .append(" % of breaking strength (now ").append(NumberText.fixed(now, 1)).append(" %), ")
                    .append(band).append('.');
        }
        return b.toString();
    }

    /**
     * A length in millimetres as the finding writes it, 0.1 mm: the one rounding of a length in the
     * diagnosis's words, the same as the terminal table's.
     *
     * @param metres a length, m
     */
    static String mm(double metres) {
        return NumberText.fixed(metres * 1e3, 1);
    }

    private static String range(List<DiagnosedNote> notes, ToDoubleFunction<DiagnosedNote> f) {
        double min = notes.stream().mapToDouble(f).min().orElse(0);
        double max = notes.stream().mapToDouble(f).max().orElse(0);
        if (Math.abs(max - min) < 0.05) {
            return String.format(Locale.ROOT, "%+.1f %%", max);
        }
        return String.format(Locale.ROOT, "%+.1f to %+.1f %%", min, max);
    }

    static String name(DiagnosedNote n) {
        return n.key() + " " + n.result().noteName();
    }

    private static String trim(double v) {
        return NumberText.plain(v);
    }
}
