package org.scalewright.model;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Choices in a message, as English lists them (common practice, no source). */
class AlternativesTest {
    @Test
    void theLastChoiceFollowsOr() {
        assertEquals("mm", Alternatives.of(List.of("mm")));
        assertEquals("metric or imperial", Alternatives.of(List.of("metric", "imperial")));
        assertEquals("a, b or c", Alternatives.of(List.of("a", "b", "c")));
    }
}
