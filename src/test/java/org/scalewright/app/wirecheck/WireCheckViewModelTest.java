package org.scalewright.app.wirecheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.chart.CurveOverlay;
import org.scalewright.design.wirecheck.WireCheckReport;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.WireCheckCsv;
import org.scalewright.app.WorkstationViewModel;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.ScriptedPrompts;
import org.scalewright.app.session.TestSheets;
import org.scalewright.app.table.NoteColumn;

/** The wire check panel through its view model, on the invented demo grand, without a display. */
class WireCheckViewModelTest {
    /** An invented maker's table of the project (scales/wire-makers), weaker than ASTM minimum on some sizes. */
    private static final Path MAKER = Path.of("scales", "wire-makers", "specimen-wire-mill-mm-load-n.csv");
    @TempDir
    Path dir;
    private final ScriptedPrompts prompts = new ScriptedPrompts();
    private WorkstationViewModel vm;
    private WireCheckViewModel check;

    @BeforeEach
    void openTheDemoGrand() {
        vm = new WorkstationViewModel(new ScaleSession(), prompts);
        assertTrue(vm.openSheet(TestSheets.demoGrand(), false));
        check = new WireCheckViewModel(vm.session(), prompts, vm.curves());
    }

    private void raise40CentsWith25PctOverpull() {
        prompts.files.add(MAKER);
        assertTrue(check.loadReplacement());
        check.centsFlatProperty().set("40");
        check.overpullProperty().set("25");
        assertTrue(check.check(), check.problemProperty().get());
    }

    @Test
    void aPitchRaiseWithAMakersTableListsTheNotesAtRiskFirst() {
        raise40CentsWith25PctOverpull();
        WireCheckReport r = check.reportProperty().get();
        List<WireCheckViewModel.Row> rows = check.rows();
        assertEquals(88, rows.size());
        int atRisk = r.atRisk().size();
        assertTrue(atRisk > 0, "the demo grand has notes over the danger band at this peak");
        double danger = check.dangerPct();
        for (int i = 0; i < rows.size(); i++) {
            WireCheckViewModel.Row row = rows.get(i);
            assertEquals(i < atRisk, row.overDanger(), "row " + i);
            assertEquals(row.overDanger(), row.pctPeak() >= danger, "key " + row.key());
            if (i > 0 && i < atRisk) {
                assertTrue(rows.get(i - 1).pctPeak() >= row.pctPeak(), "highest peak first");
            }
            if (i > atRisk) {
                assertTrue(rows.get(i - 1).key() < row.key(), "the rest from bass to treble");
            }
        }
        // A note 40 cents flat with 25 % overpull peaks 10 cents above its target. Stress goes with
        // f² (T = 4 L² μ f² − K), so for plain wire the peak is after × 2^(20/1200), less the small
        // stiffness term (hand-worked from the string equation, DESIGN §3).
        for (WireCheckViewModel.Row row : rows) {
            if (row.key() > 60) {
                assertEquals(row.pctAfter() * Math.pow(2, 20.0 / 1200), row.pctPeak(), row.pctPeak() * 2e-3,
                        "key " + row.key());
            }
        }
        assertTrue(check.summaryProperty().get().startsWith(atRisk + " notes at or above the danger band"),
                check.summaryProperty().get());
        assertTrue(check.totalsProperty().get().contains("kN") && check.totalsProperty().get().contains("lbf"));
        assertTrue(check.stagesProperty().get().startsWith("Raise in stages: advised"), check.stagesProperty().get());
        assertEquals(BuiltInData.cautions(), check.cautions(), "a pitch raise shows the cautions");
    }

    @Test
    void afterAndPeakAreDrawnOverThePresentCurve() {
        raise40CentsWith25PctOverpull();
        List<CurveOverlay> overlays = vm.curves().data().overlays();
        assertEquals(List.of(WireCheckViewModel.AFTER, WireCheckViewModel.PEAK),
                overlays.stream().map(CurveOverlay::name).toList());
        for (WireCheckViewModel.Row row : check.rows()) {
            assertEquals(row.pctAfter(), overlays.get(0).values().get(row.key()), 1e-12);
            assertEquals(row.pctPeak(), overlays.get(1).values().get(row.key()), 1e-12);
        }
        assertEquals(88, vm.curves().data().working().notes().size(), "the present curve stays");

        vm.table().edit(70, NoteColumn.WIRE, "16");
        assertTrue(check.staleProperty().get(), "an edit makes the check out of date");
        assertTrue(vm.curves().data().overlays().isEmpty(), "and takes its overlays down");
    }

    @Test
    void noPitchRaiseDrawsOnlyAfterAndShowsNoCautions() {
        check.conversionProperty().set(WireCheckViewModel.Conversion.METRIC_NEAREST);
        assertTrue(check.check(), check.problemProperty().get());
        assertEquals(List.of(WireCheckViewModel.AFTER),
                vm.curves().data().overlays().stream().map(CurveOverlay::name).toList());
        assertTrue(check.cautions().isEmpty());
        assertTrue(check.rows().stream().anyMatch(r -> !r.wireBefore().equals(r.wireAfter())),
                "plain inch sizes were converted to metric diameters");
    }

    @Test
    void exportWritesTheCsvWithTheDesignColumns() throws Exception {
        raise40CentsWith25PctOverpull();
        Path out = dir.resolve("check");
        prompts.files.add(out);
        assertTrue(check.exportCsv());
        Path written = dir.resolve("check.csv");
        List<String> lines = Files.readAllLines(written);
        String header = lines.stream().filter(l -> !l.startsWith("#")).findFirst().orElseThrow();
        List<String> columns = List.of(header.split(","));
        for (String c : List.of("key", "note", "break_pct_before", "break_pct_after", "break_pct_peak",
                "headroom_cents_after", "over_danger")) {
            assertTrue(columns.contains(c), c + " in " + columns);
        }
        assertEquals(WireCheckCsv.HEADER, columns);
        List<String> data = lines.stream().filter(l -> !l.startsWith("#")).skip(1).toList();
        assertEquals(88, data.size());
        assertTrue(data.get(0).endsWith(",true,") || data.get(0).contains(",true,"), "at risk first: " + data.get(0));
        assertTrue(data.get(0).startsWith(check.rows().get(0).key() + ","));
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("#") && l.contains("overpull: 25")));
    }

    @Test
    void aBadMakersFileShowsItsProblemsAndChangesNothing() throws Exception {
        raise40CentsWith25PctOverpull();
        WireCheckReport before = check.reportProperty().get();
        String name = check.replacementNameProperty().get();
        Path bad = Files.writeString(dir.resolve("bad-maker.csv"), "diameter_mm,tensile_mpa\n0.8,2400\n0.9,lots\n");
        prompts.files.add(bad);
        assertFalse(check.loadReplacement());
        assertTrue(prompts.shown.contains("Strength table not read"), prompts.shown.toString());
        assertTrue(prompts.problems.stream().anyMatch(p -> p.contains("bad-maker.csv") && p.contains("3")),
                prompts.problems.toString());
        assertEquals(name, check.replacementNameProperty().get());
        assertSame(before, check.reportProperty().get());
        assertTrue(check.check());
        assertEquals(before.notes(), check.reportProperty().get().notes(), "the same table as before");
    }

    @Test
    void badEntriesAreNamedAndRunNothing() {
        check.overpullProperty().set("150");
        check.targetA4Property().set("four forty");
        assertFalse(check.check());
        assertTrue(check.problemProperty().get().contains("overpull must be 0 to 100 %, was 150"));
        assertTrue(check.problemProperty().get().contains("target A4: expected a number in Hz, was 'four forty'"));
        assertNull(check.reportProperty().get());
        assertTrue(vm.curves().data().overlays().isEmpty());
    }

    @Test
    void clickingARowSelectsItsKey() {
        raise40CentsWith25PctOverpull();
        check.select(check.rows().get(0));
        assertEquals(check.rows().get(0).key(), vm.session().selectedKeyProperty().get());
    }

    @Test
    void theStageLimitAndTheTargetA4AreReadByTheirOwnHomes() {
        check.centsFlatProperty().set("40");
        check.stageLimitProperty().set("7,5 kN");
        assertTrue(check.check(), check.problemProperty().get());
        assertEquals(7500, check.reportProperty().get().request().stageLimit().newtons(0), 1e-9);
        check.stageLimitProperty().set("lots");
        check.targetA4Property().set("1200");
        assertFalse(check.check());
        // the same messages as the command line's --stage-above and --a4 (StageLimit.parse, PitchStandard.of)
        assertTrue(check.problemProperty().get().contains("pitch standard A4 must be 300 to 600 Hz, was 1200"),
                check.problemProperty().get());
        assertTrue(check.problemProperty().get().contains("stage limit: expected a percent of the present total or "
                + "a force > 0, such as 5%, 10kN or 2200lbf, was 'lots'"), check.problemProperty().get());
    }
}
