package org.scalewright.app.rescale;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.scalewright.design.rescale.ControlPoint;
import org.scalewright.design.rescale.Proposal;
import org.scalewright.design.rescale.ProposalText;
import org.scalewright.design.rescale.StepCheck;
import org.scalewright.design.rescale.TargetCurve;
import org.scalewright.model.Scale;
import org.scalewright.app.WorkstationViewModel;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.ScriptedPrompts;
import org.scalewright.app.session.TestSheets;
import org.scalewright.app.table.NoteColumn;
import org.scalewright.physics.NoteResult;

/** The rescaling panel through its view model, on the invented demo grand, without a display. */
class RescaleViewModelTest {
    private ScaleSession session;
    private WorkstationViewModel window;
    private RescaleViewModel vm;

    @BeforeEach
    void openTheDemoGrand() {
        session = new ScaleSession();
        window = new WorkstationViewModel(session, new ScriptedPrompts());
        assertTrue(window.openSheet(TestSheets.demoGrand(), false));
        vm = new RescaleViewModel(session, window.curves());
    }

    private static StepCheck across(Proposal p) {
        return p.steps().stream().filter(s -> s.kind() == StepCheck.Kind.ACROSS_BOUNDARY).findFirst().orElseThrow();
    }

    @Test
    void theWindowsWoundDesignerWithItsDefaultsLeavesTheBassSmootherThanItFoundIt() {
        // the command line's defaults (wrap-wire catalogue, cores chosen with the wraps): no
        // neighbour step in per-string tension over 8 % inside keys 1-20 (common practice, no source)
        vm.setRange(1, 20);
        assertEquals(RescaleViewModel.Kind.WOUND, vm.kindProperty().get());
        assertTrue(vm.propose(), () -> String.join("\n", vm.problems()));
        List<NoteResult> after = vm.proposal().after().notes().stream().filter(n -> n.key() <= 20).toList();
        for (int i = 1; i < after.size(); i++) {
            double step = 100 * (after.get(i).tension() / after.get(i - 1).tension() - 1);
            assertTrue(Math.abs(step) <= 8, "key " + after.get(i).key() + ": step " + step + " %");
        }
    }

    @Test
    void proposingOnTheWoundKeysReducesTheStepAtTheBreakAndDrawsTheThirdCurve() {
        vm.setRange(1, 28);
        assertEquals(RescaleViewModel.Kind.WOUND, vm.kindProperty().get(), "keys 1-28 are mostly wound");
        assertTrue(vm.propose(), () -> String.join("\n", vm.problems()));
        Proposal p = vm.proposal();
        StepCheck br = across(p);
        assertTrue(Math.abs(br.afterPct()) < Math.abs(br.beforePct()),
                "break step " + br.beforePct() + " % → " + br.afterPct() + " %");
        assertTrue(p.allUnderMax());
        assertSame(p.after(), window.curves().proposalProperty().get());
        assertTrue(window.curves().data().proposal().isPresent());
        assertEquals(p.changes().size(), vm.changes().size());
        assertTrue(vm.summaryProperty().get().contains("Largest neighbour step"), vm.summaryProperty().get());
        assertNotNull(window.curves().targetProperty().get());
        assertTrue(vm.problems().isEmpty());
    }

    @Test
    void applyIsOneUndoableStepThatClearsTheProposal() {
        Scale before = session.scale();
        vm.setRange(1, 28);
        assertTrue(vm.propose());
        Scale proposed = vm.proposal().proposedScale();
        assertTrue(vm.apply());
        assertEquals(proposed, session.scale());
        assertNull(vm.proposal());
        assertNull(window.curves().proposalProperty().get());
        assertTrue(vm.changes().isEmpty());
        assertTrue(session.undoTextProperty().get().startsWith("rescale keys 1-28"), session.undoTextProperty().get());
        session.undo();
        assertEquals(before, session.scale(), "one undo restores the scale as it was");
        assertFalse(session.canUndoProperty().get(), "the whole proposal was one step");
    }

    @Test
    void discardClearsTheProposalAndLeavesTheScale() {
        Scale before = session.scale();
        vm.setRange(1, 28);
        assertTrue(vm.propose());
        vm.discard();
        assertNull(vm.proposal());
        assertNull(window.curves().proposalProperty().get());
        assertTrue(vm.changes().isEmpty());
        assertSame(before, session.scale());
        assertFalse(session.canUndoProperty().get());
    }

    @Test
    void aRangeWithNoFeasiblePlanShowsTheReasonsInstead() {
        vm.setRange(40, 60);
        assertEquals(RescaleViewModel.Kind.PLAIN, vm.kindProperty().get());
        vm.maxBreakProperty().set("5");
        assertFalse(vm.propose());
        assertNull(vm.proposal());
        assertNull(window.curves().proposalProperty().get());
        assertFalse(vm.problems().isEmpty());
        assertTrue(vm.summaryProperty().get().startsWith("No proposal"), vm.summaryProperty().get());
        assertTrue(session.messageIsProblemProperty().get());
    }

    @Test
    void plainWireOnWoundKeysSaysThereIsNoneAndABadFieldIsNamed() {
        vm.setRange(1, 10);
        vm.kindProperty().set(RescaleViewModel.Kind.PLAIN);
        assertFalse(vm.propose());
        assertTrue(vm.problems().get(0).contains("hold no plain wire"), vm.problems().get(0));
        vm.setRange(40, 60);
        vm.bandwidthProperty().set("wide");
        assertFalse(vm.propose());
        assertEquals("bandwidth: expected a number > 0, was 'wide'", vm.problems().get(0));
    }

    @Test
    void aTypedKeyOutsideTheAcceptedKeysIsRefusedAsTyped() {
        vm.fromProperty().set("40");
        vm.toProperty().set("2147483648");
        assertFalse(vm.propose());
        assertEquals("to key: key must be -20 to 108 (A0 is 1, C8 is 88), was 2147483648", vm.problems().get(0));
    }

    @Test
    void editingAControlPointChangesTheTargetAndTheProposal() {
        vm.setRange(40, 60);
        assertTrue(vm.propose());
        vm.seedPoints();
        assertEquals(RescaleViewModel.TargetKind.SPLINE, vm.targetKindProperty().get());
        assertTrue(vm.points().size() >= 2);
        assertTrue(vm.propose());
        TargetCurve before = vm.targetProperty().get();
        Proposal first = vm.proposal();
        int middle = vm.points().size() / 2;
        ControlPoint p = vm.points().get(middle);
        vm.released(middle, p.value() * 1.15);
        assertEquals(p.value() * 1.15, vm.points().get(middle).value(), 1e-9);
        TargetCurve after = vm.targetProperty().get();
        assertTrue(after.at(p.key()) > before.at(p.key()) * 1.1, "the target follows the point");
        assertNotNull(vm.proposal(), () -> String.join("\n", vm.problems()));
        assertNotEquals(first, vm.proposal(), "releasing the point proposes again");
        assertEquals(vm.points(), window.curves().targetProperty().get().points());
    }

    @Test
    void anEditOfTheScaleDropsAStaleProposal() {
        vm.setRange(1, 28);
        assertTrue(vm.propose());
        assertTrue(window.table().edit(60, NoteColumn.WIRE, "12"));
        assertNull(vm.proposal());
        assertNull(window.curves().proposalProperty().get());
    }

    @Test
    void theSelectedKeysSectionGivesTheRange() {
        session.selectedKeyProperty().set(5);
        assertEquals("1", vm.fromProperty().get());
        assertEquals("20", vm.toProperty().get());
        assertEquals(RescaleViewModel.Kind.WOUND, vm.kindProperty().get());
        session.selectedKeyProperty().set(70);
        vm.toSelected();
        assertEquals("70", vm.toProperty().get());
    }

    /** The same words as the command line (cli PlanPlainCommandTest checks that side): composed in design/rescale. */
    @Test
    void theSummaryAndTheRefusalsAreTheSentencesOfDesignRescale() {
        vm.setRange(40, 60);
        vm.kindProperty().set(RescaleViewModel.Kind.PLAIN);
        assertTrue(vm.propose(), () -> String.join("\n", vm.problems()));
        String summary = vm.summaryProperty().get();
        for (String line : ProposalText.summary(vm.proposal())) {
            assertTrue(summary.contains(line), line + " in " + summary);
        }
        assertTrue(summary.contains("Caution: "), "the cautions stay: " + summary);
        assertTrue(summary.contains("eye protection"), summary);

        vm.wireListProperty().set(RescaleWireList.CUSTOM);
        vm.customWiresProperty().set("0.8mm 0.8mm");
        assertFalse(vm.propose());
        assertEquals("plain wire list: diameter 0.800 mm is listed twice", vm.problems().get(0));
        vm.customWiresProperty().set("0.8mm; 13 99");
        assertFalse(vm.propose());
        assertTrue(vm.problems().get(0).startsWith("plain wire list: size 99 is not in the music-wire size table"),
                vm.problems().get(0));
        vm.wireListProperty().set(RescaleWireList.MUSIC);
        vm.maxBreakProperty().set("150");
        assertFalse(vm.propose());
        assertEquals("maximum percent of breaking strength must be more than 0 and at most 100 %, was 150",
                vm.problems().get(0));
    }
}
