package org.scalewright.design.wirecheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.scalewright.io.BadInputException;
import org.scalewright.io.PitchStateReader;
import org.scalewright.io.StrengthTableReader;
import org.scalewright.physics.StrengthTable;

/**
 * The invented example maker tables under scales/wire-makers: each reads, is labelled as invented
 * in its name and header, and together they use all four strength column forms of DESIGN §4.
 * Their figures are not checked (they are invented, not check values).
 */
class ExampleMakerTablesTest {
    private static final Path DIR = Path.of("scales", "wire-makers");

    @Test
    void everyExampleReadsAndSaysItIsInvented() throws IOException, BadInputException {
        List<Path> files;
        try (Stream<Path> s = Files.list(DIR)) {
            files = s.filter(p -> p.toString().endsWith(".csv")).sorted().toList();
        }
        assertTrue(files.size() >= 4, "examples: " + files);
        Set<String> forms = new HashSet<>();
        for (Path f : files) {
            StrengthTable t = StrengthTableReader.read(f);
            assertTrue(t.name().toLowerCase(Locale.ROOT).contains("invented"), f + ": " + t.name());
            assertTrue(t.sourceNotes().stream().anyMatch(l -> l.contains("certified")), f.toString());
            assertTrue(t.minDiameter() <= 0.75e-3 && t.maxDiameter() >= 1.6e-3,
                    f + " should cover plain wire and cores");
            String header = Files.readAllLines(f).stream().filter(l -> !l.startsWith("#")).findFirst().orElseThrow();
            forms.add(header.split(",")[1].strip());
        }
        assertEquals(Set.of("tensile_mpa", "tensile_ksi", "breaking_load_n", "breaking_load_lbf"), forms);
    }

    @Test
    void thePitchStateExampleReads() throws BadInputException {
        assertTrue(PitchStateReader.read(Path.of("scales", "pitch-raise", "grand-190-flat.csv")).isPerNote());
    }
}
