package org.scalewright.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.model.DisplayUnits;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.Scale;
import org.scalewright.physics.FlagKind;
import org.scalewright.physics.NoteResult;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.ScriptedPrompts;
import org.scalewright.app.session.TestSheets;
import org.scalewright.app.session.UserPrompts;
import org.scalewright.app.table.NoteColumn;
import org.scalewright.app.table.NoteRow;

/** The window's behaviour through its view models, without a display. */
class WorkstationViewModelTest {
    @TempDir
    Path dir;
    private ScriptedPrompts prompts;
    private WorkstationViewModel vm;
    private ScaleSession session;
    private Path sheet;

    @BeforeEach
    void openSmallSheet() throws Exception {
        prompts = new ScriptedPrompts();
        session = new ScaleSession();
        vm = new WorkstationViewModel(session, prompts);
        sheet = TestSheets.small(dir);
        assertTrue(vm.openSheet(sheet, true));
    }

    private NoteRow row(int key) {
        return vm.table().rows().get(vm.table().indexOf(key));
    }

    @Test
    void openingFillsTheTableAndTheAnalysis() {
        assertEquals(10, vm.table().rows().size());
        assertEquals(10, session.analysis().notes().size());
        assertFalse(session.isDirty());
        assertEquals("20", NoteColumn.WIRE.text(row(5), session.units()));
        assertEquals("1400.0", NoteColumn.LENGTH.text(row(1), session.units()));
    }

    @Test
    void editingAWireSizeRecomputesTheRowAndUndoRestoresIt() {
        NoteResult before = row(6).result();
        assertTrue(vm.table().edit(6, NoteColumn.WIRE, "18"));
        NoteResult after = row(6).result();
        assertTrue(after.coreDiameter() < before.coreDiameter());
        assertTrue(after.tension() < before.tension(), "thinner wire at the same length and pitch pulls less");
        assertTrue(session.isDirty());
        assertTrue(session.canUndoProperty().get());
        session.undo();
        assertEquals(before, row(6).result());
        assertFalse(session.isDirty());
        session.redo();
        assertEquals(after, row(6).result());
    }

    @Test
    void anEntryEqualToTheCellChangesNothing() {
        assertFalse(vm.table().edit(6, NoteColumn.WIRE, "20"));
        assertFalse(vm.table().edit(1, NoteColumn.LENGTH, " 1400.0 "));
        assertFalse(session.canUndoProperty().get());
    }

    @Test
    void aBadEntryChangesNothingAndSaysWhy() {
        Scale before = session.scale();
        assertFalse(vm.table().edit(6, NoteColumn.WIRE, "abc"));
        assertSame(before, session.scale());
        assertTrue(session.messageIsProblemProperty().get());
        assertEquals("key 6 (D1), wire: expected a size number (12 to 23) or a diameter in mm, was 'abc'",
                session.messageProperty().get());
        assertFalse(vm.table().edit(6, NoteColumn.TENSION, "600"));
        assertSame(before, session.scale());
    }

    @Test
    void unitsChangeWhatIsShownAndHowEntriesAreRead() {
        vm.setUnits(WorkstationViewModel.UnitChoice.IMPERIAL);
        DisplayUnits u = session.units();
        // 1400 mm / 25.4 mm per in = 55.118 in (NIST SP 811, B.8: 1 in = 25.4 mm exactly), shown
        // to 0.01 in like every length of the column
        assertEquals("55.12", NoteColumn.LENGTH.text(row(1), u));
        assertEquals("length in", vm.table().header(NoteColumn.LENGTH).get().replace('\n', ' '));
        assertEquals("T/string lbf", NoteColumn.TENSION.header(u));
        assertTrue(vm.table().edit(1, NoteColumn.LENGTH, "55"));
        assertEquals(55 * 0.0254, session.scale().note(1).orElseThrow().speakingLength(), 1e-12);
        vm.setUnits(WorkstationViewModel.UnitChoice.METRIC_KGF);
        assertTrue(vm.status().totalsProperty().get().contains("kgf"), vm.status().totalsProperty().get());
    }

    @Test
    void theReferenceIsTheSheetAsOpenedUntilChanged() throws Exception {
        vm.table().edit(7, NoteColumn.WIRE, "18");
        NoteRow r = row(7);
        assertEquals(ScaleSheetReader.standard().read(sheet).note(7).orElseThrow().wire(),
                session.referenceProperty().get().note(7).orElseThrow().wire());
        assertTrue(NoteColumn.DIFF_TENSION.text(r, session.units()).startsWith("-"));
        assertEquals("+0", NoteColumn.DIFF_TENSION.text(row(6), session.units()));
        assertTrue(vm.curves().data().reference().isPresent());

        session.useCurrentAsReference();
        assertEquals("+0", NoteColumn.DIFF_TENSION.text(row(7), session.units()));

        Path other = TestSheets.write(dir, "other.csv", TestSheets.SMALL.replace("9,tenor,3,950,19", "9,tenor,3,990,19"));
        prompts.files.add(other);
        vm.openReference();
        assertEquals("from other.csv", session.referenceNameProperty().get());
        assertTrue(NoteColumn.DIFF_BREAK.text(row(9), session.units()).startsWith("-"), "shorter than the reference");

        session.showReferenceProperty().set(false);
        assertTrue(vm.curves().data().reference().isEmpty());
    }

    @Test
    void flagsAreListedAndJumpToTheirNote() {
        assertEquals(session.analysis().flags().size(), vm.flags().items().size());
        assertTrue(vm.flags().items().size() > 0, "the wound-to-plain step of the small sheet is flagged");
        var item = vm.flags().items().get(0);
        vm.flags().jumpTo(item);
        assertEquals(item.key(), session.selectedKeyProperty().get());
        assertEquals(item.key(), vm.curves().data().selectedKey().getAsInt());
        String status = vm.status().totalsProperty().get();
        assertTrue(status.contains(session.analysis().flags().size() + " flags"), status);
        assertTrue(status.contains(" kN"), status);
        assertTrue(vm.status().sectionsProperty().get().contains("bass 1–4"), vm.status().sectionsProperty().get());
    }

    @Test
    void clickingNearAPointPicksTheNearestNote() {
        vm.curves().pick(7.4);
        assertEquals(7, session.selectedKeyProperty().get());
        vm.curves().pick(30);
        assertEquals(7, session.selectedKeyProperty().get(), "far from every note: selection kept");
    }

    @Test
    void a4IsAnUndoableEditOfTheScale() {
        double before = row(5).result().frequency();
        assertTrue(vm.setA4("442"));
        assertEquals(442, session.scale().pitch().a4());
        assertTrue(row(5).result().frequency() > before);
        assertFalse(vm.setA4("44"));
        assertTrue(session.messageProperty().get().contains("pitch standard A4 must be 300 to 600 Hz, was 44"),
                session.messageProperty().get());
        session.undo();
        assertEquals(440, session.scale().pitch().a4());
    }

    @Test
    void theStrengthTableCanBeChosen() throws Exception {
        double min = row(8).result().breakPct();
        vm.useBuiltInMaximum();
        assertTrue(row(8).result().breakPct() < min, "the maximum table is stronger");
        Path maker = TestSheets.write(dir, "maker.csv", """
                # invented test table, not real data
                diameter_mm,tensile_mpa
                0.5,2000
                2.0,1500
                """);
        prompts.files.add(maker);
        assertTrue(vm.useMakersTable());
        assertEquals("maker: maker.csv", session.strengthProperty().get().label());
        Path broken = TestSheets.write(dir, "broken.csv", "diameter_mm,tensile_mpa\n0.5,strong\n");
        prompts.files.add(broken);
        assertFalse(vm.useMakersTable());
        assertEquals("maker: maker.csv", session.strengthProperty().get().label());
        assertTrue(prompts.problems.get(0).contains("line 2"), prompts.problems.toString());
    }

    @Test
    void aSheetThatFailsToLoadShowsItsLinesAndOpensNothing() throws Exception {
        vm.table().edit(6, NoteColumn.WIRE, "18");
        Scale before = session.scale();
        Path bad = TestSheets.write(dir, "bad.csv", "key,strings,length_mm,wire\n1,2,1400,20\n2,4,1300,20\n3,2,-5,20\n");
        prompts.saveAnswers.add(UserPrompts.SaveChoice.DISCARD);
        prompts.files.add(bad);
        vm.open();
        assertEquals(1, prompts.saveQuestions);
        assertSame(before, session.scale(), "nothing opened half-way");
        assertTrue(prompts.problems.stream().anyMatch(p -> p.contains("line 3")), prompts.problems.toString());
        assertTrue(prompts.problems.stream().anyMatch(p -> p.contains("line 4")), prompts.problems.toString());
    }

    @Test
    void unsavedChangesAreAskedAboutBeforeOpeningAndClosing() throws Exception {
        vm.table().edit(6, NoteColumn.WIRE, "18");
        prompts.saveAnswers.add(UserPrompts.SaveChoice.CANCEL);
        prompts.files.add(sheet);
        vm.open();
        assertEquals("18", NoteColumn.WIRE.text(row(6), session.units()), "cancel keeps the edit");
        assertFalse(vm.mayClose(), "cancel keeps the window open");
        prompts.files.clear();
        prompts.saveAnswers.add(UserPrompts.SaveChoice.SAVE);
        assertTrue(vm.mayClose());
        assertFalse(session.isDirty());
        assertEquals(ScaleSheetReader.standard().read(sheet), session.scale());
    }

    @Test
    void saveKeepsABackupAndSaveAsGivesTheSameScaleBack() throws Exception {
        String original = Files.readString(sheet);
        vm.table().edit(6, NoteColumn.WIRE, "18");
        vm.table().edit(2, NoteColumn.WRAP2, "");
        assertTrue(vm.save());
        assertEquals(original, Files.readString(dir.resolve("small.csv.bak")));
        Scale saved = session.scale();
        assertEquals(saved, ScaleSheetReader.standard().read(sheet));

        prompts.files.add(dir.resolve("copy"));
        assertTrue(vm.saveAs());
        Path copy = dir.resolve("copy.csv");
        assertEquals(copy, session.file().orElseThrow());
        assertTrue(vm.openSheet(copy, true));
        assertEquals(saved, session.scale());
        assertTrue(Files.readString(copy).contains("wire"), "the sheet keeps its size-number column");
    }

    @Test
    void aFailedSaveLeavesTheFileAndSaysWhy() throws Exception {
        vm.table().edit(6, NoteColumn.WIRE, "18");
        prompts.files.add(dir.resolve("no-such-folder").resolve("x.csv"));
        assertFalse(vm.saveAs());
        assertTrue(session.isDirty());
        assertEquals(sheet, session.file().orElseThrow());
        assertTrue(prompts.shown.get(0).startsWith("Sheet not saved"), prompts.shown.toString());
        assertTrue(prompts.shown.get(0).contains("unchanged"));
    }

    @Test
    void theDemoIsNeverSavedOverWithoutAsking() throws Exception {
        Path demoCopy = TestSheets.write(dir, "demo.csv", TestSheets.SMALL);
        vm.openSheet(demoCopy, false);
        vm.table().edit(6, NoteColumn.WIRE, "18");
        assertFalse(vm.save(), "no file chosen: not saved");
        assertEquals(TestSheets.SMALL, Files.readString(demoCopy));
    }

    @Test
    void cautionsAreReachable() {
        vm.showCautions();
        assertEquals("cautions", prompts.shown.get(0));
        assertTrue(prompts.shown.stream().anyMatch(s -> s.toLowerCase().contains("eye protection")));
    }

    @Test
    void anEditChangesOnlyTheStatesOfTheRowsItAffects() {
        NoteRow two = row(2);
        NoteRow.State twoBefore = two.state();
        NoteRow nine = row(9);
        NoteRow.State nineBefore = nine.state();
        vm.table().edit(9, NoteColumn.LENGTH, "900");
        assertSame(two, row(2));
        assertSame(twoBefore, two.state());
        assertSame(nine, row(9), "the row object stays, so the table keeps its selection");
        assertNotEquals(nineBefore, nine.state());
        assertEquals(0.9, nine.note().speakingLength(), 1e-12);
    }

    @Test
    void a4FieldRefusesWithThePitchStandardsMessageAndTakesADecimalComma() {
        assertFalse(vm.setA4("1200"));
        // the same message as `analyze --a4 1200` on the command line (AnalyzeCommandTest)
        assertEquals("pitch standard A4 must be 300 to 600 Hz, was 1200", session.messageProperty().get());
        assertEquals(440, session.scale().pitch().a4());
        assertTrue(vm.setA4("442,5 Hz"));
        assertEquals(442.5, session.scale().pitch().a4());
        assertFalse(vm.setA4("0x1p9"));
        assertEquals("A4: expected a number in Hz, was '0x1p9'", session.messageProperty().get());
        assertEquals(442.5, session.scale().pitch().a4());
    }

    @Test
    void theFlagsListTakesEachFlagsSeverityFromItsKind() throws Exception {
        // a 5 mm plain wire: implausible, and shown as danger (physics.FlagKind)
        Path thick = Files.writeString(dir.resolve("thick.csv"), "key,strings,length_mm,wire_mm\n40,3,620,5\n");
        assertTrue(vm.openSheet(thick, true));
        var items = vm.flags().items();
        assertTrue(items.stream().anyMatch(it -> it.kind().equals(FlagKind.IMPLAUSIBLE.word())
                && it.severity() == FlagKind.Severity.DANGER), items.toString());
        for (var it : items) {
            FlagKind kind = java.util.Arrays.stream(FlagKind.values()).filter(k -> k.word().equals(it.kind()))
                    .findFirst().orElseThrow();
            assertEquals(kind.severity(), it.severity(), it.toString());
        }
    }
}
