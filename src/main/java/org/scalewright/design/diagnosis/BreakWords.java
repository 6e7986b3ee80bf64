package org.scalewright.design.diagnosis;

import java.util.ArrayList;
import java.util.DoubleSummaryStatistics;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.scalewright.model.BreakPlace;
import org.scalewright.model.KeyNames;
import org.scalewright.model.NumberText;
import org.scalewright.physics.StressAtBreak;

/** Puts the recorded breaks of a diagnosed range into the finding's words. */
final class BreakWords {
    private BreakWords() {
    }

    static List<String> write(DiagnosisRequest request, List<BrokenString> broken, int outside, int missing,
                              boolean follows, Optional<String> section, Optional<BreakPlace> place,
                              Optional<String> batch, int rangeNotes) {
        List<String> words = new ArrayList<>();
        String elsewhere = (outside > 0 ? String.format(Locale.ROOT, "; %d more outside keys %s", outside,
                request.range()) : "") + (missing > 0 ? String.format(Locale.ROOT, "; %d on keys the sheet has no "
                + "note for", missing) : "");
        if (broken.isEmpty()) {
            words.add("Recorded breaks: none on keys " + request.range() + elsewhere + ".");
            return words;
        }
        String first = broken.stream().map(b -> b.record().date()).min(Comparable::compareTo).orElseThrow().toString();
        String last = broken.stream().map(b -> b.record().date()).max(Comparable::compareTo).orElseThrow().toString();
        words.add(String.format(Locale.ROOT, "Recorded breaks: %d string%s broke on keys %s (%s)%s, %s. %s",
                broken.size(), broken.size() == 1 ? "" : "s", request.range(), BreakFindings.keysWithCounts(broken),
                elsewhere, first.equals(last) ? "on " + first : "from " + first + " to " + last, working(broken)));
        words.add(stressAtBreak(broken));
        words.add(pattern(broken, follows, section, place, batch, rangeNotes));
        if (broken.stream().anyMatch(b -> b.record().during().underRisingTension())) {
            words.add("Some of these broke during a pitch raise or while a string was brought up: a breaking string "
                    + "can whip and its wire ends cut. Wear eye protection, raise a large pitch change in stages and "
                    + "check the plate, pin block and bridges between them; defer to the maker's specifications and "
                    + "licensed, experienced practice.");
        }
        return words;
    }

    /** @return the broken notes at their working pitch: percent of breaking strength and headroom */
    private static String working(List<BrokenString> broken) {
        DoubleSummaryStatistics pct = broken.stream().mapToDouble(b -> b.working().breakPct()).summaryStatistics();
        DoubleSummaryStatistics cents = broken.stream().mapToDouble(b -> b.working().headroomCents())
                .summaryStatistics();
        return String.format(Locale.ROOT, "At the working pitch these notes stand at %s of breaking strength with "
                + "%s cents of headroom.", span(pct, "%.1f", " %"), span(cents, "%.0f", ""));
    }

    private static String span(DoubleSummaryStatistics s, String format, String unit) {
        String lo = String.format(Locale.ROOT, format, s.getMin());
        String hi = String.format(Locale.ROOT, format, s.getMax());
        return (lo.equals(hi) ? lo : lo + " to " + hi) + unit;
    }

    private static String stressAtBreak(List<BrokenString> broken) {
        List<BrokenString> known = broken.stream().filter(b -> b.atBreak().isPresent()).toList();
        if (known.isEmpty()) {
            return "No pitch at break was recorded, so the breaks say nothing of the wire's real strength; a pitch "
                    + "read off a tuning device when a string breaks during a pitch raise is the best measure of it.";
        }
        StringBuilder b = new StringBuilder(String.format(Locale.ROOT, "%d broke at a known pitch:", known.size()));
        String sep = " ";
        for (BrokenString s : known) {
            StressAtBreak at = s.atBreak().orElseThrow();
            b.append(sep).append(s.key()).append(' ').append(KeyNames.name(s.key())).append(" at ")
                    .append(NumberText.plain(at.breakHz())).append(" Hz, ").append(BreakFindings.mpa(at.stress()))
                    .append(", ").append(NumberText.fixed(at.ratio(), 2)).append(" of the table's ")
                    .append(BreakFindings.mpa(at.tableStrength()));
            sep = "; ";
        }
        b.append('.');
        long weak = known.stream().filter(s -> s.atBreak().orElseThrow().ratio() < BreakFindings.WEAK_RATIO).count();
        if (weak == known.size()) {
            b.append(String.format(Locale.ROOT, " Each broke under %.0f %% of the table's strength: the wire was "
                    + "weaker than the table, or was damaged where it broke (a sharp bearing edge, rust, a kink, a "
                    + "nick from fitting); the stress alone does not explain it.", 100 * BreakFindings.WEAK_RATIO));
        } else if (weak == 0) {
            b.append(String.format(Locale.ROOT, " Each broke at %.0f %% of the table's strength or more: the wire "
                    + "held what the table says it holds, so what breaks it is the stress, not a weak wire.",
                    100 * BreakFindings.WEAK_RATIO));
        } else {
            b.append(String.format(Locale.ROOT, " %d of them broke under %.0f %% of the table's strength: look for "
                    + "damage or weak wire on those strings.", weak, 100 * BreakFindings.WEAK_RATIO));
        }
        return b.toString();
    }

    private static String pattern(List<BrokenString> broken, boolean follows, Optional<String> section,
                                  Optional<BreakPlace> place, Optional<String> batch, int rangeNotes) {
        List<String> parts = new ArrayList<>();
        if (rangeNotes < 3) {
            parts.add("The range is too short to say whether the breaks follow stress");
        } else if (follows) {
            parts.add("The breaks follow stress: the broken notes are among the most stressed of the range");
        } else {
            parts.add("The breaks do not follow stress: the broken notes are not the most stressed of the range, "
                    + "so look beyond the scale");
        }
        section.ifPresent(s -> parts.add("all lie in one section (" + s + ")"));
        long placed = broken.stream().filter(b -> b.record().place() != BreakPlace.UNKNOWN).count();
        if (place.isPresent()) {
            long at = broken.stream().filter(b -> b.record().place() == place.get()).count();
            parts.add(String.format(Locale.ROOT, "%d of the %d with a recorded place broke %s: inspect that bearing "
                    + "point for a sharp edge, a groove or rust", at, placed, place.get().phrase()));
        } else if (placed >= 2) {
            parts.add("they broke at different places along the string");
        }
        long batched = broken.stream().filter(b -> !b.record().wireBatch().isEmpty()).count();
        if (batch.isPresent()) {
            parts.add(String.format(Locale.ROOT, "all %d with a recorded batch are wire of batch '%s': suspect that "
                    + "batch", batched, batch.get()));
        } else if (batched >= 2) {
            parts.add("they come from more than one batch of wire");
        }
        return String.join("; ", parts) + ".";
    }
}
