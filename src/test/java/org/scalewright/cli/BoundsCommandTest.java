package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import picocli.CommandLine;

/**
 * Bad input of issue 14, part 4, through the command line in-process: exit status 2, the place
 * of the problem, no stack trace and nothing written; an impossible note named per key.
 */
class BoundsCommandTest {
    private static final String HEADER = "key,strings,length_mm,wire_mm\n";
    /** Key 1 is 60 mm of 2.5 mm wire at A0: the wire is stiffer than the pitch can pull (no positive tension). */
    private static final String NO_TENSION = "key,strings,length_mm,wire_mm,section\n1,1,60,2.5,bass\n"
            + "2,1,1500,1.2,bass\n3,1,1490,1.2,bass\n4,1,1480,1.2,bass\n5,1,1470,1.2,bass\n6,1,1460,1.2,bass\n"
            + "7,1,1450,1.2,bass\n8,1,1440,1.2,bass\n9,1,1430,1.2,bass\n";

    @TempDir
    Path dir;

    private record Run(int status, String out, String err) {
    }

    private Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int rc = ScalewrightCommand.run(new CommandLine(new ScalewrightCommand()), args, new PrintWriter(out),
                new PrintWriter(err), dir.resolve("errors.log"));
        return new Run(rc, out.toString(), err.toString());
    }

    private Path file(String name, String text) throws IOException {
        return Files.writeString(dir.resolve(name), text, StandardCharsets.UTF_8);
    }

    /** Exit 2, the message, no trace, no log, nothing beside the inputs written. */
    private void refused(Run r, String message) {
        assertEquals(ExitStatus.BAD_INPUT, r.status(), r.err());
        assertTrue(r.err().contains("error: " + message), r.err());
        assertFalse(r.err().contains("Exception"), r.err());
        assertFalse(r.err().contains("\tat "), r.err());
        assertFalse(r.err().contains("internal error"), r.err());
        assertFalse(Files.exists(dir.resolve("errors.log")), "no program fault logged");
        assertFalse(Files.exists(dir.resolve("out.csv")), "nothing written");
    }

    @ParameterizedTest
    @DisplayName("a sub-normal diameter, a key of 200 and keys near 2^31: exit 2 with line and column")
    @CsvSource(delimiter = '|', value = {
        "40,3,600,4.9e-324|sheet.csv, line 2, column wire_mm: must be 0.001 mm to 10000 mm, was 4.9e-324 mm",
        "200,3,50,0.8|sheet.csv, line 2, column key: key must be -20 to 108 (A0 is 1, C8 is 88), was 200",
        "2147483647,3,50,0.8|sheet.csv, line 2, column key: key must be -20 to 108 (A0 is 1, C8 is 88), was 2147483647",
        "2147483648,3,50,0.8|sheet.csv, line 2, column key: key must be -20 to 108 (A0 is 1, C8 is 88), was 2147483648"})
    void badCellsAreToldWithTheirPlace(String row, String message) throws IOException {
        Path sheet = file("sheet.csv", HEADER + row + "\n");
        refused(run("analyze", sheet.toString(), "--out", dir.resolve("out.csv").toString()), message);
    }

    @Test
    @DisplayName("pitch_hz with cents on a row: exit 2 at the cents cell")
    void pitchAndCents() throws IOException {
        Path sheet = file("sheet.csv", "key,strings,length_mm,wire_mm,pitch_hz,cents\n40,3,600,1.0,262,5\n");
        refused(run("analyze", sheet.toString()), "sheet.csv, line 2, column cents: give either pitch_hz");
    }

    @Test
    @DisplayName("a note with no positive tension: shown and flagged by analyze; diagnose and plan-plain refuse it by line and key")
    void noPositiveTension() throws IOException {
        Path sheet = file("short.csv", NO_TENSION);
        Run a = run("analyze", sheet.toString());
        assertEquals(ExitStatus.OK, a.status(), a.err());
        assertTrue(a.out().contains("no positive tension"), a.out());
        assertTrue(a.out().contains("Whole instrument: 0.8 kN"), "the impossible note (-1051 N) adds nothing to "
                + "the total of the eight others (about 0.1 kN each), which it would turn negative: " + a.out());
        String named = "key 1 (A0): no positive tension: a 2.500 mm wire is too stiff for a speaking length of "
                + "60.0 mm at 27.50 Hz";
        Run d = run("diagnose", sheet.toString(), "--keys", "1-9", "--out", dir.resolve("out.csv").toString());
        refused(d, "line 2: " + named); // the sheet line where key 1 stands
        assertTrue(d.err().contains("error: keys 1-9 are not diagnosed"), d.err());
        Run p = run("plan-plain", sheet.toString(), "--keys", "A0-F1", "--out", dir.resolve("out.csv").toString());
        refused(p, "line 2: " + named);
        assertTrue(p.err().contains("error: keys 1-9 are not planned"), p.err());
        assertFalse(p.err().contains("stress must be"), p.err());
    }

    @Test
    @DisplayName("a note with no positive tension outside the diagnosed keys is left out of its section's trend")
    void noPositiveTensionOutsideTheRange() throws IOException {
        Path sheet = file("short.csv", NO_TENSION);
        Run d = run("diagnose", sheet.toString(), "--keys", "3-9");
        assertEquals(ExitStatus.OK, d.status(), d.err());
        assertFalse(d.out().contains("-1051"), d.out());
    }

    @ParameterizedTest
    @DisplayName("values typed on the command line are refused as the user's, exit 2, no trace")
    @CsvSource(delimiter = '|', value = {
        "diagnose|--keys|40-200|key must be -20 to 108",
        "diagnose|--keys|1-2147483648|key must be -20 to 108",
        "stretch|--octave|3:1|--octave: octave type must be 2:1, 4:2 or 6:3, was '3:1'",
        "check-wire|--to-metric|sideways|size rounding must be nearest, up or down, was 'sideways'",
        "report|--units|furlongs|--units: units must be metric or imperial, was 'furlongs'",
        "report|--pin-allowance|-5|--pin-allowance: tuning-pin and hitch allowance must be 0 to 2000 mm, was -5",
        "report|--length-allowance|1e9|--length-allowance: front and back length allowance must be 0 to 5000 mm"})
    void typedValues(String command, String option, String value, String message) throws IOException {
        Path sheet = file("sheet.csv", HEADER + "40,3,600,1.0\n41,3,590,1.0\n");
        Run r = command.equals("report")
                ? run(command, sheet.toString(), option, value, "--out", dir.resolve("rep").toString())
                : run(command, sheet.toString(), option, value);
        assertEquals(ExitStatus.BAD_INPUT, r.status(), r.err());
        assertTrue(r.err().contains(message), r.err());
        assertFalse(r.err().contains("Exception") || r.err().contains("\tat "), r.err());
        assertFalse(Files.exists(dir.resolve("rep")));
    }

    @Test
    @DisplayName("a target curve key near 2^31 and a pitch-file key of 200: exit 2 with line and column, no trace")
    void targetAndPitchFileKeys() throws IOException {
        Path sheet = file("sheet.csv", HEADER + "40,3,600,1.0\n41,3,590,1.0\n42,3,580,1.0\n");
        Path target = file("target.csv", "key,tension_n\n40,700\n2147483000,600\n");
        refused(run("plan-plain", sheet.toString(), "--keys", "40-42", "--target", target.toString(), "--out",
                dir.resolve("out.csv").toString()), "target.csv, line 3, column key: key must be -20 to 108");
        Path flat = file("flat.csv", "key,cents_flat\n40,10\n200,12\n");
        refused(run("check-wire", sheet.toString(), "--flat", flat.toString()),
                "flat.csv, line 3, column key: key must be -20 to 108 (A0 is 1, C8 is 88), was 200");
    }

    @Test
    @DisplayName("a strength table of 1,000 bad rows: 50 error lines and one saying how many more")
    void atMostFiftyMessages() throws IOException {
        Path sheet = file("sheet.csv", HEADER + "40,3,600,1.0\n");
        Path table = file("table.csv", "diameter_mm,tensile_mpa\n" + "0,2000\n".repeat(1000));
        Run r = run("analyze", sheet.toString(), "--strength", table.toString());
        refused(r, "table.csv: 950 more problems not shown (the first 50 are above)");
        assertEquals(51, r.err().lines().count(), r.err());
    }
}
