package org.scalewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code analyze --out x.xlsx} opened by LibreOffice (an independent spreadsheet) in an English and a
 * German locale and saved as CSV: every number of the results is a number there, shown with the locale's
 * decimal mark. Runs only where {@code soffice} is installed (not in CI; DEVELOPERS.md says how it was
 * run by hand).
 */
class SofficeConversionTest {
    @TempDir
    Path dir;

    private static boolean sofficePresent() {
        return List.of(System.getenv().getOrDefault("PATH", "").split(java.io.File.pathSeparator)).stream()
                .anyMatch(p -> Files.isExecutable(Path.of(p, "soffice")));
    }

    private List<String> convert(Path xlsx, String locale, int separator) throws Exception {
        Path out = Files.createDirectories(dir.resolve("out-" + locale));
        ProcessBuilder pb = new ProcessBuilder("soffice", "--headless",
                "-env:UserInstallation=" + dir.resolve("profile-" + locale).toUri(),
                "--convert-to", "csv:Text - txt - csv (StarCalc):" + separator + ",34,76,1", "--outdir",
                out.toString(), xlsx.toString()).redirectErrorStream(true);
        pb.environment().put("LC_ALL", locale);
        pb.environment().put("HOME", dir.toString());
        Process p = pb.start();
        p.getInputStream().transferTo(java.io.OutputStream.nullOutputStream());
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "soffice did not finish");
        return Files.readAllLines(out.resolve("x.csv"));
    }

    @Test
    void theWorkbooksNumbersAreNumbersInAnEnglishAndAGermanSpreadsheet() throws Exception {
        assumeTrue(sofficePresent(), "LibreOffice (soffice) is not installed");
        Path xlsx = dir.resolve("x.xlsx");
        int rc = ScalewrightCommand.run(new String[] {"analyze", "demo-instruments/grand-190/grand-190.csv", "--out",
                xlsx.toString()}, new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter()));
        assertEquals(0, rc);
        List<String> en = convert(xlsx, "en_US.UTF-8", 44);
        List<String> de = convert(xlsx, "de_DE.UTF-8", 59);
        assertEquals(89, en.size());
        assertTrue(en.get(0).startsWith("\"key\",\"note\",\"section\",\"frequency (Hz)\","), en.get(0));
        // LibreOffice quotes text cells and leaves number cells bare; A0 of the demo grand
        assertTrue(en.get(1).startsWith("1,\"A0\",\"bass\",27.5,1,\"true\",1.6,219.25615,1452.49,"), en.get(1));
        assertTrue(de.get(1).startsWith("1;\"A0\";\"bass\";27,5;1;\"true\";1,6;219,25615;1452,49;"), de.get(1));
    }
}
