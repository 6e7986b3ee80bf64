package org.scalewright.io;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import org.scalewright.model.Note;
import org.scalewright.model.NumberText;
import org.scalewright.model.UnitConversions;
import org.scalewright.model.WireNotation;
import org.scalewright.physics.Flag;
import org.scalewright.physics.NoteResult;
import org.scalewright.physics.ScaleAnalysis;

/**
 * The per-note results of an analysis as CSV rows in SI (DESIGN §5, {@code analyze --out}); each
 * note's wire in the one notation and a wound string's outside diameter at the end of the row.
 */
public final class AnalysisCsv {
    /** The columns, in order. */
    public static final List<String> HEADER = List.of("key", "note", "section", "frequency_hz", "strings", "wound",
            "core_mm", "mass_per_length_g_m", "tension_n", "tension_lbf", "note_tension_n", "stress_mpa",
            "breaking_strength_mpa", "break_pct", "inharmonicity_b", "headroom_cents", "break_hz",
            "impedance_kg_s", "elongation_mm", "band", "flags", "wire", "od_mm");

    private AnalysisCsv() {
    }

    /** @return header comments naming the scale, pitch standard and strength table */
    public static List<String> comments(ScaleAnalysis a) {
        List<String> c = new ArrayList<>();
        if (!a.scale().title().isEmpty()) {
            c.add("scale: " + a.scale().title());
        }
        c.add("a4_hz: " + NumberText.number(a.scale().pitch().a4()));
        c.add("strength table: " + a.settings().strength().name());
        c.add("total tension: " + NumberText.rounded(a.totalTension(), 0) + " N");
        return c;
    }

    /** @return one row per note */
    public static List<List<String>> rows(ScaleAnalysis a) {
        List<List<String>> rows = new ArrayList<>(a.notes().size());
        for (NoteResult r : a.notes()) {
            Note n = a.scale().note(r.key()).orElseThrow();
            rows.add(List.of(Integer.toString(r.key()), r.noteName(), r.section(), NumberText.rounded(r.frequency(), 4),
                    Integer.toString(r.strings()), Boolean.toString(r.wound()),
                    NumberText.rounded(r.coreDiameter() * 1e3, 4), NumberText.rounded(r.massPerLength() * 1e3, 5),
                    NumberText.rounded(r.tension(), 2), NumberText.rounded(UnitConversions.newtonsToLbf(r.tension()), 2),
                    NumberText.rounded(r.noteTension(), 2), NumberText.rounded(r.stress() / 1e6, 2),
                    NumberText.rounded(r.breakingStrength() / 1e6, 2), NumberText.rounded(r.breakPct(), 3),
                    NumberText.scientific(r.inharmonicity(), 4), NumberText.rounded(r.headroomCents(), 1),
                    NumberText.rounded(r.breakingFrequency(), 3), NumberText.rounded(r.impedance(), 4),
                    NumberText.rounded(r.elongation() * 1e3, 3), r.band().word(),
                    r.flags().stream().map(Flag::detail).collect(Collectors.joining("; ")),
                    WireNotation.of(n), n.isWound() ? NumberText.rounded(n.outsideDiameter() * 1e3, 3) : ""));
        }
        return rows;
    }
}
