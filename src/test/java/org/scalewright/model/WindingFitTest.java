package org.scalewright.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/**
 * The one rule for a winding and its bare ends against the speaking length, as the reader, the
 * model and the window apply it; the 0.5 mm tolerance is common practice, no source (Note).
 */
class WindingFitTest {
    private static final OptionalDouble NONE = OptionalDouble.empty();

    private static OptionalDouble mm(double v) {
        return OptionalDouble.of(v * 1e-3);
    }

    private static WindingFit fit(boolean wound, OptionalDouble winding, OptionalDouble front, OptionalDouble back) {
        return WindingFit.of(wound, 1.5, winding, front, back);
    }

    @Test
    void eachRuleOnASpeakingLengthOf1500Mm() {
        assertEquals(WindingFit.FITS, fit(true, mm(1420), NONE, NONE));
        assertEquals(WindingFit.FITS, fit(true, NONE, mm(40), mm(40)));
        assertEquals(WindingFit.FITS, fit(true, mm(1420), mm(40), mm(40.4)), "0.4 mm over: within 0.5 mm");
        assertEquals(WindingFit.DO_NOT_ADD_UP, fit(true, mm(1420), mm(40), mm(40.6)));
        assertEquals(WindingFit.BARE_ON_PLAIN_WIRE, fit(false, NONE, mm(10), NONE));
        assertEquals(WindingFit.BARE_LONGER_THAN_SPEAKING, fit(true, NONE, mm(900), mm(700)));
        assertEquals(WindingFit.ONE_END_WITHOUT_WINDING, fit(true, NONE, mm(10), NONE));
        assertEquals(WindingFit.FITS, fit(true, mm(1480), mm(20), NONE));
        assertEquals(WindingFit.WINDING_AND_END_TOO_LONG, fit(true, mm(1480), NONE, mm(21)));
    }

    @Test
    void theWordsNameTheLengthsInTheUnitGiven() {
        String w = WindingFit.DO_NOT_ADD_UP.words(1.5, mm(1420), mm(40), mm(50), v -> Math.round(v * 1e3) + " mm");
        assertEquals("winding 1420 mm + bare core 40 mm (front) + 50 mm (back) = 1510 mm, but the speaking length is "
                + "1500 mm (they must agree within 1 mm)", w, "lengths rounded to whole mm by the formatter given");
        assertTrue(WindingFit.WINDING_AND_END_TOO_LONG.words(1.5, mm(1480), NONE, mm(21), v -> v * 1e3 + " mm")
                .contains("of bare core at the back"));
    }

    @Test
    void aNoteIsHeldToItToo() {
        Wrap w = Wrap.single(1e-3, WrapMetal.COPPER);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new Note(10, 2, 1.5,
                CoreWire.ofDiameter(1.3e-3), w, NONE, 0, NONE, NONE, NONE, "", "", mm(10), NONE));
        assertEquals("key 10: give both bare ends, or one of them with the wound length", e.getMessage());
    }
}
