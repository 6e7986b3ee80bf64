package org.scalewright.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.prefs.BackingStoreException;
import java.util.prefs.Preferences;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.app.session.DeskSettings;
import org.scalewright.app.session.RecentFiles;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.ScriptedPrompts;
import org.scalewright.app.session.SettingsStore;
import org.scalewright.app.session.StrengthChoice;
import org.scalewright.app.session.TestSheets;
import org.scalewright.app.session.UserPrompts;
import org.scalewright.app.table.NoteColumn;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.io.SheetTemplate;
import org.scalewright.model.DisplayUnits;

/**
 * The desktop habits through the view model, without a display: settings kept in a throwaway
 * Java preferences node and found again by a new view model on the same node (a restart),
 * recent files, close, revert, new from a template, dropped files.
 */
class DeskHabitsTest {
    @TempDir
    Path dir;
    private Preferences node;
    private ScriptedPrompts prompts;

    @BeforeEach
    void throwawayNode() {
        node = Preferences.userRoot().node("org/scalewright/test/habits-" + System.nanoTime());
        prompts = new ScriptedPrompts();
    }

    @AfterEach
    void removeNode() throws BackingStoreException {
        node.removeNode();
        node.flush();
    }

    /** A new session and view model on the same preferences node: the program started again. */
    private WorkstationViewModel start() {
        return new WorkstationViewModel(new ScaleSession(), prompts, new DeskSettings(SettingsStore.of(node)));
    }

    @Test
    void unitsStrengthAndA4SurviveARestart() throws Exception {
        WorkstationViewModel first = start();
        assertTrue(first.openSheet(TestSheets.small(dir), true));
        first.setUnits(WorkstationViewModel.UnitChoice.IMPERIAL);
        first.useBuiltInMaximum();
        assertTrue(first.setA4("442"));

        WorkstationViewModel again = start();
        assertEquals(DisplayUnits.IMPERIAL, again.session().units());
        assertEquals(StrengthChoice.maximum().table(), again.session().strengthProperty().get().table());
        assertEquals(442.0, new DeskSettings(SettingsStore.of(node)).a4().getAsDouble());
        // the next start opens its sheet in the units kept: the table shows inches
        assertTrue(again.openSheet(TestSheets.small(dir), true));
        assertEquals("55.12", NoteColumn.LENGTH.text(again.table().rows().get(0), again.session().units()),
                "1400 mm = 55.118 in (1 in = 25.4 mm exactly, NIST SP 811)");
    }

    @Test
    void columnsShownFromTheColumnMenuAreShownAgainAfterARestart() {
        WorkstationViewModel first = start();
        assertFalse(first.table().shownProperty(NoteColumn.BACK).get(), "hidden until chosen");
        first.table().shownProperty(NoteColumn.BACK).set(true);
        first.table().shownProperty(NoteColumn.BARE_FRONT).set(true);
        first.table().shownProperty(NoteColumn.BARE_FRONT).set(false);

        WorkstationViewModel again = start();
        assertTrue(again.table().shownProperty(NoteColumn.BACK).get());
        assertFalse(again.table().shownProperty(NoteColumn.BARE_FRONT).get());
        assertFalse(again.table().shownProperty(NoteColumn.REMARK).get());
        again.table().shownProperty(NoteColumn.BACK).set(false);
        assertFalse(start().table().shownProperty(NoteColumn.BACK).get());
    }

    @Test
    void aMakersTableIsReadAgainAtTheNextStartAndAMissingOneFallsBackToTheMinimum() throws Exception {
        Path table = TestSheets.write(dir, "maker.csv", Files.readString(Path.of("scales", "wire-makers")
                .resolve(firstMakerTable())));
        prompts.files.add(table);
        WorkstationViewModel first = start();
        assertTrue(first.useMakersTable());
        assertEquals(table, start().session().strengthProperty().get().file().orElseThrow());

        Files.delete(table);
        WorkstationViewModel later = start();
        assertEquals(StrengthChoice.minimum().table(), later.session().strengthProperty().get().table());
        assertTrue(later.session().messageIsProblemProperty().get());
        assertTrue(later.session().messageProperty().get().contains("maker.csv"), later.session().messageProperty().get());
    }

    private static String firstMakerTable() throws Exception {
        try (var files = Files.list(Path.of("scales", "wire-makers"))) {
            return files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".csv")).sorted()
                    .findFirst().orElseThrow();
        }
    }

    @Test
    void sheetsOpenedAndSavedAreListedNewestFirstAcrossARestart() throws Exception {
        Path a = TestSheets.write(dir, "a.csv", TestSheets.SMALL);
        Path b = TestSheets.write(dir, "b.csv", TestSheets.SMALL);
        WorkstationViewModel first = start();
        assertTrue(first.openSheet(a, true));
        assertTrue(first.openSheet(b, true));
        Path c = dir.resolve("c.csv");
        prompts.files.add(c);
        assertTrue(first.saveAs());
        assertEquals(List.of(c, b, a), first.recentFiles());
        // opened again, a file moves to the top instead of being listed twice
        assertTrue(first.openSheet(a, true));
        assertEquals(List.of(a, c, b), first.recentFiles());

        assertEquals(List.of(a, c, b), start().recentFiles());
    }

    @Test
    void theDemoIsNotListedAndTheListKeepsTheNewestTen() throws Exception {
        WorkstationViewModel vm = start();
        assertTrue(vm.openSheet(TestSheets.demoGrand(), false));
        assertTrue(vm.recentFiles().isEmpty(), "the demo is opened read-only, not as a recent file");
        for (int i = 0; i < RecentFiles.MOST + 3; i++) {
            assertTrue(vm.openSheet(TestSheets.write(dir, "s" + i + ".csv", TestSheets.SMALL), true));
        }
        assertEquals(RecentFiles.MOST, vm.recentFiles().size());
        assertEquals(dir.resolve("s" + (RecentFiles.MOST + 2) + ".csv"), vm.recentFiles().get(0));
        assertFalse(vm.recentFiles().contains(dir.resolve("s0.csv")));
    }

    @Test
    void aRecentFileThatIsGoneIsSaidSoAndTakenOffTheList() throws Exception {
        Path gone = TestSheets.small(dir);
        WorkstationViewModel vm = start();
        assertTrue(vm.openSheet(gone, true));
        vm.close();
        Files.delete(gone);
        assertFalse(vm.openRecent(gone));
        assertTrue(prompts.shown.get(0).startsWith("Sheet not found"), prompts.shown.toString());
        assertTrue(vm.recentFiles().isEmpty());
        assertTrue(start().recentFiles().isEmpty(), "the missing file is forgotten for the next start too");
    }

    @Test
    void openRecentAsksAboutUnsavedChangesFirst() throws Exception {
        Path a = TestSheets.write(dir, "a.csv", TestSheets.SMALL);
        Path b = TestSheets.write(dir, "b.csv", TestSheets.SMALL);
        WorkstationViewModel vm = start();
        assertTrue(vm.openSheet(a, true));
        assertTrue(vm.openSheet(b, true));
        assertTrue(vm.table().edit(5, NoteColumn.WIRE, "21"));
        prompts.saveAnswers.add(UserPrompts.SaveChoice.CANCEL);
        assertFalse(vm.openRecent(a));
        assertEquals("b.csv", vm.session().documentNameProperty().get());
        prompts.saveAnswers.add(UserPrompts.SaveChoice.DISCARD);
        assertTrue(vm.openRecent(a));
        assertEquals("a.csv", vm.session().documentNameProperty().get());
        assertEquals(2, prompts.saveQuestions);
    }

    @Test
    void closeLeavesAnEmptyUntitledWindowAfterTheUnsavedQuestion() throws Exception {
        WorkstationViewModel vm = start();
        assertTrue(vm.openSheet(TestSheets.small(dir), true));
        assertTrue(vm.table().edit(5, NoteColumn.WIRE, "21"));
        prompts.saveAnswers.add(UserPrompts.SaveChoice.CANCEL);
        assertFalse(vm.close());
        assertEquals(10, vm.table().rows().size());
        prompts.saveAnswers.add(UserPrompts.SaveChoice.DISCARD);
        assertTrue(vm.close());
        assertTrue(vm.table().rows().isEmpty());
        assertEquals("untitled", vm.session().documentNameProperty().get());
        assertFalse(vm.session().isDirty());
        assertTrue(vm.session().file().isEmpty());
        assertFalse(vm.session().canUndoProperty().get());
    }

    @Test
    void revertAsksThenReadsTheSavedSheetAgain() throws Exception {
        Path sheet = TestSheets.small(dir);
        WorkstationViewModel vm = start();
        assertTrue(vm.openSheet(sheet, true));
        assertFalse(vm.revert(), "nothing to revert without changes");
        assertTrue(prompts.questions.isEmpty());
        assertTrue(vm.table().edit(5, NoteColumn.WIRE, "21"));
        prompts.confirmAnswers.add(false);
        assertFalse(vm.revert());
        assertEquals("21", NoteColumn.WIRE.text(vm.table().rows().get(4), vm.session().units()));
        prompts.confirmAnswers.add(true);
        assertTrue(vm.revert());
        assertEquals("20", NoteColumn.WIRE.text(vm.table().rows().get(4), vm.session().units()));
        assertFalse(vm.session().isDirty());
        assertEquals(2, prompts.questions.size());
        assertEquals(sheet, vm.session().file().orElseThrow(), "still saved back to the same file");
    }

    @Test
    void newFromATemplateWritesTheBlankSheetWithTheA4KeptAndClosesTheOpenOne() throws Exception {
        WorkstationViewModel vm = start();
        assertTrue(vm.openSheet(TestSheets.small(dir), true));
        assertTrue(vm.setA4("442"));
        prompts.saveAnswers.add(UserPrompts.SaveChoice.DISCARD);
        Path target = dir.resolve("new-grand");
        prompts.files.add(target);
        Path written = vm.newSheet(SheetTemplate.GRAND_88).orElseThrow();
        assertEquals(dir.resolve("new-grand.csv"), written);
        String text = Files.readString(written);
        assertTrue(text.contains("# a4_hz: 442\n"), text.lines().limit(3).toList().toString());
        assertEquals(88 + 1, text.lines().filter(l -> !l.startsWith("#")).count(), "a header and 88 key rows");
        assertTrue(vm.table().rows().isEmpty());
        assertEquals(written, vm.recentFiles().get(0));
        assertTrue(prompts.shown.get(prompts.shown.size() - 1).contains("fill in"), prompts.shown.toString());
        // blank, it cannot be opened until measured: the reader says so row by row
        assertFalse(vm.openRecent(written));
        assertEquals("Sheet not opened", prompts.shown.get(prompts.shown.size() - 1));
    }

    @Test
    void theBundledTemplatesAreTheProjectsTemplates() throws Exception {
        for (SheetTemplate t : SheetTemplate.values()) {
            assertEquals(Files.readString(Path.of("scales", t.resourceName())), t.text(),
                    t.resourceName() + " in src/main/resources/org/scalewright/templates must be a copy of scales/");
        }
    }

    @Test
    void aDroppedSheetOpensAfterTheUnsavedQuestionAndOtherFilesAreRefused() throws Exception {
        Path a = TestSheets.write(dir, "a.csv", TestSheets.SMALL);
        Path b = TestSheets.write(dir, "b.CSV", TestSheets.SMALL);
        Path text = TestSheets.write(dir, "notes.txt", "not a sheet");
        WorkstationViewModel vm = start();
        assertTrue(vm.openSheet(a, true));
        assertFalse(vm.openDropped(List.of(text)));
        assertTrue(vm.session().messageProperty().get().contains("notes.txt"));
        assertTrue(vm.table().edit(5, NoteColumn.WIRE, "21"));
        prompts.saveAnswers.add(UserPrompts.SaveChoice.CANCEL);
        assertFalse(vm.openDropped(List.of(text, b)));
        assertEquals("a.csv", vm.session().documentNameProperty().get());
        prompts.saveAnswers.add(UserPrompts.SaveChoice.DISCARD);
        assertTrue(vm.openDropped(List.of(text, b)));
        assertEquals("b.CSV", vm.session().documentNameProperty().get());
        assertEquals(new ScaleSheetReader(org.scalewright.io.BuiltInData.musicWireSizes()).read(b).notes().size(),
                vm.table().rows().size());
    }

    @Test
    void aboutNamesTheVersionTheLogAndTheSettings() {
        start().showAbout();
        String about = prompts.shown.get(0);
        assertTrue(about.startsWith("About Scalewright: Scalewright "), about);
        assertTrue(about.contains("Log folder: " + org.scalewright.io.LogFiles.userLogFolder()), about);
        assertTrue(about.contains("node /org/scalewright/app"), about);
        assertTrue(about.contains("Safety cautions"), about);
    }

    @Test
    void settingsThatCannotBeReadBackCountAsNotKept() {
        node.put("units", "FURLONG,N");
        node.put("window-size", "wide,tall");
        node.put("dividers.left", "1.7");
        DeskSettings s = new DeskSettings(SettingsStore.of(node));
        assertTrue(s.units().isEmpty());
        assertTrue(s.windowSize().isEmpty());
        assertTrue(s.dividers("left").isEmpty());
        s.windowSize(1366.4, 700);
        s.dividers("left", new double[] {0.4216});
        DeskSettings again = new DeskSettings(SettingsStore.of(node));
        assertEquals(List.of(1366.0, 700.0), List.of(again.windowSize().get()[0], again.windowSize().get()[1]));
        assertEquals(0.422, again.dividers("left").get()[0]);
    }
}
