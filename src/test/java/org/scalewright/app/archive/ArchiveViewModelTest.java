package org.scalewright.app.archive;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.app.WorkstationViewModel;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.ScriptedPrompts;
import org.scalewright.app.session.TestSheets;
import org.scalewright.archive.Archive;

/** The instruments panel through its view model, on a real archive file, without a display. */
class ArchiveViewModelTest {
    @TempDir
    Path dir;
    private final ScriptedPrompts prompts = new ScriptedPrompts();
    private final List<Path> remembered = new ArrayList<>();
    private WorkstationViewModel window;
    private ArchiveViewModel archive;
    private int settled;

    @BeforeEach
    void openTheDemoGrand() {
        window = new WorkstationViewModel(new ScaleSession(), prompts);
        assertTrue(window.openSheet(TestSheets.demoGrand(), false));
        archive = new ArchiveViewModel(window.session(), prompts, dir.resolve("a.db"), () -> {
            settled++;
            return true;
        }, remembered::add);
    }

    @Test
    void saveTheWorkingScaleOpenItAgainAndUseAVersionAsReference() {
        assertTrue(archive.refresh(), archive.problemProperty().get());
        assertTrue(Files.exists(dir.resolve("a.db")), "the archive is created on first use");
        archive.newInstrumentProperty().set("grand-190");
        assertTrue(archive.addInstrument(), archive.problemProperty().get());
        assertEquals("grand-190", archive.instrumentProperty().get());
        archive.labelProperty().set("as-measured");
        assertTrue(archive.saveWorkingScale(), archive.problemProperty().get());
        assertEquals(1, archive.versions().size());
        assertEquals("as measured", archive.versions().get(0).label());

        assertTrue(archive.openVersion(1), archive.problemProperty().get());
        assertEquals(1, settled, "unsaved changes are settled before a version replaces the working scale");
        assertEquals("grand-190, version 1 (as measured)", window.session().documentNameProperty().get());
        archive.labelProperty().set("planned");
        assertTrue(archive.saveWorkingScale());
        assertEquals("1", archive.versions().get(1).from(), "derived from the version it was opened from");
        assertTrue(archive.useAsReference(1));
        assertEquals("grand-190, version 1 (as measured)", window.session().referenceNameProperty().get());
    }

    @Test
    void aBreakNeedsASelectedKeyAndSaneEntries() throws Exception {
        archive.refresh();
        archive.newInstrumentProperty().set("grand-190");
        archive.addInstrument();
        archive.labelProperty().set("as measured");
        archive.saveWorkingScale();
        byte[] before = Files.readAllBytes(dir.resolve("a.db"));
        assertFalse(archive.logBreakOnSelectedKey());
        assertTrue(archive.problemProperty().get().contains("select the key"), archive.problemProperty().get());
        window.session().selectedKeyProperty().set(66);
        archive.pitchProperty().set("0");
        assertFalse(archive.logBreakOnSelectedKey());
        assertTrue(archive.problemProperty().get().contains("pitch at break must be more than 0"));
        archive.pitchProperty().set("1178");
        archive.dateProperty().set("2026-31-12");
        assertFalse(archive.logBreakOnSelectedKey());
        assertTrue(archive.problemProperty().get().contains("YYYY-MM-DD"));
        assertEquals(List.of(), archive.breaks());
        assertTrue(java.util.Arrays.equals(before, Files.readAllBytes(dir.resolve("a.db"))), "nothing written");
        archive.dateProperty().set("2026-11-10");
        assertTrue(archive.logBreakOnSelectedKey(), archive.problemProperty().get());
        assertEquals(1, archive.breaks().size());
        assertEquals("66", Integer.toString(archive.breaks().get(0).key()));
        try (Archive a = Archive.open(dir.resolve("a.db"))) {
            assertEquals(1, a.breaks("grand-190").size());
        }
    }

    @Test
    void anotherArchiveFileIsRememberedAndABadOneRefused() throws Exception {
        Path notArchive = dir.resolve("notes.txt");
        Files.writeString(notArchive, "not a database");
        assertFalse(archive.useArchive(notArchive));
        assertTrue(archive.problemProperty().get().contains("not a Scalewright archive"));
        assertEquals(dir.resolve("a.db"), archive.fileProperty().get(), "the archive in use is kept");
        assertEquals(List.of(), remembered);
        assertTrue(archive.useArchive(dir.resolve("other.db")));
        assertEquals(List.of(dir.resolve("other.db")), remembered);
    }
}
