package org.scalewright.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
import org.scalewright.app.session.TestSheets;

/** What the window opens at start, and the once-only cautions. */
class LaunchTest {
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
            FirstStartCautions first = new FirstStartCautions(node);
            assertFalse(first.alreadyShown());
            first.markShown();
            assertTrue(new FirstStartCautions(node).alreadyShown());
        } finally {
            node.removeNode();
        }
    }
}
