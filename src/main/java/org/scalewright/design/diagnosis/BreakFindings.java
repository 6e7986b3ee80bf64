package org.scalewright.design.diagnosis;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.scalewright.model.BreakPlace;
import org.scalewright.model.KeyNames;
import org.scalewright.model.Note;
import org.scalewright.model.NumberText;
import org.scalewright.model.StringBreak;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.StressAtBreak;

/**
 * What the recorded breaks of a diagnosed range say: how many broke where, at what stress (where
 * the pitch at break is known) and with what headroom at the working pitch, and whether they follow
 * stress, keep to one section, one bearing point or one batch of wire.
 *
 * @param strings       the breaks on notes of the range, by key then date
 * @param outsideRange  breaks recorded on keys outside the range (not judged here)
 * @param notInScale    breaks on keys of the range that the scale has no note for
 * @param followsStress true when the broken notes are among the most stressed of the range (their
 *                      mean rank by percent of breaking strength in the upper third); false also
 *                      when the range is too small to say
 * @param section       the one section all breaks lie in, when they do and the range has more than one
 * @param place         the bearing point (or the speaking length) where at least two thirds of the
 *                      breaks with a recorded place broke, at least two of them
 * @param batch         the one wire batch of all breaks with a recorded batch, at least two of them
 * @param words         the paragraphs added to the diagnosis's finding (empty when there are no breaks)
 */
public record BreakFindings(List<BrokenString> strings, int outsideRange, int notInScale, boolean followsStress,
                            Optional<String> section, Optional<BreakPlace> place, Optional<String> batch,
                            List<String> words) {
    /** No breaks recorded (a diagnosis without an archive). */
    public static final BreakFindings NONE = new BreakFindings(List.of(), 0, 0, false, Optional.empty(),
            Optional.empty(), Optional.empty(), List.of());

    /** Mean rank (0 lowest … 1 highest) of the broken notes by percent above which the breaks follow stress. */
    static final double FOLLOWS_STRESS_RANK = 2.0 / 3;
    /** Share of the breaks with a known place that must agree to name one bearing point. */
    static final double ONE_PLACE_SHARE = 2.0 / 3;
    /** A ratio of stress at break to the table's strength under this says the wire broke weak. */
    static final double WEAK_RATIO = 0.9;

    public BreakFindings {
        strings = List.copyOf(strings);
        words = List.copyOf(words);
    }

    /**
     * @param request the diagnosis asked (scale, range, settings)
     * @param notes   the diagnosed notes of the range and their sections
     * @param breaks  every break recorded for the instrument (those outside the range are counted only)
     * @return the findings; {@link #NONE} when {@code breaks} is empty
     */
    public static BreakFindings of(DiagnosisRequest request, List<DiagnosedNote> notes, List<StringBreak> breaks) {
        if (breaks.isEmpty()) {
            return NONE;
        }
        List<DiagnosedNote> inRange = notes.stream().filter(n -> request.range().contains(n.key())).toList();
        Map<Integer, DiagnosedNote> byKey = inRange.stream().collect(Collectors.toMap(DiagnosedNote::key,
                Function.identity()));
        List<BrokenString> strings = new ArrayList<>();
        int outside = 0;
        int missing = 0;
        for (StringBreak b : breaks) {
            if (!request.range().contains(b.key())) {
                outside++;
                continue;
            }
            DiagnosedNote d = byKey.get(b.key());
            Optional<Note> note = request.scale().note(b.key());
            if (d == null || note.isEmpty()) {
                missing++;
                continue;
            }
            Optional<StressAtBreak> at = b.breakHz().isPresent()
                    ? Optional.of(StressAtBreak.of(note.get(), b.breakHz().getAsDouble(), request.settings()))
                    : Optional.empty();
            strings.add(new BrokenString(b, d.result(), at));
        }
        strings.sort(Comparator.comparingInt(BrokenString::key).thenComparing(s -> s.record().date()));
        boolean follows = followsStress(inRange, strings);
        Optional<String> section = oneSection(inRange, strings);
        Optional<BreakPlace> place = onePlace(strings);
        Optional<String> batch = oneBatch(strings);
        List<String> words = BreakWords.write(request, strings, outside, missing, follows, section, place, batch,
                inRange.size());
        return new BreakFindings(strings, outside, missing, follows, section, place, batch, words);
    }

    /** @return true when the broken notes' mean rank by percent of breaking strength is in the top third */
    static boolean followsStress(List<DiagnosedNote> range, List<BrokenString> broken) {
        if (broken.isEmpty() || range.size() < 3) {
            return false;
        }
        List<Double> sorted = range.stream().map(DiagnosedNote::breakPct).sorted().toList();
        double sum = 0;
        for (BrokenString b : broken) {
            double pct = b.working().breakPct();
            long below = sorted.stream().filter(p -> p < pct).count();
            long same = sorted.stream().filter(p -> p == pct).count();
            sum += (below + (same - 1) / 2.0) / (sorted.size() - 1);
        }
        return sum / broken.size() >= FOLLOWS_STRESS_RANK;
    }

    private static Optional<String> oneSection(List<DiagnosedNote> range, List<BrokenString> broken) {
        if (broken.isEmpty()) {
            return Optional.empty();
        }
        long sections = range.stream().map(n -> sectionOf(n.result())).distinct().count();
        List<String> hit = broken.stream().map(b -> sectionOf(b.working())).distinct().toList();
        return sections > 1 && hit.size() == 1 ? Optional.of(hit.get(0)) : Optional.empty();
    }

    /** @return a note's section as the words name it: its label, or "plain"/"wound" where it has none */
    static String sectionOf(NoteResult r) {
        return r.section().isEmpty() ? (r.wound() ? "wound" : "plain") : r.section();
    }

    private static Optional<BreakPlace> onePlace(List<BrokenString> broken) {
        List<BreakPlace> known = broken.stream().map(b -> b.record().place()).filter(p -> p != BreakPlace.UNKNOWN)
                .toList();
        return mostOf(known).filter(e -> e.getValue() >= 2 && e.getValue() >= ONE_PLACE_SHARE * known.size())
                .map(Map.Entry::getKey);
    }

    private static Optional<String> oneBatch(List<BrokenString> broken) {
        List<String> known = broken.stream().map(b -> b.record().wireBatch()).filter(s -> !s.isEmpty()).toList();
        return known.size() >= 2 && known.stream().distinct().count() == 1 ? Optional.of(known.get(0))
                : Optional.empty();
    }

    private static <T extends Comparable<T>> Optional<Map.Entry<T, Long>> mostOf(Collection<T> items) {
        Map<T, Long> counts = new TreeMap<>(items.stream().collect(Collectors.groupingBy(Function.identity(),
                Collectors.counting())));
        return counts.entrySet().stream().max(Map.Entry.comparingByValue());
    }

    /** @return the keys with their count of breaks, {@code 64 E4 ×2, 70 A#4} */
    static String keysWithCounts(List<BrokenString> broken) {
        Map<Integer, Long> counts = new TreeMap<>(broken.stream().collect(Collectors.groupingBy(BrokenString::key,
                Collectors.counting())));
        return counts.entrySet().stream().map(e -> e.getKey() + " " + KeyNames.name(e.getKey())
                + (e.getValue() > 1 ? " \u00d7" + e.getValue() : "")).collect(Collectors.joining(", "));
    }

    static String mpa(double pa) {
        return NumberText.fixed(pa / 1e6, 0) + " MPa";
    }

    static String pct(double v) {
        return String.format(Locale.ROOT, "%.1f %%", v);
    }
}
