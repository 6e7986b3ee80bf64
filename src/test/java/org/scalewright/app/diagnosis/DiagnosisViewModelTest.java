package org.scalewright.app.diagnosis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.chart.CurveOverlay;
import org.scalewright.io.DiagnosisCsv;
import org.scalewright.app.WorkstationViewModel;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.ScriptedPrompts;
import org.scalewright.app.session.TestSheets;

/** The diagnosis panel through its view model, on the invented demo grand, without a display. */
class DiagnosisViewModelTest {
    @TempDir
    Path dir;
    private final ScriptedPrompts prompts = new ScriptedPrompts();
    private WorkstationViewModel vm;
    private DiagnosisViewModel diagnosis;

    @BeforeEach
    void openTheDemoGrand() {
        vm = new WorkstationViewModel(new ScaleSession(), prompts);
        assertTrue(vm.openSheet(TestSheets.demoGrand(), false));
        diagnosis = new DiagnosisViewModel(vm.session(), prompts, vm.curves());
    }

    private void diagnose60To80() {
        diagnosis.rangeProperty().set("60-80");
        assertTrue(diagnosis.diagnose(), diagnosis.problemProperty().get());
    }

    @Test
    void theHotTrebleNotesOfTheDemoGrandStandOut() {
        diagnose60To80();
        assertEquals(21, diagnosis.rows().size());
        List<Integer> high = diagnosis.rows().stream().filter(r -> r.standsOut().equals("high"))
                .map(DiagnosisViewModel.Row::key).toList();
        assertTrue(high.containsAll(List.of(66, 67, 68, 69, 70)), "the demo's planted hot run: " + high);
        for (DiagnosisViewModel.Row r : diagnosis.rows()) {
            assertEquals(Math.abs(r.deviationPct()) > 8, !r.standsOut().isEmpty(), "key " + r.key());
            assertEquals(100 * (r.breakPct() - r.trendPct()) / r.trendPct(), r.deviationPct(), 1e-6);
        }
        String finding = diagnosis.findingProperty().get();
        assertTrue(finding.startsWith("Finding: length and pitch."), finding);
        assertTrue(finding.contains("68 E6"), "the hottest note is named: " + finding);
        assertFalse(diagnosis.remedies().isEmpty());
        assertTrue(diagnosis.remedies().stream().anyMatch(DiagnosisViewModel.RemedyLine::fixes));
        for (DiagnosisViewModel.RemedyLine m : diagnosis.remedies()) {
            assertEquals(m.fixes(), m.maxPctAfter() < diagnosis.cautionPct(), m.text());
        }
        assertFalse(diagnosis.inspect().isEmpty());
    }

    @Test
    void theNotesStandingOutAreMarkedOnTheCurves() {
        diagnose60To80();
        List<CurveOverlay> overlays = vm.curves().data().overlays();
        assertEquals(1, overlays.size());
        assertEquals(DiagnosisViewModel.STANDING_OUT, overlays.get(0).name());
        assertEquals(diagnosis.rows().stream().filter(r -> !r.standsOut().isEmpty()).map(DiagnosisViewModel.Row::key)
                .toList(), List.copyOf(overlays.get(0).values().keySet()));
        assertEquals(vm.session().analysis().result(68).orElseThrow().breakPct(), overlays.get(0).values().get(68),
                1e-9);
    }

    @Test
    void theRangeIsPrefilledWithTheSectionOfTheSelectedKey() {
        vm.session().selectedKeyProperty().set(68);
        String range = diagnosis.rangeProperty().get();
        assertTrue(range.matches("\\d+-\\d+"), range);
        int first = Integer.parseInt(range.split("-")[0]);
        int last = Integer.parseInt(range.split("-")[1]);
        assertTrue(first <= 68 && last >= 68, range);
        for (int k = first; k <= last; k++) {
            var n = vm.session().scale().note(k).orElseThrow();
            assertEquals(vm.session().scale().note(68).orElseThrow().section(), n.section(), "key " + k);
            assertFalse(n.isWound());
        }
        diagnosis.rangeProperty().set("C6-G6");
        vm.session().selectedKeyProperty().set(10);
        assertEquals("C6-G6", diagnosis.rangeProperty().get(), "a typed range is kept");
    }

    @Test
    void exportWritesTheCsvWithTheDesignColumns() throws Exception {
        diagnose60To80();
        Path out = dir.resolve("diagnosis.csv");
        prompts.files.add(out);
        assertTrue(diagnosis.exportCsv());
        List<String> lines = Files.readAllLines(out);
        List<String> body = lines.stream().filter(l -> !l.startsWith("#")).toList();
        List<String> columns = List.of(body.get(0).split(","));
        for (String c : List.of("key", "note", "stress_mpa", "break_pct", "headroom_cents", "break_hz",
                "trend_deviation_pct", "stands_out")) {
            assertTrue(columns.contains(c), c + " in " + columns);
        }
        assertEquals(DiagnosisCsv.HEADER, columns);
        assertEquals(22, body.size());
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("#") && l.contains("inspect:")));
    }

    @Test
    void badEntriesAndABadTableChangeNothing() throws Exception {
        diagnosis.rangeProperty().set("100-108");
        assertFalse(diagnosis.diagnose());
        assertTrue(diagnosis.problemProperty().get().contains("no note in that range"),
                diagnosis.problemProperty().get());
        diagnosis.rangeProperty().set("100-2147483648");
        assertFalse(diagnosis.diagnose());
        assertTrue(diagnosis.problemProperty().get().contains("key must be -20 to 108 (A0 is 1, C8 is 88), was "
                + "2147483648"), diagnosis.problemProperty().get());
        diagnosis.rangeProperty().set("60-80");
        diagnosis.marginProperty().set("none");
        assertFalse(diagnosis.diagnose());
        assertTrue(diagnosis.problemProperty().get().contains("margin: expected a number in %, was 'none'"));
        assertNull(diagnosis.reportProperty().get());

        Path bad = Files.writeString(dir.resolve("bad.csv"), "diameter_mm,tensile_mpa\nthin,2400\n");
        prompts.files.add(bad);
        assertFalse(diagnosis.addCandidate());
        assertEquals("none", diagnosis.candidateNamesProperty().get());
        assertTrue(prompts.problems.stream().anyMatch(p -> p.contains("bad.csv")), prompts.problems.toString());

        prompts.files.add(Path.of("scales", "wire-makers", "example-wire-works-mm-mpa.csv"));
        assertTrue(diagnosis.addCandidate());
        diagnosis.marginProperty().set("8");
        assertTrue(diagnosis.diagnose());
        assertTrue(diagnosis.remedies().stream().anyMatch(m -> m.text().contains("Example Wire Works")),
                diagnosis.remedies().toString());
    }

    @Test
    void aRangeHoldingANoteWithNoTensionIsRefusedNamingIt() throws Exception {
        Path sheet = Files.writeString(dir.resolve("short.csv"), "key,strings,length_mm,wire_mm\n1,1,60,2.5\n"
                + "2,1,1500,1.2\n3,1,1490,1.2\n4,1,1480,1.2\n5,1,1470,1.2\n6,1,1460,1.2\n7,1,1450,1.2\n");
        assertTrue(vm.openSheet(sheet, true));
        diagnosis.rangeProperty().set("1-7");
        assertFalse(diagnosis.diagnose());
        String told = diagnosis.problemProperty().get();
        assertTrue(told.contains("key 1 (A0): no positive tension"), told);
        assertTrue(told.contains("keys 1-7 are not diagnosed"), told);
        assertNull(diagnosis.reportProperty().get());
        diagnosis.rangeProperty().set("2-7");
        assertTrue(diagnosis.diagnose(), diagnosis.problemProperty().get());
    }

    @Test
    void clearTakesTheMarksOffTheCurves() {
        diagnose60To80();
        diagnosis.clear();
        assertTrue(vm.curves().data().overlays().isEmpty());
        assertTrue(diagnosis.rows().isEmpty());
        assertNull(diagnosis.reportProperty().get());
    }

    @Test
    void clickingARowSelectsItsKey() {
        diagnose60To80();
        diagnosis.select(diagnosis.rows().get(8));
        assertEquals(68, vm.session().selectedKeyProperty().get());
    }
}
