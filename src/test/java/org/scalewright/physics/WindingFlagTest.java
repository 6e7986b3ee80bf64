package org.scalewright.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;

/**
 * A winding longer than the speaking length (beyond {@link Note#WINDING_TOLERANCE}) or shorter
 * than half of it is flagged implausible (DESIGN §3).
 */
class WindingFlagTest {
    private static final double L = 1.5;

    private static List<Flag> flags(OptionalDouble winding, OptionalDouble front, OptionalDouble back) {
        Note n = new Note(10, 2, L, CoreWire.ofDiameter(1.3e-3), Wrap.single(1.05e-3, WrapMetal.COPPER),
                OptionalDouble.empty(), 0, OptionalDouble.empty(), OptionalDouble.empty(), winding, "", "",
                front, back);
        Scale s = new Scale("t", PitchStandard.ISO_16, List.of(n), null);
        return ScaleAnalyzer.analyze(s, BuiltInData.defaultSettings()).notes().get(0).flags().stream()
                .filter(f -> f.kind() == FlagKind.IMPLAUSIBLE).toList();
    }

    private static List<Flag> winding(double mm) {
        return flags(OptionalDouble.of(mm / 1e3), OptionalDouble.empty(), OptionalDouble.empty());
    }

    @ParameterizedTest(name = "winding {0} mm on a 1500 mm string: flagged {1}")
    @CsvSource({"1500.5, false", "1500.6, true", "1535, true", "1420, false", "750, false", "749, true", "300, true"})
    void windingAgainstSpeakingLength(double mm, boolean flagged) {
        List<Flag> f = winding(mm);
        assertEquals(flagged, !f.isEmpty(), f.toString());
        if (flagged) {
            assertEquals(1, f.size(), f.toString());
            assertTrue(f.get(0).detail().startsWith("winding "), f.get(0).detail());
            assertTrue(f.get(0).detail().contains(mm > 1500 ? "longer than the speaking length 1500 mm"
                    : "shorter than half the speaking length 1500 mm"), f.get(0).detail());
        }
    }

    @Test
    @DisplayName("bare ends that leave less than half the string wound are flagged; no winding given, no flag")
    void bareEndsLeaveTheWinding() {
        assertEquals(1, flags(OptionalDouble.empty(), OptionalDouble.of(0.4), OptionalDouble.of(0.4)).size());
        assertTrue(flags(OptionalDouble.empty(), OptionalDouble.of(0.02), OptionalDouble.of(0.03)).isEmpty());
        assertTrue(flags(OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty()).isEmpty());
    }

    @ParameterizedTest(name = "{0}: no winding is flagged")
    @ValueSource(strings = {"demo-instruments/grand-190/grand-190.csv", "demo-instruments/upright-131/upright-131.csv"})
    void demoInstrumentsHavePlausibleWindings(String sheet) throws Exception {
        Scale s = ScaleSheetReader.standard().read(Path.of(sheet));
        assertTrue(s.notes().stream().filter(n -> n.woundLength().isPresent()).count() > 20);
        List<Flag> implausible = ScaleAnalyzer.analyze(s, BuiltInData.defaultSettings()).notes().stream()
                .flatMap(r -> r.flags().stream()).filter(f -> f.detail().startsWith("winding")).toList();
        assertTrue(implausible.isEmpty(), implausible.toString());
    }
}
