package org.scalewright.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.Charset;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.scalewright.model.NumberText;

/**
 * The bytes of an input file and the text they hold (DESIGN §4: "Sheets come from spreadsheets"). The
 * encoding is told by the bytes, never guessed between two readings: a byte-order mark names UTF-8 or
 * UTF-16; without one, bytes that are valid UTF-8 are UTF-8; any other bytes are read as
 * Windows-1252 (what spreadsheets on Windows save as "CSV"), and the reading says so in a note.
 * Files larger than {@link InputLimits#MAX_FILE_BYTES} are refused before they are read.
 */
final class TextFile {
    private static final Charset WINDOWS_1252 = Charset.forName("windows-1252");

    /**
     * A file's text.
     *
     * @param text the text, without a byte-order mark
     * @param note how it was read, in words, when that was not plain UTF-8; "" otherwise
     */
    record Text(String text, String note) {
    }

    private TextFile() {
    }

    /** @return the file's bytes, refused when it is missing, unreadable or too large */
    static byte[] bytes(Path file) throws BadInputException {
        try {
            if (Files.isRegularFile(file) && Files.size(file) > InputLimits.MAX_FILE_BYTES) {
                throw tooLarge(file, Files.size(file));
            }
            byte[] bytes = Files.readAllBytes(file);
            if (bytes.length > InputLimits.MAX_FILE_BYTES) {
                throw tooLarge(file, bytes.length);
            }
            return bytes;
        } catch (NoSuchFileException e) {
            throw BadInputException.of(file, "no such file");
        } catch (IOException e) {
            throw BadInputException.of(file, "cannot be read: " + e.getMessage());
        }
    }

    /**
     * @param file  names the file in messages
     * @param bytes its content
     * @return the text, with a note when it was read as UTF-16 or Windows-1252
     * @throws BadInputException when the bytes are not text in any of those encodings
     */
    static Text decode(Path file, byte[] bytes) throws BadInputException {
        if (bytes.length > InputLimits.MAX_FILE_BYTES) {
            throw tooLarge(file, bytes.length);
        }
        if (startsWith(bytes, 0xEF, 0xBB, 0xBF)) {
            return new Text(strict(file, StandardCharsets.UTF_8, bytes, 3, "UTF-8"), "");
        }
        if (startsWith(bytes, 0xFF, 0xFE) || startsWith(bytes, 0xFE, 0xFF)) {
            Charset cs = bytes[0] == (byte) 0xFF ? StandardCharsets.UTF_16LE : StandardCharsets.UTF_16BE;
            String text = strict(file, cs, bytes, 2, "UTF-16");
            refuseControls(file, text);
            return new Text(text, "read as UTF-16 text (it begins with a UTF-16 byte-order mark)");
        }
        for (byte b : bytes) {
            if (b == 0) {
                throw BadInputException.of(file, "is not a text file (it holds binary data); expected a CSV file "
                        + "(UTF-8, UTF-16 with a byte-order mark, or Windows-1252) or an .xlsx workbook");
            }
        }
        try {
            return new Text(decoder(StandardCharsets.UTF_8).decode(ByteBuffer.wrap(bytes)).toString(), "");
        } catch (CharacterCodingException notUtf8) {
            String text;
            try {
                text = decoder(WINDOWS_1252).decode(ByteBuffer.wrap(bytes)).toString();
            } catch (CharacterCodingException e) {
                throw BadInputException.of(file, "is neither UTF-8 nor Windows-1252 text; save it as a UTF-8 CSV file");
            }
            return new Text(text, "read as Windows-1252 text (the file is not UTF-8); if a letter looks wrong, "
                    + "save the file as UTF-8 CSV");
        }
    }

    private static String strict(Path file, Charset cs, byte[] bytes, int skip, String name) throws BadInputException {
        try {
            return decoder(cs).decode(ByteBuffer.wrap(bytes, skip, bytes.length - skip)).toString();
        } catch (CharacterCodingException e) {
            throw BadInputException.of(file, "begins with a " + name + " byte-order mark but is not " + name
                    + " text; save it as a UTF-8 CSV file");
        }
    }

    /** UTF-16 text decodes from almost any bytes: a control character shows it was not text. */
    private static void refuseControls(Path file, String text) throws BadInputException {
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c < 0x20 && c != '\t' && c != '\n' && c != '\r') {
                throw BadInputException.of(file, "is not a text file (it holds binary data after a UTF-16 "
                        + "byte-order mark)");
            }
        }
    }

    private static CharsetDecoder decoder(Charset cs) {
        return cs.newDecoder().onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
    }

    static boolean startsWith(byte[] bytes, int... start) {
        if (bytes.length < start.length) {
            return false;
        }
        for (int i = 0; i < start.length; i++) {
            if ((bytes[i] & 0xFF) != start[i]) {
                return false;
            }
        }
        return true;
    }

    private static BadInputException tooLarge(Path file, long bytes) {
        return BadInputException.of(file, "is too large to be a piano's data (" + NumberText.grouped(bytes)
                + " bytes; at most " + NumberText.grouped(InputLimits.MAX_FILE_BYTES) + " bytes are read)");
    }
}
