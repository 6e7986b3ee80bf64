package org.scalewright.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import org.scalewright.model.NumberText;

/**
 * Reads a UTF-8 text file into lines, refusing files that are not text and files larger than
 * {@link InputLimits#MAX_FILE_BYTES}.
 */
final class TextFile {
    private TextFile() {
    }

    static List<String> lines(Path file) throws BadInputException {
        byte[] bytes;
        try {
            if (Files.isRegularFile(file) && Files.size(file) > InputLimits.MAX_FILE_BYTES) {
                throw tooLarge(file, Files.size(file));
            }
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw BadInputException.of(file, "no such file");
        } catch (IOException e) {
            throw BadInputException.of(file, "cannot be read: " + e.getMessage());
        }
        return lines(file, bytes);
    }

    static List<String> lines(Path file, byte[] bytes) throws BadInputException {
        if (bytes.length > InputLimits.MAX_FILE_BYTES) {
            throw tooLarge(file, bytes.length);
        }
        for (byte b : bytes) {
            if (b == 0) {
                throw BadInputException.of(file, "is not a text file (it holds binary data); expected a UTF-8 CSV file");
            }
        }
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            throw BadInputException.of(file, "is not UTF-8 text; save it as a UTF-8 CSV file");
        }
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        return text.lines().toList();
    }

    private static BadInputException tooLarge(Path file, long bytes) {
        return BadInputException.of(file, "is too large to be a piano's data (" + NumberText.grouped(bytes)
                + " bytes; at most " + NumberText.grouped(InputLimits.MAX_FILE_BYTES) + " bytes are read)");
    }
}
