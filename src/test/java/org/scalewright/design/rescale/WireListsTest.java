package org.scalewright.design.rescale;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.scalewright.model.CoreWire;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.WireSize;
import org.scalewright.model.WireSizeTable;

/** The one wire-list parser and the planners' settings checks: what is accepted and the one message for what is not. */
class WireListsTest {
    /** Three sizes of a size table, diameters hand-typed for the test (not a trade table). */
    private static final WireSizeTable SIZES = new WireSizeTable(List.of(new WireSize(13, 0.787e-3),
            new WireSize(13.5, 0.813e-3), new WireSize(14, 0.838e-3)));
    private static final List<Double> METRIC = List.of(0.8e-3, 0.825e-3);

    @Test
    void commasSemicolonsAndSpacesSeparateAndEmptyItemsArePassedOver() {
        List<CoreWire> w = WireLists.plainWire(" 13, 13.5;;14  0.9MM,0.034in,", SIZES, METRIC);
        assertEquals(5, w.size());
        assertEquals(13.5, w.get(1).musicWireSize().getAsDouble());
        assertEquals(0.838e-3, w.get(2).diameter(), 1e-15);
        assertEquals(0.9e-3, w.get(3).diameter(), 1e-15);
        assertEquals(0.034 * 0.0254, w.get(4).diameter(), 1e-15, "inch: 25.4 mm exactly (NIST SP 811)");
        assertEquals(3, WireLists.plainWire("music", SIZES, METRIC).size());
        assertEquals(List.of(0.8e-3, 0.825e-3), WireLists.plainWire("Metric", SIZES, METRIC).stream()
                .map(CoreWire::diameter).toList());
        List<Double> cores = WireLists.diameters(WireLists.CORES, "1.0 1.05mm;1in");
        assertEquals(3, cores.size());
        assertEquals(1.0e-3, cores.get(0), 1e-15, "a bare number is mm");
        assertEquals(1.05e-3, cores.get(1), 1e-15);
        assertEquals(0.0254, cores.get(2), 1e-15);
    }

    @Test
    void aBadListIsRefusedWithOneMessageNamingTheListTheItemAndWhatIsAccepted() {
        assertEquals("plain wire list: diameter 0.800 mm is listed twice",
                refused(() -> WireLists.plainWire("0.8mm, 0.8mm", SIZES, METRIC)));
        assertEquals("plain wire list: diameter 0.787 mm is listed twice",
                refused(() -> WireLists.plainWire("13 0.787mm", SIZES, METRIC)), "a size and its diameter");
        assertEquals("plain wire list: size 99 is not in the music-wire size table (" + SIZES.rangeText()
                + " in half steps); give a diameter such as 0.825mm instead",
                refused(() -> WireLists.plainWire("13,99", SIZES, METRIC)));
        assertEquals("plain wire list: 'abc' is neither a music-wire size number (e.g. 14.5) nor a diameter with a "
                + "unit (e.g. 0.825mm or 0.034in)", refused(() -> WireLists.plainWire("abc", SIZES, METRIC)));
        assertEquals("plain wire list is empty: give size numbers (14.5) or diameters with a unit (0.825mm, 0.034in), "
                + "separated by commas", refused(() -> WireLists.plainWire(" , ", SIZES, METRIC)));
        assertEquals("wrap wire list: 'x' is not a diameter in mm", refused(() -> WireLists.diameters(WireLists.WRAPS,
                "0.2,x")));
        assertEquals("core list: a diameter must be more than 0, was -1mm",
                refused(() -> WireLists.diameters(WireLists.CORES, "1.0,-1mm")));
        assertEquals("wrap wire list: diameter 0.250 mm is listed twice",
                refused(() -> WrapWires.of(List.of(0.25e-3, 0.3e-3, 0.25e-3))));
        assertEquals("core list: diameter 1.000 mm is listed twice", refused(() -> WoundOptions.max(70)
                .cores(List.of(1.0e-3, 1.0e-3)).options()));
    }

    @Test
    void eachSettingHasOneRangeAndOneMessageSharedByBothPlanners() {
        List<CoreWire> one = List.of(CoreWire.ofDiameter(0.8e-3));
        String max = "maximum percent of breaking strength must be more than 0 and at most 100 %, was 100.5";
        assertEquals(max, refused(() -> PlainPlanOptions.of(one, 100.5)));
        assertEquals(max, refused(() -> WoundPlanOptions.defaults(100.5)));
        assertEquals(100, PlanChecks.maxBreakPct(100));
        assertEquals("maximum percent of breaking strength must be more than 0 and at most 100 %, was 0",
                refused(() -> PlanChecks.maxBreakPct(0)));
        assertEquals("change cost must be 0 or more, was -0.5", refused(() -> PlainPlanOptions.of(one, 70)
                .withChangeCost(-0.5)));
        assertEquals("step cost must be 0 or more, was -1", refused(() -> PlainPlanOptions.of(one, 70).withStepCost(-1)));
        assertEquals("step cost must be 0 or more, was -1", refused(() -> WoundOptions.max(70).stepCost(-1).options()));
        assertEquals(0.0, PlanChecks.stepCost(0));
        assertEquals("keys joined either side of a break must be 0 (off) to 20, was 21",
                refused(() -> WoundOptions.max(70).joinBreak(21).options()));
        assertEquals(20, PlanChecks.joinBreakKeys(20));
        assertEquals("wrap wire step must be more than 0 and at most 1 mm, was 1.5 mm",
                refused(() -> WrapWires.steps(1.5e-3)));
        assertEquals("double-winding threshold must be more than 0 mm, was 0 mm",
                refused(() -> PlanChecks.doubleAbove(0)));
        assertEquals("outer/inner wrap ratio must be more than 0, was -2", refused(() -> PlanChecks.doubleRatio(-2)));
    }

    private static String refused(Runnable r) {
        return assertThrows(InvalidInput.class, r::run).getMessage();
    }
}
