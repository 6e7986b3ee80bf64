package org.scalewright.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Optional;
import java.util.prefs.Preferences;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
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
