package org.scalewright.report;

import com.opencsv.CSVReader;
import com.opencsv.exceptions.CsvException;
import java.io.IOException;
import java.io.InputStream;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.scalewright.design.orders.WireAllowances;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.StressBands;

/**
 * Where the figures of a report come from: the strength table's own source notes, the source
 * column of the built-in materials table and the header comments of the built-in wire-size
 * table (read from the bundled resources, not repeated here), and the rules of thumb the
 * program uses.
 */
public final class DefaultSources {
    private static final String DIR = "/org/scalewright/data/";

    private DefaultSources() {
    }

    /**
     * @param settings   the analysis settings used (strength table, bands, neighbour step)
     * @param allowances the wire-order allowances used
     * @return one line per source, in plain words
     */
    public static List<String> lines(AnalysisSettings settings, WireAllowances allowances) {
        List<String> l = new ArrayList<>();
        l.add("Tension of a stiff string with hinged ends, T = 4 L² μ f² − K with K = π³ E d⁴ / (64 L²), "
                + "inharmonicity B = K / T and partial n at n f₁ √((1 + B n²)/(1 + B)): Fletcher 1964, "
                + "J. Acoust. Soc. Am. 36, 203.");
        l.add("Pitch standard A4 = 440 Hz unless the sheet or the user sets another: ISO 16:1975.");
        String name = settings.strength().name();
        l.add("Breaking strength - " + name + ": " + String.join(" ", settings.strength().sourceNotes().stream()
                .takeWhile(n -> !n.startsWith("How this table was obtained"))
                .filter(n -> !n.strip().equals(name.strip())).toList()));
        for (String m : materials()) {
            l.add(m);
        }
        l.add("Music-wire sizes: " + String.join(" ", headerComments("music-wire-sizes.csv")));
        StressBands b = settings.bands();
        l.add(String.format(Locale.ROOT, "Stress bands: below %.0f %% low, from %.0f %% caution, from %.0f %% danger "
                + "(against the strength table in use): common practice, no source; user-settable.",
                b.low(), b.caution(), b.danger()));
        l.add(String.format(Locale.ROOT, "Tension step flag: per-string tension differing from the next key's by "
                + "more than %.0f %%: common practice, no source.", settings.neighbourStepPct()));
        l.add(String.format(Locale.ROOT, "Wire order: %.0f mm per string for the tuning-pin coil and hitch, %.0f mm "
                + "front and back length where only the speaking length is known, looped pairs on bichords and "
                + "trichords: common practice, no source; settable.", allowances.pinAllowance() * 1e3,
                allowances.lengthAllowance() * 1e3));
        l.add("Tuning stretch: keys A3-A4 at equal temperament, octaves outward tuned so that the lower note's "
                + "partial 2m sounds with the upper note's partial m (this program's definition); the treble "
                + "stretched sharp and the bass flat as aural tuners do: Railsback, J. Acoust. Soc. Am. 1938.");
        return l;
    }

    /** @return one line per material constant: {@code steel density 7850 kg/m3: source} */
    static List<String> materials() {
        List<String> out = new ArrayList<>();
        String text = resource("materials.csv");
        StringBuilder data = new StringBuilder();
        for (String line : text.lines().toList()) {
            if (!line.strip().startsWith("#") && !line.isBlank()) {
                data.append(line).append('\n');
            }
        }
        try (CSVReader r = new CSVReader(new StringReader(data.toString()))) {
            List<String[]> rows = r.readAll();
            for (String[] row : rows.subList(1, rows.size())) {
                out.add(capitalise(row[0].replace('_', ' ')) + " " + row[1] + " " + row[2] + ": " + row[3] + ".");
            }
        } catch (IOException | CsvException e) {
            throw new IllegalStateException("built-in table materials.csv cannot be read: " + e.getMessage(), e);
        }
        return out;
    }

    /** @return the text of the comment lines before a bundled table's header */
    static List<String> headerComments(String name) {
        List<String> out = new ArrayList<>();
        for (String line : resource(name).lines().toList()) {
            String s = line.strip();
            if (s.startsWith("#")) {
                out.add(s.substring(1).strip());
            } else if (!s.isEmpty()) {
                break;
            }
        }
        return out;
    }

    private static String resource(String name) {
        try (InputStream in = DefaultSources.class.getResourceAsStream(DIR + name)) {
            if (in == null) {
                throw new IllegalStateException("missing built-in table " + name);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String capitalise(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
