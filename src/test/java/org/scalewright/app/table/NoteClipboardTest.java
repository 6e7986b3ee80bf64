package org.scalewright.app.table;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.TestSheets;
import org.scalewright.model.Scale;

/** Copying and pasting blocks of the note table, without a display. */
class NoteClipboardTest {
    private ScaleSession session;
    private NoteTableViewModel table;

    @BeforeEach
    void open() throws Exception {
        session = new ScaleSession();
        session.open(TestSheets.demoGrand(), false);
        table = new NoteTableViewModel(session);
    }

    private int row(int key) {
        return table.indexOf(key);
    }

    @Test
    void aBlockIsCopiedAsTabSeparatedTextWithTheLocalesDecimalMark() {
        String point = table.clipboard().copy(List.of(row(40), row(41)), List.of(NoteColumn.KEY, NoteColumn.LENGTH),
                false, '.');
        String[] lines = point.split("\n");
        assertEquals(2, lines.length);
        assertEquals("40\t" + table.text(table.rows().get(row(40)), NoteColumn.LENGTH), lines[0]);
        String comma = table.clipboard().copy(List.of(row(40)), List.of(NoteColumn.STRESS), true, ',');
        String[] c = comma.split("\n");
        assertEquals("stress MPa", c[0], "headings with their unit when whole columns are copied");
        assertEquals(table.text(table.rows().get(row(40)), NoteColumn.STRESS).replace('.', ','), c[1]);
    }

    @Test
    void aCopiedBlockPastesBackUnchanged() {
        String text = table.clipboard().copy(List.of(row(30), row(31)), List.of(NoteColumn.LENGTH, NoteColumn.WIRE),
                false, ',');
        Scale before = session.scale();
        assertFalse(table.clipboard().paste(row(30), List.of(NoteColumn.LENGTH, NoteColumn.WIRE), text));
        assertEquals(before, session.scale());
    }

    @Test
    void aBadCellIsToldWithRowAndColumnAndNothingChanges() {
        Scale before = session.scale();
        List<NoteColumn> cols = List.of(NoteColumn.LENGTH, NoteColumn.WIRE);
        assertFalse(table.clipboard().paste(row(40), cols, "1234,5\t16\n-3\t16\n"));
        assertEquals(before, session.scale());
        assertTrue(session.messageProperty().get().startsWith("nothing pasted: row 2, column 1 of the block (key 41"),
                session.messageProperty().get());
    }

    @Test
    void aNumberWhoseReadingDependsOnTheLocaleIsRefused() {
        Scale before = session.scale();
        // 1.234 could be 1234 mm with a German thousands separator or 1.234 mm
        assertFalse(table.clipboard().paste(row(40), List.of(NoteColumn.LENGTH), "1.234\n"));
        assertEquals(before, session.scale());
        assertTrue(session.messageProperty().get().contains("thousands separator"), session.messageProperty().get());
    }

    @Test
    void computedColumnsAndBlocksPastTheTableAreRefused() {
        Scale before = session.scale();
        assertFalse(table.clipboard().paste(row(40), List.of(NoteColumn.TENSION), "700\n"));
        assertTrue(session.messageProperty().get().contains("computed"), session.messageProperty().get());
        assertFalse(table.clipboard().paste(row(88), List.of(NoteColumn.LENGTH), "50\n51\n"));
        assertTrue(session.messageProperty().get().contains("reaches past the table"), session.messageProperty().get());
        assertEquals(before, session.scale());
    }

    @Test
    void sectionsAndRemarksAreTakenAsTheyAre() {
        assertTrue(table.clipboard().paste(row(40), List.of(NoteColumn.SECTION), "1,5 treble\n"));
        assertEquals("1,5 treble", session.scale().note(40).orElseThrow().section());
    }
}
