package org.scalewright.report;

import org.scalewright.io.CsvSheet;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReportFilesTest {
    @TempDir
    Path tmp;

    @Test
    void filesAreHeldUntilWrittenIntoTheDirectory() throws Exception {
        ReportFiles f = new ReportFiles().add("a.txt", new byte[] {65}).add("b.csv",
                new CsvSheet(List.of("c"), List.of("key"), List.of(List.of("1"))));
        Path dir = tmp.resolve("new");
        assertTrue(Files.notExists(dir));
        List<Path> written = f.writeTo(dir);
        assertEquals(List.of(dir.resolve("a.txt"), dir.resolve("b.csv")), written);
        assertArrayEquals(new byte[] {65}, Files.readAllBytes(dir.resolve("a.txt")));
        assertEquals("# c\nkey\n1\n", Files.readString(dir.resolve("b.csv")));
    }

    @Test
    void aDirectoryThatCannotTakeTheReportIsNamed() throws Exception {
        Path file = Files.writeString(tmp.resolve("x.txt"), "x");
        assertTrue(ReportFiles.problemWith(file).contains("is a file, not a directory"));
        assertTrue(ReportFiles.problemWith(tmp.resolve("no/such/dir")).contains("does not exist"));
        assertNull(ReportFiles.problemWith(tmp));
        assertNull(ReportFiles.problemWith(tmp.resolve("fresh")));
    }

    @Test
    void fileNamesMayNotLeaveTheDirectory() {
        assertThrows(IllegalArgumentException.class, () -> new ReportFiles().add("../x", new byte[0]));
        assertThrows(IllegalArgumentException.class, () -> new ReportFiles().add(" ", new byte[0]));
    }

    @Test
    void aReportPackageHasThePdfTheChartsTheFiveCsvFilesAndTheirWorkbook() {
        ReportFiles f = ReportPackage.files(ReportFixtures.content(ReportUnits.METRIC), ReportFixtures.charts());
        assertEquals(List.of("report.pdf", "tension.png", "tension.svg", "break-percent.png", "break-percent.svg",
                "inharmonicity.png", "inharmonicity.svg", "stretch.png", "stretch.svg", "results.csv",
                "schedule.csv", "wound-order.csv", "wire-order.csv", "stretch.csv", "tables.xlsx"), f.names());
        assertTrue(new String(f.content("report.pdf"), 0, 5).startsWith("%PDF-"));
    }
}
