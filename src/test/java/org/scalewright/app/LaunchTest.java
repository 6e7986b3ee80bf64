package org.scalewright.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.prefs.Preferences;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.scalewright.app.session.DemoSheet;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.ScriptedPrompts;
import org.scalewright.app.session.SettingsStore;
import org.scalewright.app.session.TestSheets;

/** What the window opens at start, and the once-only cautions. */
class LaunchTest {
    private static final java.util.function.Predicate<String> NO_COMMANDS = w -> false;
    @TempDir
    Path dir;

    @Test
    void noArgumentsMeanTheDemoAndOpenTakesOneFile() {
        assertEquals(new LaunchRequest(Optional.empty(), ""), LaunchRequest.parse(new String[0]));
        assertEquals(Optional.of(Path.of("a.csv")), LaunchRequest.parse(new String[] {"open", "a.csv"}).sheet());
        assertTrue(LaunchRequest.parse(new String[] {"open"}).problem().contains("open needs a sheet file"));
        LaunchRequest two = LaunchRequest.parse(new String[] {"open", "a.csv", "b.csv"});
        assertEquals(Optional.of(Path.of("a.csv")), two.sheet());
        assertTrue(two.problem().contains("one sheet file"));
    }

    @Test
    @DisplayName("a bare sheet path, as a file manager passes it, opens the window on that sheet")
    void aBarePathOpensTheWindowOnIt() throws Exception {
        Path sheet = Files.copy(TestSheets.demoGrand(), dir.resolve("my grand.csv"));
        String[] args = {sheet.toString()};
        assertTrue(LaunchRequest.wantsWindow(args, NO_COMMANDS));
        assertEquals(new LaunchRequest(Optional.of(sheet), ""), LaunchRequest.parse(args));
        LaunchRequest two = LaunchRequest.parse(new String[] {sheet.toString(), "b.csv"});
        assertEquals(Optional.of(sheet), two.sheet());
        assertEquals("the window opens one sheet file; only " + sheet + " was opened", two.problem());

        ScriptedPrompts prompts = new ScriptedPrompts();
        WorkstationViewModel vm = new WorkstationViewModel(new ScaleSession(), prompts);
        ScalewrightApp.openAtStart(vm, LaunchRequest.parse(args));
        assertTrue(prompts.problems.isEmpty(), prompts.problems.toString());
        assertEquals(Optional.of(sheet), vm.session().file(), "saved back to the sheet opened");
        assertEquals(88, vm.session().scale().notes().size());
    }

    @ParameterizedTest(name = "{0} -> window {1}")
    @DisplayName("which arguments open the window and which go to the command line")
    @CsvSource(delimiter = '|', value = {
        "''|true",                         // no arguments: the demo grand
        "open|true",
        "open SHEET|true",
        "open SHEET --help|false",          // help is printed, the window stays shut
        "open --help|false",
        "open -h|false",
        "open --version|false",
        "SHEET|true",                       // a bare path to an existing file
        "SHEET SHEET|true",
        "missing.csv|false",                // no such file: the command line says what is wrong
        "analyze SHEET|false",
        "--help|false",
        "-V|false",
        "COMMANDFILE|false"})               // a file named like a command: the command wins
    void theArgumentsDecide(String line, boolean window) throws Exception {
        Path sheet = Files.copy(TestSheets.demoGrand(), dir.resolve("grand.csv"));
        Path commandFile = Files.writeString(dir.resolve("report"), "key\n");
        String[] args = line.isEmpty() ? new String[0] : line.replace("COMMANDFILE", commandFile.toString())
                .replace("SHEET", sheet.toString()).split(" ");
        assertEquals(window, LaunchRequest.wantsWindow(args, w -> w.equals(commandFile.toString())
                || List.of("open", "analyze", "report").contains(w)));
    }

    @Test
    @DisplayName("a folder or a path the system cannot have is no sheet: the command line answers")
    void aFolderIsNoSheet() {
        assertFalse(LaunchRequest.wantsWindow(new String[] {dir.toString()}, NO_COMMANDS));
        assertFalse(LaunchRequest.wantsWindow(new String[] {"a\0b.csv"}, NO_COMMANDS));
    }

    @Test
    @DisplayName("sheets the system asks to open before the window is ready wait for it, later ones go straight")
    void openFileEventsWaitForTheWindow() {
        OpenFileEvents events = new OpenFileEvents();
        events.arrived(Path.of("a.csv"));
        events.arrived(Path.of("b.csv"));
        List<Path> opened = new java.util.ArrayList<>();
        List<Runnable> onWindowThread = new java.util.ArrayList<>();
        events.attach(opened::add, onWindowThread::add);
        assertTrue(opened.isEmpty(), "only on the window's thread");
        onWindowThread.forEach(Runnable::run);
        assertEquals(List.of(Path.of("a.csv"), Path.of("b.csv")), opened);
        onWindowThread.clear();
        events.arrived(Path.of("c.csv"));
        onWindowThread.forEach(Runnable::run);
        assertEquals(Path.of("c.csv"), opened.get(2));
        OpenFileEvents.listenOnMacOs(); // harmless here: not macOS, nothing started
    }

    @Test
    void theDemoIsLookedForInTheWorkingFolderFirst() {
        Path first = DemoSheet.candidates().get(0);
        assertEquals(Path.of(System.getProperty("user.dir")).resolve(DemoSheet.RELATIVE), first);
        // the tests run in the project root, where the demo instruments live
        assertEquals(Optional.of(first), DemoSheet.find());
    }

    @Test
    void theStartOpensTheDemoWithoutSavingOverIt() {
        ScriptedPrompts prompts = new ScriptedPrompts();
        WorkstationViewModel vm = new WorkstationViewModel(new ScaleSession(), prompts);
        ScalewrightApp.openAtStart(vm, LaunchRequest.parse(new String[0]));
        assertEquals(88, vm.session().scale().notes().size());
        assertTrue(vm.session().file().isEmpty(), "Save asks for a new file");
        assertTrue(vm.session().documentNameProperty().get().endsWith("(demo)"));
    }

    @Test
    void aBadSheetAtStartLeavesAnEmptyWindowAndShowsItsProblems() throws Exception {
        Path bad = TestSheets.write(dir, "bad.csv", "key,strings,length_mm,wire\n1,5,1400,20\n");
        ScriptedPrompts prompts = new ScriptedPrompts();
        WorkstationViewModel vm = new WorkstationViewModel(new ScaleSession(), prompts);
        ScalewrightApp.openAtStart(vm, LaunchRequest.parse(new String[] {"open", bad.toString()}));
        assertTrue(vm.session().scale().notes().isEmpty());
        assertEquals("bad.csv, line 2, column strings: strings per note must be 1, 2 or 3, was 5",
                prompts.problems.get(0));
    }

    @ParameterizedTest
    @DisplayName("the window survives every bad file of issue 14 at start: empty scale, the problem with its place")
    @CsvSource(delimiter = '|', value = {
        "key,strings,length_mm,wire_mm\\n40,3,600,4.9e-324|bad.csv, line 2, column wire_mm: must be 0.001 mm to "
            + "10000 mm, was 4.9e-324 mm",
        "key,strings,length_mm,wire_mm\\n40,3,600,1.0\\n200,3,50,0.8|bad.csv, line 3, column key: key must be -20 "
            + "to 108 (A0 is 1, C8 is 88), was 200",
        "key,strings,length_mm,wire_mm\\n2147483648,3,50,0.8|bad.csv, line 2, column key: key must be -20 to 108 "
            + "(A0 is 1, C8 is 88), was 2147483648",
        "key,strings,length_mm,wire_mm,pitch_hz,cents\\n40,3,600,1.0,262,5|bad.csv, line 2, column cents: give "
            + "either pitch_hz (the pitch as measured) or cents (an offset from the equal-tempered pitch) on a row, "
            + "not both"})
    void aBadFileAtStartIsToldWithItsPlace(String content, String told) throws Exception {
        Path bad = TestSheets.write(dir, "bad.csv", content.replace("\\n", "\n") + "\n");
        ScriptedPrompts prompts = new ScriptedPrompts();
        WorkstationViewModel vm = new WorkstationViewModel(new ScaleSession(), prompts);
        ScalewrightApp.openAtStart(vm, LaunchRequest.parse(new String[] {"open", bad.toString()}));
        assertTrue(vm.session().scale().notes().isEmpty());
        assertEquals(List.of("Sheet not opened"), prompts.shown);
        assertEquals(List.of(told), prompts.problems);
        assertTrue(vm.session().analysis().notes().isEmpty(), "the empty scale is analysed, the window has a state");
    }

    @Test
    @DisplayName("a note with no positive tension opens, shown and flagged as a danger naming the cause")
    void aNoteWithNoTensionOpensFlagged() throws Exception {
        Path sheet = TestSheets.write(dir, "short.csv", "key,strings,length_mm,wire_mm\n1,1,60,2.5\n2,1,1500,1.2\n");
        ScriptedPrompts prompts = new ScriptedPrompts();
        WorkstationViewModel vm = new WorkstationViewModel(new ScaleSession(), prompts);
        ScalewrightApp.openAtStart(vm, LaunchRequest.parse(new String[] {"open", sheet.toString()}));
        assertTrue(prompts.shown.isEmpty(), prompts.shown.toString());
        assertEquals(2, vm.session().scale().notes().size());
        assertTrue(vm.session().analysis().flags().stream().anyMatch(f -> f.key() == 1 && f.kind().isDanger()
                && f.detail().contains("no positive tension")), vm.session().analysis().flags().toString());
    }

    @Test
    void cautionsAreShownOnceAndRemembered() throws Exception {
        Preferences node = Preferences.userRoot().node("org/scalewright/test/" + System.nanoTime());
        try {
            FirstStartCautions first = new FirstStartCautions(SettingsStore.of(node));
            assertFalse(first.alreadyShown());
            first.markShown();
            assertTrue(new FirstStartCautions(SettingsStore.of(node)).alreadyShown());
            assertTrue(node.getBoolean("cautions-shown", false), "kept as the earlier versions kept it");
        } finally {
            node.removeNode();
        }
    }
}
