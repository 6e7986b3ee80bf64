package org.scalewright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import com.opencsv.CSVReader;
import java.io.StringReader;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

class CommentLinesTest {
    @Test
    void aPlainCommentStaysAsItWas() {
        assertEquals("# a4_hz: 440", CommentLines.line("a4_hz: 440"));
        assertEquals("a4_hz: 440", CommentLines.textOf("# a4_hz: 440"));
        assertNull(CommentLines.textOf("key,strings"));
    }

    @Test
    void commasAndQuotesMakeOneQuotedCellAfterTheMark() {
        String line = CommentLines.line("title: Grand,=HYPERLINK(\"http://x\",\"y\")");
        assertEquals("#,\"title: Grand,=HYPERLINK(\"\"http://x\"\",\"\"y\"\")\"", line);
        assertEquals(List.of("#", "title: Grand,=HYPERLINK(\"http://x\",\"y\")"), cells(line));
    }

    @Test
    void aLeadingFormulaCharacterIsDisarmedAndTakenOffWhenRead() {
        assertEquals("# '=1+2", CommentLines.line("=1+2"));
        assertEquals("# '-5 cents", CommentLines.line("-5 cents"));
        assertEquals("#,\"'@SUM(A1, A2)\"", CommentLines.line("@SUM(A1, A2)"));
        assertEquals("=1+2", CommentLines.textOf("# '=1+2"));
        assertEquals("@SUM(A1, A2)", CommentLines.textOf("#,\"'@SUM(A1, A2)\""));
    }

    @Test
    void controlCharactersAndLineBreaksNeverReachTheFile() {
        assertEquals("# a b c", CommentLines.line("a\r\nb\nc\u001b\u0007"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"title: Grand, 1907", "remark: \"fine\"; kept", "=HYPERLINK(\"http://x\",\"y\")",
            "+1", "@x", "-", "plain", "tab\there"})
    void whatIsWrittenIsReadBack(String text) {
        String back = CommentLines.textOf(CommentLines.line(text));
        assertEquals(text, back);
        for (String cell : cells(CommentLines.line(text))) {
            String c = cell.strip();
            if (!c.isEmpty()) {
                assertEquals(-1, "=+-@".indexOf(c.charAt(0)), "a cell a spreadsheet would run: " + cell);
            }
        }
    }

    private static List<String> cells(String line) {
        try (CSVReader r = new CSVReader(new StringReader(line))) {
            return List.of(r.readNext());
        } catch (Exception e) {
            throw new AssertionError(e);
        }
    }
}
