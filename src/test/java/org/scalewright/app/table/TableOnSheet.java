package org.scalewright.app.table;

import java.nio.file.Files;
import java.nio.file.Path;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.model.Note;

/** A note table over a sheet a test writes: the session, the table's view model, a row, a cell, a note. */
final class TableOnSheet {
    final ScaleSession session = new ScaleSession();
    final NoteTableViewModel table;

    /** Writes {@code sheet} as {@code bass.csv} into {@code dir} and opens it. */
    TableOnSheet(Path dir, String sheet) throws Exception {
        session.open(Files.writeString(dir.resolve("bass.csv"), sheet), true);
        table = new NoteTableViewModel(session);
    }

    NoteRow row(int key) {
        return table.rows().get(table.indexOf(key));
    }

    /** @return the text of a cell in the display units */
    String text(int key, NoteColumn c) {
        return c.text(row(key), session.units());
    }

    Note note(int key) {
        return session.scale().note(key).orElseThrow();
    }
}
