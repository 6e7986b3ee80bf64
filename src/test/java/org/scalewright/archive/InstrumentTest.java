package org.scalewright.archive;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** An instrument's description in words, as the history and the window show it. */
class InstrumentTest {
    @Test
    void theGivenFieldsInOrderWithTheirWords() {
        assertEquals("Marrowby & Fenn, 190, serial 40117, owner the school, at the hall",
                new Instrument("grand-190", "Marrowby & Fenn", "190", "40117", "the school", "the hall")
                        .description());
        assertEquals("serial 40117, at the hall",
                new Instrument("grand-190", " ", null, " 40117 ", "", "the hall").description(),
                "blank and missing fields are left out, the others trimmed");
        assertEquals("", Instrument.named("grand-190").description());
    }
}
