package org.scalewright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.ScaleAnalyzer;

/** The decimal-comma CSV dialect is read back by the program's one reading path to the same cells. */
class CsvDialectTest {
    @Test
    void theDecimalCommaDialectReadsBackToTheSameCells() throws Exception {
        ScaleAnalysis a = ScaleAnalyzer.analyze(ScaleSheetReader.standard().read(SpreadsheetSheetsTest.ORIGINAL),
                BuiltInData.defaultSettings());
        List<String> comments = AnalysisCsv.comments(a);
        List<List<String>> rows = AnalysisCsv.rows(a);
        byte[] plain = CsvReportWriter.toBytes(comments, AnalysisCsv.HEADER, rows, CsvDialect.PLAIN);
        byte[] comma = CsvReportWriter.toBytes(comments, AnalysisCsv.HEADER, rows, CsvDialect.DECIMAL_COMMA);
        assertTrue(new String(comma, java.nio.charset.StandardCharsets.UTF_8).contains(";1,6;"));
        CsvTable p = CsvTable.parse(Path.of("plain.csv"), plain, CsvTable.RowLimit.TABLE);
        CsvTable c = CsvTable.parse(Path.of("comma.csv"), comma, CsvTable.RowLimit.TABLE);
        assertEquals(p.header(), c.header());
        assertEquals(p.comments(), c.comments());
        assertEquals(p.rows(), c.rows());
    }

    @Test
    void aSpreadsheetSplitCommentIsJoinedAgain() throws Exception {
        CsvTable t = CsvTable.parse(Path.of("x.csv"), "#;\"title: a; b, c\";;;\n\"# x\";\" y\";;\nkey;strings\n1;2\n"
                .getBytes(java.nio.charset.StandardCharsets.UTF_8), CsvTable.RowLimit.KEYS);
        assertEquals(List.of("title: a; b, c", "x, y"), t.comments());
    }
}
