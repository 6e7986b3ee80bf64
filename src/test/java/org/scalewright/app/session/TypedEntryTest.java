package org.scalewright.app.session;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.scalewright.model.InvalidInput;

/** The one reader of typed numbers in the window: number, optional unit, decimal comma. */
class TypedEntryTest {
    @Test
    void aNumberWithOrWithoutItsUnitAndWithAPointOrAComma() {
        assertEquals(442.0, TypedEntry.parse("442", "A4", "Hz"));
        assertEquals(442.5, TypedEntry.parse(" 442,5 Hz ", "A4", "Hz"));
        assertEquals(442.5, TypedEntry.parse("442.5hz", "A4", "Hz"));
        assertEquals(-12.0, TypedEntry.parse("-12 c", "cents flat", "c"));
        assertEquals(0.5, TypedEntry.parse(",5", "bandwidth", ""));
        assertEquals(1e-3, TypedEntry.parse("1e-3", "x", ""));
    }

    @Test
    void anythingElseIsRefusedNamingTheFieldTheUnitAndTheText() {
        for (String bad : new String[] {"four forty", "", "NaN", "Infinity", "0x1p9", "12d", "1,2,3", "442 kHz", "4 4"}) {
            InvalidInput e = assertThrows(InvalidInput.class, () -> TypedEntry.parse(bad, "A4", "Hz"), bad);
            assertEquals("A4: expected a number in Hz, was '" + bad.strip() + "'", e.getMessage());
        }
        assertEquals("cents flat: expected a number of cents, was 'x'",
                assertThrows(InvalidInput.class, () -> TypedEntry.parse("x", "cents flat", "c")).getMessage());
        assertEquals("margin: expected a number, was 'x'",
                assertThrows(InvalidInput.class, () -> TypedEntry.parse("x", "margin", "")).getMessage());
        List<String> bad = new ArrayList<>();
        assertNull(TypedEntry.number("lots", "overpull", "%", bad));
        assertEquals(List.of("overpull: expected a number in %, was 'lots'"), bad);
    }
}
