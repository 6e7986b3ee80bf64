package org.scalewright.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.ScriptedPrompts;
import org.scalewright.app.session.TestSheets;
import org.scalewright.app.table.NoteColumn;
import org.scalewright.io.Fifos;

/** The window's Save and Save as onto what must not be replaced: a clear message, nothing lost. */
class SaveSafetyTest {
    @TempDir
    Path dir;
    private ScriptedPrompts prompts;
    private WorkstationViewModel vm;
    private ScaleSession session;
    private Path sheet;

    @BeforeEach
    void openAndEdit() throws Exception {
        prompts = new ScriptedPrompts();
        session = new ScaleSession();
        vm = new WorkstationViewModel(session, prompts);
        sheet = TestSheets.small(dir);
        assertTrue(vm.openSheet(sheet, true));
        vm.table().edit(6, NoteColumn.WIRE, "18");
    }

    private void notSaved(String why) {
        assertEquals(1, prompts.shown.size(), prompts.shown.toString());
        String shown = prompts.shown.get(0);
        assertTrue(shown.startsWith("Sheet not saved"), shown);
        assertTrue(shown.contains(why), shown);
        assertTrue(shown.contains("unchanged"), shown);
        assertTrue(session.isDirty(), "the edits are still there to save elsewhere");
        assertEquals(sheet, session.file().orElseThrow());
    }

    private List<String> names() throws Exception {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void saveAsOntoAReadOnlyFileSaysSoAndKeepsIt() throws Exception {
        Path ro = TestSheets.write(dir, "ro.csv", "keep me\n");
        Files.setPosixFilePermissions(ro, PosixFilePermissions.fromString("r--r--r--"));
        prompts.files.add(ro);
        assertFalse(vm.saveAs());
        notSaved("read-only");
        assertEquals("keep me\n", Files.readString(ro));
        assertEquals(List.of("ro.csv", "small.csv"), names());
    }

    @Test
    void saveOntoASheetThatBecameReadOnlySaysSo() throws Exception {
        String before = Files.readString(sheet);
        Files.setPosixFilePermissions(sheet, PosixFilePermissions.fromString("r--r-----"));
        assertFalse(vm.save());
        notSaved("read-only");
        assertEquals(before, Files.readString(sheet));
    }

    @Test
    void saveAsOntoAPipeOrALinkSaysSoAndReplacesNothing() throws Exception {
        Path fifo = Fifos.make(dir.resolve("pipe.csv"));
        prompts.files.add(fifo);
        assertFalse(vm.saveAs());
        notSaved("named pipe");
        assertFalse(Files.isRegularFile(fifo));

        prompts.shown.clear();
        Path link = Files.createSymbolicLink(dir.resolve("link.csv"), sheet.getFileName());
        prompts.files.add(link);
        assertFalse(vm.saveAs());
        notSaved("symbolic link");
        assertTrue(Files.isSymbolicLink(link));
        assertEquals(TestSheets.SMALL, Files.readString(sheet));
        assertEquals(List.of("link.csv", "pipe.csv", "small.csv"), names());
    }

    @Test
    void aSaveKeepsThePreviousFileAsBak() throws Exception {
        assertTrue(vm.save());
        assertEquals(TestSheets.SMALL, Files.readString(dir.resolve("small.csv.bak")));
        assertEquals(List.of("small.csv", "small.csv.bak"), names());
    }
}
