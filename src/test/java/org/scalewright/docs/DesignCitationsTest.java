package org.scalewright.docs;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Code comments and tests cite the project's design document as "DESIGN §n"; every such
 * citation must name a section that src/site/DESIGN.md has, so the document and the code stay
 * together.
 */
class DesignCitationsTest {
    private static final Path DESIGN = Path.of("src", "site", "DESIGN.md");
    private static final Pattern CITATION = Pattern.compile("DESIGN §(\\d+)");
    private static final Pattern SECTION = Pattern.compile("(?m)^## (\\d+)\\. ");

    @Test
    void everyCitationNamesASectionOfTheDesignDocument() throws IOException {
        Set<String> sections = new HashSet<>();
        Matcher s = SECTION.matcher(Files.readString(DESIGN, StandardCharsets.UTF_8));
        while (s.find()) {
            sections.add(s.group(1));
        }
        assertTrue(sections.containsAll(List.of("3", "4", "5", "6", "8")), "sections found: " + sections);
        List<String> unresolved = new ArrayList<>();
        int citations = 0;
        try (Stream<Path> files = Files.walk(Path.of("src"))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                Matcher m = CITATION.matcher(Files.readString(f, StandardCharsets.UTF_8));
                while (m.find()) {
                    citations++;
                    if (!sections.contains(m.group(1))) {
                        unresolved.add(f + ": DESIGN §" + m.group(1));
                    }
                }
            }
        }
        assertTrue(citations > 20, "the code cites the design " + citations + " times");
        assertTrue(unresolved.isEmpty(), "citations of sections the design document lacks: " + unresolved);
    }
}
