package org.scalewright.app.table;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.TestSheets;
import org.scalewright.physics.FlagKind;

/** The flags list of the window, without a display. */
class FlagsViewModelTest {
    @TempDir
    Path dir;

    @Test
    void theWireOrderFlagsAreListedWithTheirSeverity() throws Exception {
        // the small test sheet (tenor keys 5-10: #20 20 19.5 19.5 19 19) made #20 20.5 19 19.5 19 19:
        // key 6 grows from #20, key 8 is a single #19.5 between two #19; key 9 is compared with key 7
        String text = TestSheets.SMALL.replace("6,tenor,3,1060,20", "6,tenor,3,1060,20.5")
                .replace("7,tenor,3,1020,19.5", "7,tenor,3,1020,19");
        ScaleSession session = new ScaleSession();
        session.open(TestSheets.write(dir, "odd.csv", text), false);
        FlagsViewModel vm = new FlagsViewModel(session);
        List<FlagsViewModel.Item> order = vm.items().stream()
                .filter(i -> i.kind().equals(FlagKind.SIZE_GROWS.word()) || i.kind().equals(FlagKind.ODD_SIZE.word()))
                .toList();
        assertEquals(2, order.size(), vm.items().toString());
        assertEquals(6, order.get(0).key());
        assertEquals("size grows toward the treble", order.get(0).kind());
        assertEquals(FlagKind.Severity.CAUTION, order.get(0).severity());
        assertEquals(8, order.get(1).key());
        assertEquals("single odd size", order.get(1).kind());
        assertEquals(FlagKind.Severity.NOTICE, order.get(1).severity());
    }
}
