package org.scalewright.archive;

import java.util.ArrayList;
import java.util.List;
import org.scalewright.model.NumberText;
import org.scalewright.physics.StressAtBreak;

/** The columns of {@code archive breaks --out}: one row per recorded break, SI-derived units. */
public final class BreakList {
    /** The CSV header: pitch in Hz, stresses in MPa, the ratio of stress at break to the table's strength. */
    public static final List<String> HEADER = List.of("key", "date", "break_hz", "stress_at_break_mpa",
            "table_strength_mpa", "strength_ratio");

    private BreakList() {
    }

    /**
     * @return one row per break; the stress columns are empty where the pitch at break is not known
     *         or no scale version holds the key. Pitch as recorded, stresses to 0.1 MPa, the ratio to 0.001.
     */
    public static List<List<String>> rows(List<JudgedBreak> breaks) {
        List<List<String>> rows = new ArrayList<>();
        for (JudgedBreak j : breaks) {
            var b = j.archived().record();
            List<String> row = new ArrayList<>(List.of(Integer.toString(b.key()), b.date().toString(),
                    b.breakHz().isPresent() ? NumberText.plain(b.breakHz().getAsDouble()) : ""));
            if (j.stress().isPresent()) {
                StressAtBreak s = j.stress().get();
                row.add(NumberText.fixed(s.stress() / 1e6, 1));
                row.add(NumberText.fixed(s.tableStrength() / 1e6, 1));
                row.add(NumberText.fixed(s.ratio(), 3));
            } else {
                row.addAll(List.of("", "", ""));
            }
            rows.add(row);
        }
        return rows;
    }
}
