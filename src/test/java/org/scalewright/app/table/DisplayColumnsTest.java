package org.scalewright.app.table;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.TestSheets;
import org.scalewright.model.DisplayUnits;
import org.scalewright.model.ForceUnit;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.UnitConversions;

/**
 * The note table's columns in every unit choice: imperial complete (stress in ksi beside lbf),
 * the same decimals down each column, every column named in the column chooser, and a refused
 * entry leaving the row as it was.
 */
class DisplayColumnsTest {
    @TempDir
    Path dir;
    private ScaleSession session;
    private NoteTableViewModel table;

    @BeforeEach
    void open() throws Exception {
        session = new ScaleSession();
        session.open(TestSheets.small(dir), true);
        table = new NoteTableViewModel(session);
    }

    private List<String> column(NoteColumn c) {
        return table.rows().stream().map(r -> c.text(r, session.units())).filter(t -> !t.isEmpty()).toList();
    }

    private static Set<Integer> decimals(List<String> cells) {
        return cells.stream().map(t -> t.contains(".") ? t.length() - t.indexOf('.') - 1 : 0).collect(Collectors.toSet());
    }

    @Test
    void withInchesAndPoundsForceStressIsInKsi() {
        session.unitsProperty().set(DisplayUnits.IMPERIAL);
        assertEquals("stress\nksi", table.header(NoteColumn.STRESS).get());
        NoteRow first = table.rows().get(0);
        double ksi = first.result().stress() / UnitConversions.PASCALS_PER_KSI; // 1 ksi = 6.894757 MPa (NIST SP 811, B.8)
        assertEquals(ksi, Double.parseDouble(NoteColumn.STRESS.text(first, session.units())), 0.05 + 1e-9);
        assertEquals(ksi * 1000 * 6894.757293168, first.result().stress(), 1e-3 * first.result().stress(),
                "psi × 6894.757 Pa/psi (NIST SP 811, B.8)");
        session.unitsProperty().set(DisplayUnits.METRIC);
        assertEquals("stress\nMPa", table.header(NoteColumn.STRESS).get());
        session.unitsProperty().set(new DisplayUnits(LengthUnit.MM, ForceUnit.KGF));
        assertEquals("stress\nMPa", table.header(NoteColumn.STRESS).get(), "kgf goes with mm: stress stays in MPa");
    }

    @Test
    void eachColumnShowsOneNumberOfDecimalsInEveryUnitChoice() {
        for (DisplayUnits u : List.of(DisplayUnits.METRIC, DisplayUnits.IMPERIAL,
                new DisplayUnits(LengthUnit.MM, ForceUnit.KGF))) {
            session.unitsProperty().set(u);
            for (NoteColumn c : List.of(NoteColumn.LENGTH, NoteColumn.WRAP1, NoteColumn.WRAP2, NoteColumn.OD,
                    NoteColumn.OD1, NoteColumn.PITCH, NoteColumn.TENSION, NoteColumn.NOTE_TENSION, NoteColumn.STRESS,
                    NoteColumn.BREAK_PCT, NoteColumn.HEADROOM)) {
                assertEquals(1, decimals(column(c)).size(), u + " " + c + ": " + column(c));
            }
        }
        session.unitsProperty().set(DisplayUnits.IMPERIAL);
        assertEquals(Set.of(4), decimals(column(NoteColumn.WRAP1)), "0.0001 in, a micrometer's reading");
        assertEquals(Set.of(2), decimals(column(NoteColumn.LENGTH)));
        assertEquals(Set.of(1), decimals(column(NoteColumn.STRESS)));
    }

    @Test
    void theColumnChooserNamesEveryColumnWithItsUnit() {
        session.unitsProperty().set(DisplayUnits.IMPERIAL);
        for (NoteColumn c : NoteColumn.values()) {
            String name = c.chooserName(table.header(c).get());
            assertFalse(name.isBlank(), c.name());
            assertFalse(name.contains("\n"), name);
        }
        assertEquals("speaking length, in", NoteColumn.LENGTH.chooserName(table.header(NoteColumn.LENGTH).get()));
        assertEquals("stress, ksi", NoteColumn.STRESS.chooserName(table.header(NoteColumn.STRESS).get()));
        assertEquals("inharmonicity B", NoteColumn.INHARMONICITY.chooserName(table.header(NoteColumn.INHARMONICITY).get()));
        assertEquals(NoteColumn.values().length, Arrays.stream(NoteColumn.values())
                .map(c -> c.chooserName(table.header(c).get())).distinct().count(), "no two columns share a name");
    }

    @Test
    void aRefusedEntryLeavesTheRowAndSaysWhy() {
        NoteRow row = table.rows().get(4);
        String shown = NoteColumn.WIRE.text(row, session.units());
        var before = row.stateProperty().get();
        assertFalse(table.edit(5, NoteColumn.WIRE, "9x"));
        assertEquals(shown, NoteColumn.WIRE.text(row, session.units()), "the cell's value is the one in use");
        assertEquals(before, row.stateProperty().get());
        assertTrue(session.messageIsProblemProperty().get());
        assertTrue(session.messageProperty().get().contains("'9x'"), session.messageProperty().get());
        assertFalse(session.isDirty());
    }
}
